import { router } from 'expo-router';
import { Text } from 'react-native';
import { connectorQueries, type ConnectorRecord } from '../data/connectors';
import { type } from '../theme';
import { ChoiceChips } from '../ui/choice-chips';
import { lengthDraft, LengthField, type LengthDraft } from '../ui/number-field';
import type { PickedRef } from '../ui/record-picker';
import { TextField } from '../ui/text-field';
import { CONNECTOR_LIMITS as H, connectorProblem } from '@/shared/records/connector';
import { sentence } from '@/shared/records/field';
import { Checks, mmOf } from './checks';
import { fieldBinders } from './bind';
import { FieldRow, FormFrame, FormSection } from './form-frame';
import { optionLabel, RETURN_PATH_OPTIONS, SUITED_OPTIONS } from './options';
import { KeyCodePicker, SupplierPicker } from './pickers';
import { useRecordForm, type FormSpec } from './use-record-form';

type ReturnPath = ConnectorRecord['returnPath'];
type SuitedTo = ConnectorRecord['suitedTo'];

export type ConnectorDraft = {
  partNumber: string;
  supplierId: PickedRef | null;
  keyCode: PickedRef | null;
  suitedTo: SuitedTo | null;
  wettedMaterials: string;
  feedBoreMm: LengthDraft;
  feedNominal: string;
  returnPath: ReturnPath | null;
  returnBoreMm: LengthDraft;
  returnNominal: string;
};

const LABELS: Record<string, string> = {
  partNumber: 'Part number',
  supplierId: 'Supplier',
  keyCode: 'Key code',
  suitedTo: 'Suited to',
  wettedMaterials: 'Wetted materials',
  feedBoreMm: 'Feed port bore',
  feedNominal: 'Feed port size',
  returnPath: 'Return path',
  returnBoreMm: 'Return port bore',
  returnNominal: 'Return port size',
};

const code = (c: string | null): PickedRef | null => (c ? { id: c, label: c } : null);
const hasReturn = (d: ConnectorDraft) => d.returnPath !== null && d.returnPath !== 'none';

export const connectorSpec: FormSpec<ConnectorRecord, ConnectorDraft> = {
  noun: 'connector',
  empty: (unit) => ({
    partNumber: '',
    supplierId: null,
    keyCode: null,
    suitedTo: null,
    wettedMaterials: '',
    feedBoreMm: lengthDraft(null, unit),
    feedNominal: '',
    returnPath: null,
    returnBoreMm: lengthDraft(null, unit),
    returnNominal: '',
  }),
  fromRecord: (c, unit) => ({
    partNumber: c.partNumber,
    supplierId: { id: c.supplierId, label: c.supplierName ?? 'Supplier' },
    keyCode: code(c.keyCode),
    suitedTo: c.suitedTo,
    wettedMaterials: c.wettedMaterials,
    feedBoreMm: lengthDraft(c.feedBoreMm, unit),
    feedNominal: c.feedNominal,
    returnPath: c.returnPath,
    returnBoreMm: lengthDraft(c.returnBoreMm, unit),
    returnNominal: c.returnNominal ?? '',
  }),
  check: (d) => {
    const c = new Checks();
    c.text('partNumber', 'Part number', d.partNumber, { max: H.partNumberChars });
    c.pick('supplierId', 'Supplier', d.supplierId, 'the supplier who sells it');
    c.choice('suitedTo', 'Suited to', d.suitedTo);
    c.text('wettedMaterials', 'Wetted materials', d.wettedMaterials, { max: H.wettedMaterialsChars });
    c.length('feedBoreMm', 'Feed port bore', d.feedBoreMm, { maxMm: H.feedBoreMaxMm });
    c.text('feedNominal', 'Feed port size', d.feedNominal, { max: H.nominalChars });
    c.choice('returnPath', 'Return path', d.returnPath);
    if (hasReturn(d)) {
      const bore = c.length('returnBoreMm', 'Return port bore', d.returnBoreMm, { maxMm: H.returnBoreMaxMm, optional: true });
      // Whether the bore is required is the record's rule (the form sends none when there is no return path).
      const across = connectorProblem({ returnPath: d.returnPath, returnBoreMm: bore });
      if (across) c.rule(across.field, false, sentence(LABELS[across.field], across.says));
      c.text('returnNominal', 'Return port size', d.returnNominal, { max: H.nominalChars });
    }
    return c.errors;
  },
  // A head without a return path has no return port: its fields are sent empty.
  toBody: (d) => ({
    partNumber: d.partNumber.trim(),
    supplierId: d.supplierId!.id,
    keyCode: d.keyCode?.id ?? null,
    suitedTo: d.suitedTo,
    wettedMaterials: d.wettedMaterials.trim(),
    feedBoreMm: mmOf(d.feedBoreMm),
    feedNominal: d.feedNominal.trim(),
    returnPath: d.returnPath,
    returnBoreMm: hasReturn(d) ? mmOf(d.returnBoreMm) : null,
    returnNominal: hasReturn(d) ? d.returnNominal.trim() : null,
  }),
  labelOf: (path) => LABELS[path],
  describe: (key, d) => (key === 'suitedTo' ? optionLabel(SUITED_OPTIONS, d.suitedTo) : key === 'returnPath' ? optionLabel(RETURN_PATH_OPTIONS, d.returnPath) : undefined),
};

/** Create (no id) or edit a connector (dispense head). */
export function ConnectorFormScreen({ id }: { id?: string }) {
  const form = useRecordForm({ spec: connectorSpec, source: connectorQueries, id, onSaved: (c) => router.replace(`/registry/connectors/${c.id}` as never) });
  const { draft, set, field } = form;
  const bind = fieldBinders(form, connectorSpec.labelOf);
  const setReturnPath = (v: ReturnPath) => {
    set('returnPath', v);
    // Hidden fields must not keep a value that would be saved behind the person's back.
    if (v === 'none') {
      set('returnBoreMm', lengthDraft(null, draft.returnBoreMm.unit));
      set('returnNominal', '');
    }
  };
  return (
    <FormFrame form={form} resource="connectors" id={id} name={form.base?.partNumber} subtitle="A dispense head: its ports, keying and the tapping it is made for." testID="connector-form">
      <FormSection title="Part">
        <TextField {...bind.code('partNumber')} />
        <SupplierPicker {...bind.value('supplierId')} />
        <TextField {...bind.text('wettedMaterials')} hint="Everything the slurry touches, e.g. PFA, PTFE, FFKM seals." />
      </FormSection>
      <FormSection title="Keying and tapping">
        <KeyCodePicker {...bind.value('keyCode')} hint="The collar key on the head, if the site keys this line." />
        <ChoiceChips {...bind.choice('suitedTo')} options={SUITED_OPTIONS} />
      </FormSection>
      <FormSection title="Ports" full>
        <FieldRow>
          <LengthField {...bind.value('feedBoreMm')} />
          <TextField {...bind.text('feedNominal')} hint="As marked, e.g. 3/4 in." />
        </FieldRow>
        <ChoiceChips label="Return path" options={RETURN_PATH_OPTIONS} value={draft.returnPath} onChange={setReturnPath} error={field('returnPath').error} testID="form-returnPath" />
        {hasReturn(draft) ? (
          <FieldRow>
            <LengthField {...bind.value('returnBoreMm')} />
            <TextField {...bind.text('returnNominal')} hint="As marked, e.g. 1/2 in." />
          </FieldRow>
        ) : draft.returnPath === 'none' ? (
          <Text style={type.small} testID="form-no-return">
            No return port: this head suits two-opening tapping, where the slurry returns through the other opening.
          </Text>
        ) : null}
      </FormSection>
    </FormFrame>
  );
}

import { router } from 'expo-router';
import { dipTubeQueries, type DipTubeRecord } from '../data/dip-tubes';
import { ChoiceChips } from '../ui/choice-chips';
import { lengthDraft, LengthField, type LengthDraft } from '../ui/number-field';
import type { PickedRef } from '../ui/record-picker';
import { TextField } from '../ui/text-field';
import { DIP_TUBE_LIMITS as T, dipTubeProblem } from '@/shared/records/dip-tube';
import { sentence } from '@/shared/records/field';
import { Checks, mmOf } from './checks';
import { fieldBinders } from './bind';
import { FieldRow, FormFrame, FormSection } from './form-frame';
import { CHANNEL_OPTIONS, optionLabel } from './options';
import { KeyCodePicker, SupplierPicker, ThreadPicker } from './pickers';
import { useRecordForm, type FormSpec } from './use-record-form';

type Channels = DipTubeRecord['channels'];

export type DipTubeDraft = {
  partNumber: string;
  supplierId: PickedRef | null;
  material: string;
  threadCode: PickedRef | null;
  keyCode: PickedRef | null;
  channels: Channels | null;
  lengthMm: LengthDraft;
  boreMm: LengthDraft;
  odMm: LengthDraft;
};

const LABELS: Record<string, string> = {
  partNumber: 'Part number',
  supplierId: 'Supplier',
  material: 'Material',
  threadCode: 'Thread',
  keyCode: 'Key code',
  channels: 'Channels',
  lengthMm: 'Length',
  boreMm: 'Bore',
  odMm: 'Outside diameter',
};

const code = (c: string | null): PickedRef | null => (c ? { id: c, label: c } : null);

export const dipTubeSpec: FormSpec<DipTubeRecord, DipTubeDraft> = {
  noun: 'dip tube',
  empty: (unit) => ({
    partNumber: '',
    supplierId: null,
    material: '',
    threadCode: null,
    keyCode: null,
    channels: null,
    lengthMm: lengthDraft(null, unit),
    boreMm: lengthDraft(null, unit),
    odMm: lengthDraft(null, unit),
  }),
  fromRecord: (t, unit) => ({
    partNumber: t.partNumber,
    supplierId: { id: t.supplierId, label: t.supplierName ?? 'Supplier' },
    material: t.material,
    threadCode: code(t.threadCode),
    keyCode: code(t.keyCode),
    channels: t.channels,
    lengthMm: lengthDraft(t.lengthMm, unit),
    boreMm: lengthDraft(t.boreMm, unit),
    odMm: lengthDraft(t.odMm, unit),
  }),
  check: (d) => {
    const c = new Checks();
    c.text('partNumber', 'Part number', d.partNumber, { max: T.partNumberChars });
    c.pick('supplierId', 'Supplier', d.supplierId, 'the supplier who sells it');
    c.text('material', 'Material', d.material, { max: T.materialChars });
    c.pick('threadCode', 'Thread', d.threadCode, 'the thread it screws into');
    c.choice('channels', 'Channels', d.channels);
    c.length('lengthMm', 'Length', d.lengthMm, { maxMm: T.lengthMaxMm });
    const bore = c.length('boreMm', 'Bore', d.boreMm, { maxMm: T.boreMaxMm });
    const od = c.length('odMm', 'Outside diameter', d.odMm, { maxMm: T.odMaxMm });
    const across = dipTubeProblem({ boreMm: bore, odMm: od });
    if (across) c.rule(across.field, false, sentence(LABELS[across.field], across.says));
    return c.errors;
  },
  toBody: (d) => ({
    partNumber: d.partNumber.trim(),
    supplierId: d.supplierId!.id,
    material: d.material.trim(),
    threadCode: d.threadCode!.id,
    keyCode: d.keyCode?.id ?? null,
    channels: d.channels,
    lengthMm: mmOf(d.lengthMm),
    boreMm: mmOf(d.boreMm),
    odMm: mmOf(d.odMm),
  }),
  labelOf: (path) => LABELS[path],
  describe: (key, d) => (key === 'channels' ? optionLabel(CHANNEL_OPTIONS, d.channels) : undefined),
};

/** Create (no id) or edit a dip tube. */
export function DipTubeFormScreen({ id }: { id?: string }) {
  const form = useRecordForm({ spec: dipTubeSpec, source: dipTubeQueries, id, onSaved: (t) => router.replace(`/registry/dip-tubes/${t.id}` as never) });
  const bind = fieldBinders(form, dipTubeSpec.labelOf);
  return (
    <FormFrame form={form} resource="dip-tubes" id={id} name={form.base?.partNumber} subtitle="Type lengths in mm or inches; they are saved in mm." testID="dip-tube-form">
      <FormSection title="Part">
        <TextField {...bind.code('partNumber')} />
        <SupplierPicker {...bind.value('supplierId')} />
        <TextField {...bind.text('material')} hint="The wetted material, e.g. PFA or PVDF." />
      </FormSection>
      <FormSection title="Thread and keying">
        <ThreadPicker {...bind.value('threadCode')} hint="The bung thread the tube's head screws into." />
        <KeyCodePicker {...bind.value('keyCode')} hint="The collar key on the tube, if the site keys this line." />
        <ChoiceChips {...bind.choice('channels')} options={CHANNEL_OPTIONS} />
      </FormSection>
      <FormSection title="Dimensions" full>
        <FieldRow>
          <LengthField {...bind.value('lengthMm')} hint="From the bung seat to the tip." />
          <LengthField {...bind.value('boreMm')} hint="Inside diameter." />
          <LengthField {...bind.value('odMm')} hint="Must pass through the bung." />
        </FieldRow>
      </FormSection>
    </FormFrame>
  );
}

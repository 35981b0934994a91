import { router } from 'expo-router';
import type { Region } from '@/shared/contract/records';
import { slurryQueries, type SlurryRecord } from '../data/slurries';
import { ChoiceChips } from '../ui/choice-chips';
import { NumberField, numberText } from '../ui/number-field';
import type { PickedRef } from '../ui/record-picker';
import { TextField } from '../ui/text-field';
import { sentence } from '@/shared/records/field';
import { SLURRY_LIMITS as S, SLURRY_SAYS, slurryProblem } from '@/shared/records/slurry';
import { Checks } from './checks';
import { bindSupplier, fieldBinders } from './bind';
import { FormFrame, FormSection } from './form-frame';
import { optionLabel, REGION_OPTIONS, YES_NO_OPTIONS } from './options';
import { DrumTypePicker, SupplierPicker } from './pickers';
import { useRecordForm, type FormSpec } from './use-record-form';

type YesNo = 'yes' | 'no';

export type SlurryDraft = {
  name: string;
  supplierId: PickedRef | null;
  region: Region | null;
  drumTypeId: PickedRef | null;
  foams: YesNo | null;
  shearSensitive: YesNo | null;
  solidsWtPct: string;
  shelfLifeDays: string;
  minRemainingDays: string;
  storageMinC: string;
  storageMaxC: string;
  certificateRequired: YesNo | null;
};

const LABELS: Record<string, string> = {
  name: 'Name',
  supplierId: 'Supplier',
  region: 'Region',
  drumTypeId: 'Drum type',
  foams: 'Foams',
  shearSensitive: 'Shear-sensitive',
  solidsWtPct: 'Solids',
  shelfLifeDays: 'Shelf life',
  minRemainingDays: 'Minimum remaining life',
  storageMinC: 'Lowest storage temperature',
  storageMaxC: 'Highest storage temperature',
  certificateRequired: 'Certificate required',
};

const optionalNumber = (text: string): number | null => (text.trim() === '' ? null : Number(text.trim().replace(',', '.')));

const yesNo = (b: boolean): YesNo => (b ? 'yes' : 'no');

export const slurrySpec: FormSpec<SlurryRecord, SlurryDraft> = {
  noun: 'slurry',
  empty: () => ({
    name: '',
    supplierId: null,
    region: null,
    drumTypeId: null,
    foams: null,
    shearSensitive: null,
    solidsWtPct: '',
    shelfLifeDays: '',
    minRemainingDays: '',
    storageMinC: '',
    storageMaxC: '',
    certificateRequired: 'no',
  }),
  fromRecord: (s) => ({
    name: s.name,
    supplierId: { id: s.supplierId, label: s.supplierName ?? 'Supplier' },
    region: s.region,
    drumTypeId: { id: s.drumTypeId, label: s.drumTypeName ?? 'Drum type' },
    foams: yesNo(s.foams),
    shearSensitive: yesNo(s.shearSensitive),
    solidsWtPct: numberText(s.solidsWtPct, 2),
    shelfLifeDays: numberText(s.shelfLifeDays, 0),
    minRemainingDays: numberText(s.minRemainingDays, 0),
    storageMinC: numberText(s.storageMinC, 1),
    storageMaxC: numberText(s.storageMaxC, 1),
    certificateRequired: yesNo(s.certificateRequired),
  }),
  check: (d) => {
    const c = new Checks();
    c.text('name', 'Name', d.name, { max: S.nameChars });
    c.pick('supplierId', 'Supplier', d.supplierId, 'the supplier who makes it');
    c.choice('region', 'Region', d.region);
    c.pick('drumTypeId', 'Drum type', d.drumTypeId, 'the drum it arrives in');
    c.choice('foams', 'Foams', d.foams);
    c.choice('shearSensitive', 'Shear-sensitive', d.shearSensitive);
    c.number('solidsWtPct', 'Solids', d.solidsWtPct, { min: S.solidsMinPct, max: S.solidsMaxPct, unit: '%' });
    // Receiving: each optional; the limits and the rules across them are the record's (shared/records/slurry.ts).
    const across = (v: Parameters<typeof slurryProblem>[0]) => {
      const p = slurryProblem(v);
      if (p) c.rule(p.field, false, sentence(LABELS[p.field], p.says));
    };
    const shelf = d.shelfLifeDays.trim() ? c.number('shelfLifeDays', 'Shelf life', d.shelfLifeDays, { min: S.shelfLifeMinDays, max: S.daysMax, unit: 'days' }) : null;
    const left = d.minRemainingDays.trim() ? c.number('minRemainingDays', 'Minimum remaining life', d.minRemainingDays, { min: S.remainingMinDays, max: S.daysMax, unit: 'days' }) : null;
    if (shelf !== null) c.rule('shelfLifeDays', Number.isInteger(shelf), sentence(LABELS.shelfLifeDays, SLURRY_SAYS.wholeDays));
    if (left !== null) c.rule('minRemainingDays', Number.isInteger(left), sentence(LABELS.minRemainingDays, SLURRY_SAYS.wholeDays));
    across({ shelfLifeDays: shelf, minRemainingDays: left });
    const lo = d.storageMinC.trim() ? c.number('storageMinC', 'Lowest storage temperature', d.storageMinC, { min: S.storageMinC, max: S.storageMaxC, unit: '°C' }) : null;
    const hi = d.storageMaxC.trim() ? c.number('storageMaxC', 'Highest storage temperature', d.storageMaxC, { min: S.storageMinC, max: S.storageMaxC, unit: '°C' }) : null;
    across({ storageMinC: lo, storageMaxC: hi });
    c.choice('certificateRequired', 'Certificate required', d.certificateRequired);
    return c.errors;
  },
  toBody: (d) => ({
    name: d.name.trim(),
    supplierId: d.supplierId!.id,
    region: d.region,
    drumTypeId: d.drumTypeId!.id,
    foams: d.foams === 'yes',
    shearSensitive: d.shearSensitive === 'yes',
    solidsWtPct: Number(d.solidsWtPct.trim().replace(',', '.')),
    shelfLifeDays: optionalNumber(d.shelfLifeDays),
    minRemainingDays: optionalNumber(d.minRemainingDays),
    storageMinC: optionalNumber(d.storageMinC),
    storageMaxC: optionalNumber(d.storageMaxC),
    certificateRequired: d.certificateRequired === 'yes',
  }),
  labelOf: (path) => LABELS[path],
  describe: (key, d) => (key === 'region' ? optionLabel(REGION_OPTIONS, d.region) : undefined),
};

/** Create (no id) or edit a slurry. */
export function SlurryFormScreen({ id }: { id?: string }) {
  const form = useRecordForm({ spec: slurrySpec, source: slurryQueries, id, onSaved: (s) => router.replace(`/registry/slurries/${s.id}` as never) });
  const bind = fieldBinders(form, slurrySpec.labelOf);
  return (
    <FormFrame form={form} resource="slurries" id={id} name={form.base?.name} subtitle="How it behaves at the station, and the drum it arrives in." testID="slurry-form">
      <FormSection title="Slurry">
        <TextField {...bind.text('name')} />
        <SupplierPicker {...bindSupplier(form)} />
        <ChoiceChips {...bind.choice('region')} options={REGION_OPTIONS} />
      </FormSection>
      <FormSection title="Handling">
        <DrumTypePicker {...bind.value('drumTypeId')} hint="The drum type it is delivered in." />
        <ChoiceChips {...bind.choice('foams')} label="Foams when stirred" options={YES_NO_OPTIONS} />
        <ChoiceChips {...bind.choice('shearSensitive')} options={YES_NO_OPTIONS} />
        <NumberField {...bind.text('solidsWtPct')} hint="Weight percent, 0 to 100." suffix="wt %" />
      </FormSection>
      <FormSection title="Receiving">
        <NumberField {...bind.text('shelfLifeDays')} hint="Days from production; leave empty if the label always gives an expiry date." suffix="days" inputMode="numeric" />
        <NumberField {...bind.text('minRemainingDays')} label="Minimum remaining life on arrival" hint="A lot with fewer days left is held at the dock." suffix="days" inputMode="numeric" />
        <NumberField {...bind.text('storageMinC')} suffix="°C" />
        <NumberField {...bind.text('storageMaxC')} suffix="°C" />
        <ChoiceChips {...bind.choice('certificateRequired')} label="Certificate of analysis required at the dock" options={YES_NO_OPTIONS} />
      </FormSection>
    </FormFrame>
  );
}

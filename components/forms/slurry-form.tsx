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
  const { draft, set, field } = form;
  return (
    <FormFrame
      form={form}
      title={id ? `Edit slurry ${form.base?.name ?? ''}`.trim() : 'New slurry'}
      subtitle="How it behaves at the station, and the drum it arrives in."
      testID="slurry-form"
      cancelTo={id ? `/registry/slurries/${id}` : '/registry/slurries'}
    >
      <FormSection title="Slurry">
        <TextField label="Name" value={draft.name} onChangeText={(v) => set('name', v)} testID="form-name" {...field('name')} />
        <SupplierPicker
          value={draft.supplierId}
          onChange={(p, s) => {
            set('supplierId', p);
            // The supplier's region is the usual answer; the person can still change it.
            if (s && !draft.region) set('region', s.region);
          }}
          testID="form-supplierId"
          {...field('supplierId')}
        />
        <ChoiceChips label="Region" options={REGION_OPTIONS} value={draft.region} onChange={(v) => set('region', v)} error={field('region').error} testID="form-region" />
      </FormSection>
      <FormSection title="Handling">
        <DrumTypePicker hint="The drum type it is delivered in." value={draft.drumTypeId} onChange={(p) => set('drumTypeId', p)} testID="form-drumTypeId" {...field('drumTypeId')} />
        <ChoiceChips label="Foams when stirred" options={YES_NO_OPTIONS} value={draft.foams} onChange={(v) => set('foams', v)} error={field('foams').error} testID="form-foams" />
        <ChoiceChips
          label="Shear-sensitive"
          options={YES_NO_OPTIONS}
          value={draft.shearSensitive}
          onChange={(v) => set('shearSensitive', v)}
          error={field('shearSensitive').error}
          testID="form-shearSensitive"
        />
        <NumberField
          label="Solids"
          hint="Weight percent, 0 to 100."
          suffix="wt %"
          value={draft.solidsWtPct}
          onChangeText={(v) => set('solidsWtPct', v)}
          testID="form-solidsWtPct"
          {...field('solidsWtPct')}
        />
      </FormSection>
      <FormSection title="Receiving">
        <NumberField
          label="Shelf life"
          hint="Days from production; leave empty if the label always gives an expiry date."
          suffix="days"
          inputMode="numeric"
          value={draft.shelfLifeDays}
          onChangeText={(v) => set('shelfLifeDays', v)}
          testID="form-shelfLifeDays"
          {...field('shelfLifeDays')}
        />
        <NumberField
          label="Minimum remaining life on arrival"
          hint="A lot with fewer days left is held at the dock."
          suffix="days"
          inputMode="numeric"
          value={draft.minRemainingDays}
          onChangeText={(v) => set('minRemainingDays', v)}
          testID="form-minRemainingDays"
          {...field('minRemainingDays')}
        />
        <NumberField label="Lowest storage temperature" suffix="°C" value={draft.storageMinC} onChangeText={(v) => set('storageMinC', v)} testID="form-storageMinC" {...field('storageMinC')} />
        <NumberField label="Highest storage temperature" suffix="°C" value={draft.storageMaxC} onChangeText={(v) => set('storageMaxC', v)} testID="form-storageMaxC" {...field('storageMaxC')} />
        <ChoiceChips
          label="Certificate of analysis required at the dock"
          options={YES_NO_OPTIONS}
          value={draft.certificateRequired}
          onChange={(v) => set('certificateRequired', v)}
          error={field('certificateRequired').error}
          testID="form-certificateRequired"
        />
      </FormSection>
    </FormFrame>
  );
}

import { router } from 'expo-router';
import type { Region } from '@/shared/api-types';
import { slurryQueries, type SlurryRecord } from '../data/slurries';
import { ChoiceChips } from '../ui/choice-chips';
import { NumberField, numberText } from '../ui/number-field';
import type { PickedRef } from '../ui/record-picker';
import { TextField } from '../ui/text-field';
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
};

const LABELS: Record<string, string> = {
  name: 'Name',
  supplierId: 'Supplier',
  region: 'Region',
  drumTypeId: 'Drum type',
  foams: 'Foams',
  shearSensitive: 'Shear-sensitive',
  solidsWtPct: 'Solids',
};

const yesNo = (b: boolean): YesNo => (b ? 'yes' : 'no');

export const slurrySpec: FormSpec<SlurryRecord, SlurryDraft> = {
  noun: 'slurry',
  empty: () => ({ name: '', supplierId: null, region: null, drumTypeId: null, foams: null, shearSensitive: null, solidsWtPct: '' }),
  fromRecord: (s) => ({
    name: s.name,
    supplierId: { id: s.supplierId, label: s.supplierName ?? 'Supplier' },
    region: s.region,
    drumTypeId: { id: s.drumTypeId, label: s.drumTypeName ?? 'Drum type' },
    foams: yesNo(s.foams),
    shearSensitive: yesNo(s.shearSensitive),
    solidsWtPct: numberText(s.solidsWtPct, 2),
  }),
  check: (d) => {
    const c = new Checks();
    c.text('name', 'Name', d.name, { max: 120 });
    c.pick('supplierId', 'Supplier', d.supplierId, 'the supplier who makes it');
    c.choice('region', 'Region', d.region);
    c.pick('drumTypeId', 'Drum type', d.drumTypeId, 'the drum it arrives in');
    c.choice('foams', 'Foams', d.foams);
    c.choice('shearSensitive', 'Shear-sensitive', d.shearSensitive);
    c.number('solidsWtPct', 'Solids', d.solidsWtPct, { min: 0, max: 100, unit: '%' });
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
        <ChoiceChips label="Shear-sensitive" options={YES_NO_OPTIONS} value={draft.shearSensitive} onChange={(v) => set('shearSensitive', v)} error={field('shearSensitive').error} testID="form-shearSensitive" />
        <NumberField label="Solids" hint="Weight percent, 0 to 100." suffix="wt %" value={draft.solidsWtPct} onChangeText={(v) => set('solidsWtPct', v)} testID="form-solidsWtPct" {...field('solidsWtPct')} />
      </FormSection>
    </FormFrame>
  );
}

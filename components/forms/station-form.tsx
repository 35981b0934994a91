import { router } from 'expo-router';
import { stationQueries, type StationRecord } from '../data/stations';
import { ChoiceChips } from '../ui/choice-chips';
import { NumberField, numberText } from '../ui/number-field';
import type { PickedRef } from '../ui/record-picker';
import { TextField } from '../ui/text-field';
import { STATION_LIMITS as L } from '@/shared/records/station';
import { Checks } from './checks';
import { fieldBinders } from './bind';
import { FieldRow, FormFrame, FormSection } from './form-frame';
import { AGITATION_OPTIONS, optionLabel, TAPPING_OPTIONS } from './options';
import { ConnectorPicker } from './pickers';
import { useRecordForm, type FormSpec } from './use-record-form';

export type StationDraft = {
  name: string;
  bay: string;
  tapping: StationRecord['tapping'] | null;
  agitation: StationRecord['agitation'] | null;
  connectorId: PickedRef | null;
  flowLpm: string;
};

const LABELS: Record<string, string> = {
  name: 'Name',
  bay: 'Bay',
  tapping: 'Tapping',
  agitation: 'Agitation',
  connectorId: 'Installed dispense head',
  flowLpm: 'Recirculation flow',
};

export const stationSpec: FormSpec<StationRecord, StationDraft> = {
  noun: 'station',
  empty: () => ({ name: '', bay: '', tapping: null, agitation: null, connectorId: null, flowLpm: '' }),
  fromRecord: (s) => ({
    name: s.name,
    bay: s.bay,
    tapping: s.tapping,
    agitation: s.agitation,
    connectorId: s.connectorId ? { id: s.connectorId, label: s.connectorPartNumber ?? 'Dispense head' } : null,
    flowLpm: numberText(s.flowLpm, 2),
  }),
  check: (d) => {
    const c = new Checks();
    c.text('name', 'Name', d.name, { max: L.nameChars });
    c.text('bay', 'Bay', d.bay, { max: L.bayChars });
    c.choice('tapping', 'Tapping', d.tapping);
    c.choice('agitation', 'Agitation', d.agitation);
    c.number('flowLpm', 'Recirculation flow', d.flowLpm, { min: 0, above: true, max: L.flowMaxLpm, unit: 'L/min' });
    return c.errors;
  },
  toBody: (d) => ({
    name: d.name.trim(),
    bay: d.bay.trim(),
    tapping: d.tapping,
    agitation: d.agitation,
    connectorId: d.connectorId?.id ?? null,
    flowLpm: Number(d.flowLpm.trim().replace(',', '.')),
  }),
  labelOf: (path) => LABELS[path],
  describe: (key, d) => (key === 'tapping' ? optionLabel(TAPPING_OPTIONS, d.tapping) : key === 'agitation' ? optionLabel(AGITATION_OPTIONS, d.agitation) : undefined),
};

/** Create (no id) or edit a dispense station. */
export function StationFormScreen({ id }: { id?: string }) {
  const form = useRecordForm({ spec: stationSpec, source: stationQueries, id, onSaved: () => router.replace('/stations') });
  const bind = fieldBinders(form, stationSpec.labelOf);
  return (
    <FormFrame
      form={form}
      title={id ? `Edit station ${form.base?.name ?? ''}`.trim() : 'New station'}
      subtitle="Where drums are tapped: how many openings it uses, how it keeps the slurry moving, and its head."
      testID="station-form"
      cancelTo="/stations"
    >
      <FormSection title="Station">
        <FieldRow>
          <TextField {...bind.text('name')} />
          <TextField {...bind.text('bay')} />
        </FieldRow>
        <NumberField {...bind.text('flowLpm')} suffix="L/min" />
      </FormSection>
      <FormSection title="Tapping and head">
        <ChoiceChips {...bind.choice('tapping')} options={TAPPING_OPTIONS} />
        <ChoiceChips {...bind.choice('agitation')} options={AGITATION_OPTIONS} />
        <ConnectorPicker {...bind.value('connectorId')} noneLabel="No dispense head installed" />
      </FormSection>
    </FormFrame>
  );
}

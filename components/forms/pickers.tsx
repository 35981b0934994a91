// The record pickers the forms use, one per resource: what a match shows and which value the API takes.
import { forwardRef, type ComponentProps } from 'react';
import { REGION_LABELS } from '@/shared/contract/records';
import { connectorQueries, type ConnectorRecord } from '../data/connectors';
import { dipTubeQueries, type DipTubeRecord } from '../data/dip-tubes';
import { drumTypeQueries, type DrumTypeRecord } from '../data/drum-types';
import { keyCodeQueries, type KeyCodeRecord } from '../data/key-codes';
import { supplierQueries, type SupplierRecord } from '../data/suppliers';
import { threadSpecQueries, type ThreadSpecRecord } from '../data/thread-specs';
import { RecordPicker, type PickedRef, type PickerOption, type RecordPickerHandle } from '../ui/record-picker';

interface PickerProps<T> {
  label?: string;
  hint?: string;
  value: PickedRef | null;
  onChange: (picked: PickedRef | null, record: T | null) => void;
  error?: string | null;
  onBlur?: () => void;
  testID: string;
  disabled?: boolean;
  noneLabel?: string;
}

type Source<T> = ComponentProps<typeof RecordPicker<T>>['source'];

/** A picker of one resource: its label unless given, where it searches, and how a match reads. */
function picker<T>(name: string, defaults: { label: string; noneLabel?: string }, source: Source<T>, toOption: (record: T) => PickerOption) {
  const Picker = forwardRef<RecordPickerHandle, PickerProps<T>>(function Picker(props, ref) {
    return <RecordPicker<T> ref={ref} {...defaults} source={source} toOption={toOption} {...props} label={props.label ?? defaults.label} />;
  });
  Picker.displayName = name;
  return Picker;
}

const mm = (n: number) => `${Number(n.toFixed(1))} mm`;

export const SupplierPicker = picker<SupplierRecord>('SupplierPicker', { label: 'Supplier' }, supplierQueries, (s) => ({ id: s.id, label: s.name, detail: REGION_LABELS[s.region] }));

/** Thread specs are referred to by code (NPS-2, G-2, BT-56x4). */
export const ThreadPicker = picker<ThreadSpecRecord>('ThreadPicker', { label: 'Thread' }, threadSpecQueries, (t) => ({
  id: t.code,
  label: t.code,
  detail: `${t.nominalLabel} · ${t.form} · ${t.standard}`,
}));

/** Key codes are referred to by code; "No key" is a valid choice. */
export const KeyCodePicker = picker<KeyCodeRecord>('KeyCodePicker', { label: 'Key code', noneLabel: 'No key' }, keyCodeQueries, (k) => ({
  id: k.code,
  label: k.code,
  detail: [k.label, k.marking].filter(Boolean).join(' · '),
}));

export const DrumTypePicker = picker<DrumTypeRecord>('DrumTypePicker', { label: 'Drum type' }, drumTypeQueries, (d) => ({
  id: d.id,
  label: `${d.partNumber} · ${d.name}`,
  detail: `Inside depth ${mm(d.insideDepthMm)} · ${d.openings.map((o) => o.threadCode ?? '?').join(' + ')}`,
}));

export const dipTubeLabel = (t: Pick<DipTubeRecord, 'partNumber' | 'threadCode' | 'lengthMm'>) => `${t.partNumber} · ${t.threadCode ?? 'no thread'} · ${mm(t.lengthMm)}`;

export const DipTubePicker = picker<DipTubeRecord>('DipTubePicker', { label: 'Dip tube' }, dipTubeQueries, (t) => ({
  id: t.id,
  label: dipTubeLabel(t),
  detail: `${t.material} · key ${t.keyCode ?? 'none'} · ${t.channels === 'feed' ? 'feed only' : 'feed and return'}`,
}));

export const connectorLabel = (c: Pick<ConnectorRecord, 'partNumber' | 'suitedTo'>) => `${c.partNumber} · ${c.suitedTo === 'both' ? 'one or two openings' : c.suitedTo}`;

export const ConnectorPicker = picker<ConnectorRecord>('ConnectorPicker', { label: 'Dispense head' }, connectorQueries, (c) => ({
  id: c.id,
  label: connectorLabel(c),
  detail: `feed ${c.feedNominal} · return ${c.returnPath === 'none' ? 'none' : `${c.returnNominal ?? '?'} (${c.returnPath})`} · key ${c.keyCode ?? 'none'}`,
}));

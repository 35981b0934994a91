// The record pickers the forms use, one per resource: what a match shows and which value the API takes.
import { forwardRef } from 'react';
import { REGION_LABELS } from '@/shared/contract/records';
import { connectorQueries, type ConnectorRecord } from '../data/connectors';
import { dipTubeQueries, type DipTubeRecord } from '../data/dip-tubes';
import { drumTypeQueries, type DrumTypeRecord } from '../data/drum-types';
import { keyCodeQueries, type KeyCodeRecord } from '../data/key-codes';
import { supplierQueries, type SupplierRecord } from '../data/suppliers';
import { threadSpecQueries, type ThreadSpecRecord } from '../data/thread-specs';
import { RecordPicker, type PickedRef, type RecordPickerHandle } from '../ui/record-picker';

interface PickerProps<T> {
  label?: string;
  hint?: string;
  value: PickedRef | null;
  onChange: (picked: PickedRef | null, record: T | null) => void;
  error?: string | null;
  onBlur?: () => void;
  testID: string;
  disabled?: boolean;
}

const mm = (n: number) => `${Number(n.toFixed(1))} mm`;

export const SupplierPicker = forwardRef<RecordPickerHandle, PickerProps<SupplierRecord>>(function SupplierPicker({ label = 'Supplier', ...rest }, ref) {
  return <RecordPicker ref={ref} label={label} source={supplierQueries} toOption={(s) => ({ id: s.id, label: s.name, detail: REGION_LABELS[s.region] })} {...rest} />;
});

/** Thread specs are referred to by code (NPS-2, G-2, BT-56x4). */
export const ThreadPicker = forwardRef<RecordPickerHandle, PickerProps<ThreadSpecRecord>>(function ThreadPicker({ label = 'Thread', ...rest }, ref) {
  return <RecordPicker ref={ref} label={label} source={threadSpecQueries} toOption={(t) => ({ id: t.code, label: t.code, detail: `${t.nominalLabel} · ${t.form} · ${t.standard}` })} {...rest} />;
});

/** Key codes are referred to by code; "No key" is a valid choice. */
export const KeyCodePicker = forwardRef<RecordPickerHandle, PickerProps<KeyCodeRecord>>(function KeyCodePicker({ label = 'Key code', ...rest }, ref) {
  return (
    <RecordPicker
      ref={ref}
      label={label}
      source={keyCodeQueries}
      noneLabel="No key"
      toOption={(k) => ({ id: k.code, label: k.code, detail: [k.label, k.marking].filter(Boolean).join(' · ') })}
      {...rest}
    />
  );
});

export const DrumTypePicker = forwardRef<RecordPickerHandle, PickerProps<DrumTypeRecord> & { noneLabel?: string }>(function DrumTypePicker({ label = 'Drum type', ...rest }, ref) {
  return (
    <RecordPicker
      ref={ref}
      label={label}
      source={drumTypeQueries}
      toOption={(d) => ({ id: d.id, label: `${d.partNumber} · ${d.name}`, detail: `Inside depth ${mm(d.insideDepthMm)} · ${d.openings.map((o) => o.threadCode ?? '?').join(' + ')}` })}
      {...rest}
    />
  );
});

export const dipTubeLabel = (t: Pick<DipTubeRecord, 'partNumber' | 'threadCode' | 'lengthMm'>) => `${t.partNumber} · ${t.threadCode ?? 'no thread'} · ${mm(t.lengthMm)}`;

export const DipTubePicker = forwardRef<RecordPickerHandle, PickerProps<DipTubeRecord>>(function DipTubePicker({ label = 'Dip tube', ...rest }, ref) {
  return (
    <RecordPicker
      ref={ref}
      label={label}
      source={dipTubeQueries}
      toOption={(t) => ({ id: t.id, label: dipTubeLabel(t), detail: `${t.material} · key ${t.keyCode ?? 'none'} · ${t.channels === 'feed' ? 'feed only' : 'feed and return'}` })}
      {...rest}
    />
  );
});

export const connectorLabel = (c: Pick<ConnectorRecord, 'partNumber' | 'suitedTo'>) => `${c.partNumber} · ${c.suitedTo === 'both' ? 'one or two openings' : c.suitedTo}`;

export const ConnectorPicker = forwardRef<RecordPickerHandle, PickerProps<ConnectorRecord> & { noneLabel?: string }>(function ConnectorPicker({ label = 'Dispense head', ...rest }, ref) {
  return (
    <RecordPicker
      ref={ref}
      label={label}
      source={connectorQueries}
      toOption={(c) => ({
        id: c.id,
        label: connectorLabel(c),
        detail: `feed ${c.feedNominal} · return ${c.returnPath === 'none' ? 'none' : `${c.returnNominal ?? '?'} (${c.returnPath})`} · key ${c.keyCode ?? 'none'}`,
      })}
      {...rest}
    />
  );
});

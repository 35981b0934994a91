import { useQueryClient } from '@tanstack/react-query';
import { router } from 'expo-router';
import { useEffect, useState } from 'react';
import { Text, View } from 'react-native';
import { connectorQueries, type ConnectorRecord } from '../data/connectors';
import { dipTubeQueries, type DipTubeRecord } from '../data/dip-tubes';
import { pairingQueries, type PairingRecord } from '../data/pairings';
import { FitPreview } from '../pairings/fit-preview';
import { space, type } from '../theme';
import type { PickedRef } from '../ui/record-picker';
import { TextField } from '../ui/text-field';
import { PAIRING_LIMITS } from '@/shared/records/pairing';
import { Checks, trimOrNull } from './checks';
import { fieldBinders } from './bind';
import { FormFrame, FormSection } from './form-frame';
import { ConnectorPicker, connectorLabel, DipTubePicker, dipTubeLabel } from './pickers';
import { useRecordForm, type FormSpec } from './use-record-form';

export type PairingDraft = {
  dipTubeId: PickedRef | null;
  connectorId: PickedRef | null;
  notes: string;
};

const LABELS: Record<string, string> = { dipTubeId: 'Dip tube', connectorId: 'Dispense head', notes: 'Notes' };

export const pairingSpec: FormSpec<PairingRecord, PairingDraft> = {
  noun: 'pairing',
  empty: () => ({ dipTubeId: null, connectorId: null, notes: '' }),
  fromRecord: (p) => ({
    dipTubeId: { id: p.dipTubeId, label: p.dipTubePartNumber ?? 'Dip tube' },
    connectorId: { id: p.connectorId, label: p.connectorPartNumber ?? 'Dispense head' },
    notes: p.notes ?? '',
  }),
  check: (d) => {
    const c = new Checks();
    c.pick('dipTubeId', 'Dip tube', d.dipTubeId, 'the tube');
    c.pick('connectorId', 'Dispense head', d.connectorId, 'the head it goes with');
    c.text('notes', 'Notes', d.notes, { max: PAIRING_LIMITS.notesChars, optional: true });
    return c.errors;
  },
  // Tube and head are fixed once a pairing exists: an edit only changes the notes.
  toBody: (d, mode) => (mode === 'create' ? { dipTubeId: d.dipTubeId!.id, connectorId: d.connectorId!.id, notes: trimOrNull(d.notes) } : { notes: trimOrNull(d.notes) }),
  labelOf: (path) => LABELS[path],
  // The database allows one pairing per tube and connector; its refusal names the connector field.
  serverMessage: (path, message) =>
    path === 'connectorId' && /already in use/.test(message) ? 'This dip tube and dispense head are already paired: open that pairing from the pairings list instead.' : undefined,
};

/** Create a pairing of a dip tube and a connector (a draft until another engineer approves it), or edit its notes. */
export function PairingFormScreen({ id, initialDipTubeId, initialConnectorId }: { id?: string; initialDipTubeId?: string; initialConnectorId?: string }) {
  const qc = useQueryClient();
  const form = useRecordForm({
    spec: pairingSpec,
    source: pairingQueries,
    id,
    onSaved: (p) => {
      // Tube and head pages list their pairings.
      qc.invalidateQueries({ queryKey: dipTubeQueries.keys.all });
      qc.invalidateQueries({ queryKey: connectorQueries.keys.all });
      router.replace(`/registry/pairings/${p.id}` as never);
    },
  });
  const { draft, set, mode } = form;
  const bind = fieldBinders(form, pairingSpec.labelOf);

  // The records behind the picks, for the preview: the one just picked, else loaded by id.
  const [pickedTube, setPickedTube] = useState<DipTubeRecord | null>(null);
  const [pickedConnector, setPickedConnector] = useState<ConnectorRecord | null>(null);
  const tubeId = draft.dipTubeId?.id ?? (mode === 'create' ? initialDipTubeId : undefined);
  const connectorId = draft.connectorId?.id ?? (mode === 'create' ? initialConnectorId : undefined);
  const tubeDetail = dipTubeQueries.useDetail(tubeId && pickedTube?.id !== tubeId ? tubeId : undefined);
  const connectorDetail = connectorQueries.useDetail(connectorId && pickedConnector?.id !== connectorId ? connectorId : undefined);
  const tube = tubeId ? (pickedTube?.id === tubeId ? pickedTube : (tubeDetail.data ?? null)) : null;
  const connector = connectorId ? (pickedConnector?.id === connectorId ? pickedConnector : (connectorDetail.data ?? null)) : null;

  // Opened from a tube or head page (?dipTubeId=…): start with that part picked.
  useEffect(() => {
    if (mode === 'create' && !draft.dipTubeId && initialDipTubeId && tubeDetail.data?.id === initialDipTubeId) set('dipTubeId', { id: tubeDetail.data.id, label: dipTubeLabel(tubeDetail.data) });
  }, [mode, draft.dipTubeId, initialDipTubeId, tubeDetail.data, set]);
  useEffect(() => {
    if (mode === 'create' && !draft.connectorId && initialConnectorId && connectorDetail.data?.id === initialConnectorId)
      set('connectorId', { id: connectorDetail.data.id, label: connectorLabel(connectorDetail.data) });
  }, [mode, draft.connectorId, initialConnectorId, connectorDetail.data, set]);

  return (
    <FormFrame
      form={form}
      resource="pairings"
      id={id}
      name={`${form.base?.dipTubePartNumber ?? ''} + ${form.base?.connectorPartNumber ?? ''}`}
      subtitle={
        mode === 'create'
          ? 'A dip tube and the dispense head it is used with. It starts as a draft; another engineer approves it.'
          : 'Only the notes change; to pair other parts, retire this pairing and create a new one.'
      }
      testID="pairing-form"
      aside={<FitPreview tube={tube} connector={connector} status={form.base?.status ?? 'draft'} />}
    >
      <FormSection title="Pairing" full>
        {mode === 'create' ? (
          <>
            <DipTubePicker {...bind.value('dipTubeId')} onChange={(p, t) => (setPickedTube(t), set('dipTubeId', p))} />
            <ConnectorPicker {...bind.value('connectorId')} onChange={(p, c) => (setPickedConnector(c), set('connectorId', p))} />
          </>
        ) : (
          <View style={{ gap: space.sm }}>
            <Text style={type.label}>Dip tube</Text>
            <Text style={type.body} testID="form-dipTubeId-selected">
              {tube ? dipTubeLabel(tube) : draft.dipTubeId?.label}
            </Text>
            <Text style={type.label}>Dispense head</Text>
            <Text style={type.body} testID="form-connectorId-selected">
              {connector ? connectorLabel(connector) : draft.connectorId?.label}
            </Text>
          </View>
        )}
        <TextField {...bind.text('notes')} hint="Optional: trials, measurements, limits of use." multiline numberOfLines={4} />
      </FormSection>
    </FormFrame>
  );
}

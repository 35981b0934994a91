import { StyleSheet, Text, View } from 'react-native';
import type { DrumTypeRecord, StationRecord } from '@/shared/contract/records';
import { keptDrumTypes, keptStations } from './dock-sources';
import { space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ChoiceChips } from '../ui/choice-chips';
import { LengthField } from '../ui/number-field';
import { RecordPicker } from '../ui/record-picker';
import { OpeningEditor } from './opening-editor';
import { SectionTitle } from '../ui/section-title';
import { newOpening, type DockForm } from './use-dock-form';

const MODES = [
  { value: 'pick', label: 'Pick the drum type' },
  { value: 'describe', label: 'Measure the drum' },
] as const;

/** The drum: a registered drum type, or its bungs and depth measured at the dock. */
export function DockDrumCard({ form }: { form: DockForm }) {
  const { draft, set, errors } = form;
  return (
    <Card>
      <SectionTitle>The drum</SectionTitle>
      <ChoiceChips label="How do you know the drum?" options={MODES} value={draft.mode} onChange={(v) => set('mode', v)} testID="dock-drum-mode" />
      {draft.mode === 'pick' ? (
        <RecordPicker<DrumTypeRecord>
          label="Drum type"
          hint="Search by name, part number or supplier."
          source={keptDrumTypes}
          toOption={(d) => ({ id: d.id, label: d.name, detail: `${d.partNumber} · ${d.supplierName ?? ''} · ${d.openings.map((o) => o.threadCode).join(' + ')}` })}
          value={draft.drumType}
          onChange={(p) => set('drumType', p)}
          error={errors.drumTypeId}
          testID="dock-drum"
        />
      ) : (
        <View style={styles.describe}>
          <Text style={type.body}>Not in the registry, or no label? Measure each bung and the inside depth.</Text>
          {draft.openings.map((o, i) => (
            <OpeningEditor
              key={o.key}
              index={i}
              value={o}
              onChange={(next) => set('openings', (list) => list.map((x) => (x.key === o.key ? next : x)))}
              onRemove={draft.openings.length > 1 ? () => set('openings', (list) => list.filter((x) => x.key !== o.key)) : undefined}
              error={errors[`opening${i}`]}
              testID={`dock-opening-${i}`}
            />
          ))}
          {draft.openings.length < 3 ? (
            <Button
              label="Add another bung"
              variant="secondary"
              onPress={() => set('openings', (list) => [...list, newOpening(list.length === 1 ? 'small bung' : 'centre bung')])}
              testID="dock-add-opening"
            />
          ) : null}
          <LengthField
            label="Inside depth"
            hint="From the bung seat to the inside bottom (a dip stick or tape through the large bung)."
            value={draft.depth}
            onChange={(v) => set('depth', v)}
            placeholder={draft.depth.unit === 'in' ? 'e.g. 32.2' : 'e.g. 818'}
            error={errors.depth}
            testID="dock-depth"
          />
        </View>
      )}
    </Card>
  );
}

export function DockStationCard({ form }: { form: DockForm }) {
  return (
    <Card>
      <SectionTitle>Station (optional)</SectionTitle>
      <RecordPicker<StationRecord>
        label="Station the lot is for"
        hint="Adds the station's tapping, agitation, installed head and ready tube set to the check."
        source={keptStations}
        toOption={(s) => ({ id: s.id, label: s.name, detail: `${s.bay} · head ${s.connectorPartNumber ?? 'none'}` })}
        value={form.draft.station}
        onChange={(p) => form.set('station', p)}
        noneLabel="No station: check the pairings only"
        error={form.errors.stationId}
        testID="dock-station"
      />
    </Card>
  );
}

const styles = StyleSheet.create({
  describe: { gap: space.md },
});

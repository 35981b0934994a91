import { StyleSheet, Text, View } from 'react-native';
import { REGION_LABELS, type DrumTypeRecord, type SupplierRecord } from '@/shared/contract/records';
import { drumTypeQueries } from '../data/drum-types';
import { stationQueries } from '../data/stations';
import { supplierQueries } from '../data/suppliers';
import { SectionTitle } from '../ui/section-title';
import { colors, fonts, space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ChoiceChips } from '../ui/choice-chips';
import { NumberField } from '../ui/number-field';
import { RecordPicker } from '../ui/record-picker';
import { TextField } from '../ui/text-field';
import { Toggle } from './toggle';
import { usePlanForm } from './use-plan-form';

const STATION_MODES = [
  { value: 'all', label: 'All stations' },
  { value: 'some', label: 'Choose stations' },
] as const;

/** "Slurry X from supplier Y (region R) from date D, N drums a month": the plan, then its impact page. */
export function PlanForm() {
  const { draft, change, errors, formError, sentence, submit, busy } = usePlanForm();
  // Asked for at once, so that the list is there when "Choose stations" is pressed.
  const stations = stationQueries.useList({ pageSize: 200, sort: 'name' });
  return (
    <Card testID="plan-form">
      <SectionTitle>New sourcing plan</SectionTitle>
      <Text style={[styles.sentence]} testID="plan-sentence" aria-live="polite">
        {sentence}
      </Text>
      <TextField label="Slurry" placeholder="e.g. STI slurry, second source" value={draft.slurryName} onChangeText={(t) => change('slurryName', t)} error={errors.slurryName} testID="plan-slurry" />
      <RecordPicker<SupplierRecord>
        label="Supplier"
        hint="The supplier's region is shown with its name."
        source={supplierQueries}
        toOption={(s) => ({ id: s.id, label: s.name, detail: REGION_LABELS[s.region] })}
        value={draft.supplier}
        onChange={(picked, rec) => change('supplier', picked && rec ? { ...picked, region: rec.region } : null)}
        error={errors.supplierId}
        testID="plan-supplier"
      />
      <RecordPicker<DrumTypeRecord>
        label="Drum type"
        hint="The drum the slurry arrives in."
        source={drumTypeQueries}
        toOption={(d) => ({ id: d.id, label: d.name, detail: `${d.partNumber} · ${REGION_LABELS[d.region]} · ${d.openings.map((o) => o.threadCode).join(' + ')}` })}
        value={draft.drumType}
        onChange={(picked) => change('drumType', picked)}
        error={errors.drumTypeId}
        testID="plan-drum"
      />
      <View style={styles.pair}>
        <View style={styles.grow}>
          <TextField
            label="First delivery"
            placeholder="YYYY-MM-DD"
            value={draft.startDate}
            onChangeText={(t) => change('startDate', t)}
            inputMode="numeric"
            error={errors.startDate}
            testID="plan-start"
          />
        </View>
        <View style={styles.grow}>
          <NumberField
            label="Drums a month"
            value={draft.perMonth}
            onChangeText={(t) => change('perMonth', t)}
            inputMode="numeric"
            placeholder="e.g. 12"
            error={errors.drumsPerMonth}
            testID="plan-drums"
          />
        </View>
      </View>
      <ChoiceChips label="Stations that would receive it" options={STATION_MODES} value={draft.stationMode} onChange={(m) => change('stationMode', m)} testID="plan-stations" />
      {draft.stationMode === 'some' ? <StationChooser stations={stations} chosen={draft.chosen} onChange={(ids) => change('chosen', ids)} error={errors.stationIds} /> : null}
      <Toggle label="Foams" hint="Checked against each station's agitation." value={draft.foams} onChange={(on) => change('foams', on)} testID="plan-foams" />
      <Toggle label="Shear-sensitive" hint="Checked against each station's head and return path." value={draft.shear} onChange={(on) => change('shear', on)} testID="plan-shear" />
      <TextField label="Notes (optional)" value={draft.notes} onChangeText={(t) => change('notes', t)} multiline error={errors.notes} testID="plan-notes" />
      {formError ? (
        <Text role="alert" style={styles.error} testID="plan-error">
          {formError}
        </Text>
      ) : null}
      <Button label="Work out the impact" busy={busy} onPress={submit} testID="plan-submit" />
    </Card>
  );
}

interface StationChooserProps {
  stations: ReturnType<typeof stationQueries.useList>;
  chosen: string[];
  onChange: (ids: string[]) => void;
  error: string | null | undefined;
}

/** The stations a plan reaches when not all: one toggle a station. */
function StationChooser({ stations, chosen, onChange, error }: StationChooserProps) {
  return (
    <View style={styles.stations} role="group" aria-label="Stations">
      {stations.isPending ? (
        <Text style={type.small}>Loading stations…</Text>
      ) : stations.isError ? (
        <View style={styles.stationError}>
          <Text style={[type.small, { color: colors.danger }]}>Could not load the stations: {stations.error.message}</Text>
          <Button label="Try again" variant="quiet" onPress={() => stations.refetch()} />
        </View>
      ) : (
        stations.data.items.map((s) => (
          <Toggle
            key={s.id}
            label={s.name}
            hint={s.bay}
            value={chosen.includes(s.id)}
            onChange={(on) => onChange(on ? [...chosen, s.id] : chosen.filter((x) => x !== s.id))}
            testID={`plan-station-${s.name}`}
          />
        ))
      )}
      {error ? (
        <Text role="alert" style={styles.error}>
          {error}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  sentence: { ...type.body, fontFamily: fonts.semibold, color: colors.primary, backgroundColor: colors.surfaceSunk, padding: space.md, borderRadius: 8 },
  pair: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  grow: { flex: 1, minWidth: 150 },
  stations: { gap: space.xs },
  stationError: { gap: space.xs },
  error: { fontFamily: fonts.semibold, fontSize: 15, color: colors.danger },
});

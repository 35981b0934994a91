import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { REGION_LABELS, type DrumTypeRecord, type Region, type SupplierRecord } from '@/shared/contract/records';
import { isCalendarDate } from '@/shared/dates';
import { ApiError } from '../api/client';
import { drumTypeQueries } from '../data/drum-types';
import { useSourcingPlanCreateMutation, type SourcingPlanInput } from '../data/sourcing';
import { stationQueries } from '../data/stations';
import { supplierQueries } from '../data/suppliers';
import { formatDate } from '../ui/format';
import { SectionTitle } from '../ui/section-title';
import { colors, fonts, space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ChoiceChips } from '../ui/choice-chips';
import { NumberField, parseNumber } from '../ui/number-field';
import { RecordPicker, type PickedRef } from '../ui/record-picker';
import { TextField } from '../ui/text-field';
import { Toggle } from './toggle';

type Errors = Record<string, string | null | undefined>;
const STATION_MODES = [
  { value: 'all', label: 'All stations' },
  { value: 'some', label: 'Choose stations' },
] as const;

/** "Slurry X from supplier Y (region R) from date D, N drums a month": the plan, then its impact page. */
export function PlanForm() {
  const router = useRouter();
  const create = useSourcingPlanCreateMutation();
  const stations = stationQueries.useList({ pageSize: 200, sort: 'name' });
  const [slurryName, setSlurryName] = useState('');
  const [supplier, setSupplier] = useState<(PickedRef & { region: Region }) | null>(null);
  const [drumType, setDrumType] = useState<PickedRef | null>(null);
  const [startDate, setStartDate] = useState('');
  const [perMonth, setPerMonth] = useState('');
  const [stationMode, setStationMode] = useState<'all' | 'some'>('all');
  const [chosen, setChosen] = useState<string[]>([]);
  const [foams, setFoams] = useState(false);
  const [shear, setShear] = useState(false);
  const [notes, setNotes] = useState('');
  const [errors, setErrors] = useState<Errors>({});
  const [formError, setFormError] = useState<string | null>(null);

  // A field's message goes when the field is changed, not only at the next submit.
  const edited =
    <T,>(field: string, set: (v: T) => void) =>
    (v: T) => {
      set(v);
      setErrors((e) => (e[field] ? { ...e, [field]: null } : e));
    };

  const n = parseNumber(perMonth);
  const sentence = [
    slurryName.trim() || 'Slurry …',
    `from ${supplier ? `${supplier.label} (${REGION_LABELS[supplier.region]})` : '…'}`,
    `from ${isCalendarDate(startDate.trim()) ? formatDate(startDate.trim()) : '…'},`,
    `${n && !Number.isNaN(n) ? n : 'N'} drums a month`,
    `in ${drumType?.label ?? '…'},`,
    stationMode === 'all' ? 'to every station.' : `to ${chosen.length} chosen station${chosen.length === 1 ? '' : 's'}.`,
  ].join(' ');

  const submit = () => {
    const problems: Errors = {};
    if (!slurryName.trim()) problems.slurryName = 'Name the slurry.';
    if (!supplier) problems.supplierId = 'Pick the supplier.';
    if (!drumType) problems.drumTypeId = 'Pick the drum type the slurry arrives in.';
    if (!isCalendarDate(startDate.trim())) problems.startDate = 'Enter the first delivery date as YYYY-MM-DD, e.g. 2027-02-01.';
    if (n === null || Number.isNaN(n) || !Number.isInteger(n) || n < 1) problems.drumsPerMonth = 'Enter drums a month: a whole number, 1 or more.';
    if (stationMode === 'some' && chosen.length === 0) problems.stationIds = 'Choose at least one station, or plan for all stations.';
    setErrors(problems);
    setFormError(null);
    if (Object.values(problems).some(Boolean)) {
      setFormError('Some fields need attention; see the messages beside them.');
      return;
    }
    const body: SourcingPlanInput = {
      slurryName: slurryName.trim(),
      supplierId: supplier!.id,
      drumTypeId: drumType!.id,
      startDate: startDate.trim(),
      drumsPerMonth: n!,
      ...(stationMode === 'some' ? { stationIds: chosen } : {}),
      foams,
      shearSensitive: shear,
      ...(notes.trim() ? { notes: notes.trim() } : {}),
    };
    create.mutate(body, {
      onSuccess: (plan) => router.push(`/sourcing/${plan.id}`),
      onError: (err) => {
        const f = err instanceof ApiError ? err.fieldMessages() : {};
        const next: Errors = {
          slurryName: f.slurryName && `Slurry ${f.slurryName}.`,
          supplierId: f.supplierId && `Supplier ${f.supplierId}.`,
          drumTypeId: f.drumTypeId && `Drum type ${f.drumTypeId}.`,
          startDate: f.startDate && `Start date ${f.startDate}.`,
          drumsPerMonth: f.drumsPerMonth && `Drums a month ${f.drumsPerMonth}.`,
          stationIds: f.stationIds && `Stations: ${f.stationIds}.`,
          notes: f.notes && `Notes ${f.notes}.`,
        };
        setErrors(next);
        setFormError(Object.values(next).some(Boolean) ? 'The plan was refused; see the messages beside the fields.' : err.message);
      },
    });
  };

  return (
    <Card testID="plan-form">
      <SectionTitle>New sourcing plan</SectionTitle>
      <Text style={[styles.sentence]} testID="plan-sentence" aria-live="polite">
        {sentence}
      </Text>
      <TextField label="Slurry" placeholder="e.g. STI slurry, second source" value={slurryName} onChangeText={edited('slurryName', setSlurryName)} error={errors.slurryName} testID="plan-slurry" />
      <RecordPicker<SupplierRecord>
        label="Supplier"
        hint="The supplier's region is shown with its name."
        source={supplierQueries}
        toOption={(s) => ({ id: s.id, label: s.name, detail: REGION_LABELS[s.region] })}
        value={supplier}
        onChange={(picked, rec) => edited('supplierId', setSupplier)(picked && rec ? { ...picked, region: rec.region } : null)}
        error={errors.supplierId}
        testID="plan-supplier"
      />
      <RecordPicker<DrumTypeRecord>
        label="Drum type"
        hint="The drum the slurry arrives in."
        source={drumTypeQueries}
        toOption={(d) => ({ id: d.id, label: d.name, detail: `${d.partNumber} · ${REGION_LABELS[d.region]} · ${d.openings.map((o) => o.threadCode).join(' + ')}` })}
        value={drumType}
        onChange={edited('drumTypeId', setDrumType)}
        error={errors.drumTypeId}
        testID="plan-drum"
      />
      <View style={styles.pair}>
        <View style={styles.grow}>
          <TextField
            label="First delivery"
            placeholder="YYYY-MM-DD"
            value={startDate}
            onChangeText={edited('startDate', setStartDate)}
            inputMode="numeric"
            error={errors.startDate}
            testID="plan-start"
          />
        </View>
        <View style={styles.grow}>
          <NumberField
            label="Drums a month"
            value={perMonth}
            onChangeText={edited('drumsPerMonth', setPerMonth)}
            inputMode="numeric"
            placeholder="e.g. 12"
            error={errors.drumsPerMonth}
            testID="plan-drums"
          />
        </View>
      </View>
      <ChoiceChips label="Stations that would receive it" options={STATION_MODES} value={stationMode} onChange={setStationMode} testID="plan-stations" />
      {stationMode === 'some' ? (
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
                onChange={(on) => edited('stationIds', setChosen)(on ? [...chosen, s.id] : chosen.filter((x) => x !== s.id))}
                testID={`plan-station-${s.name}`}
              />
            ))
          )}
          {errors.stationIds ? (
            <Text role="alert" style={styles.error}>
              {errors.stationIds}
            </Text>
          ) : null}
        </View>
      ) : null}
      <Toggle label="Foams" hint="Checked against each station's agitation." value={foams} onChange={setFoams} testID="plan-foams" />
      <Toggle label="Shear-sensitive" hint="Checked against each station's head and return path." value={shear} onChange={setShear} testID="plan-shear" />
      <TextField label="Notes (optional)" value={notes} onChangeText={edited('notes', setNotes)} multiline error={errors.notes} testID="plan-notes" />
      {formError ? (
        <Text role="alert" style={styles.error} testID="plan-error">
          {formError}
        </Text>
      ) : null}
      <Button label="Work out the impact" busy={create.isPending} onPress={submit} testID="plan-submit" />
    </Card>
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

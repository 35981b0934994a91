import { useEffect, useRef, useState } from 'react';
import { StyleSheet, Text, View, type TextInput } from 'react-native';
import { REGION_LABELS, type DrumTypeRecord, type SlurryRecord, type StationRecord, type SupplierRecord } from '@/shared/api-types';
import type { DrumLabel } from '@/shared/gs1';
import { lotNumberProblem } from '@/shared/lot-number';
import { ApiError } from '../api/client';
import { drumTypeQueries } from '../data/drum-types';
import { useLengthUnit } from '../data/me';
import { useReceivingCheckCreateMutation, useReceivingCheckQuery, type ReceivingCheckInput } from '../data/receiving';
import { slurryQueries } from '../data/slurries';
import { stationQueries } from '../data/stations';
import { supplierQueries } from '../data/suppliers';
import { Screen } from '../screen';
import { useSession } from '../session';
import { colors, fonts, space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ChoiceChips } from '../ui/choice-chips';
import { HandlingCaution } from '../ui/handling-caution';
import { LengthField, lengthDraft, lengthDraftMm, NumberField, parseNumber, type LengthDraft } from '../ui/number-field';
import { RecordPicker, type PickedRef } from '../ui/record-picker';
import { ErrorState, LoadingState } from '../ui/states';
import { useIsWide } from '../use-layout';
import { CheckFiles } from './check-files';
import { CheckResult } from './check-result';
import { HoldPanel } from './hold-panel';
import { LotNumberField } from './lot-number-field';
import { OpeningEditor, type OpeningDraft } from './opening-editor';
import { LinkButton, SectionTitle, TextLink } from './parts';
import { revealNativeId } from './reveal';

type DrumMode = 'pick' | 'describe';
const MODES = [
  { value: 'pick', label: 'Pick the drum type' },
  { value: 'describe', label: 'Measure the drum' },
] as const;

const DOCK_ROLES = ['clerk', 'engineer', 'admin'];
const RESULT_ID = 'dock-result';
let openingSeq = 0;
const newOpening = (label: string): OpeningDraft => ({ key: `o${++openingSeq}`, label, threadCode: null, keyCode: null });

type Errors = Record<string, string | null | undefined>;

/** The dock check: a lot's drums checked against the site's hardware, recorded, and held when they do not fit. */
export function DockCheckScreen() {
  const wide = useIsWide();
  const { session } = useSession();
  const { unit } = useLengthUnit();
  const create = useReceivingCheckCreateMutation();
  const [recordId, setRecordId] = useState<string | undefined>();
  const record = useReceivingCheckQuery(recordId);

  const [lot, setLot] = useState('');
  // The scanned drum label (GTIN, dates, serial) for the lot's checks; null when the lot was typed.
  const [label, setLabel] = useState<DrumLabel | null>(null);
  const [count, setCount] = useState('1');
  const [supplier, setSupplier] = useState<PickedRef | null>(null);
  const [slurry, setSlurry] = useState<PickedRef | null>(null);
  const [mode, setMode] = useState<DrumMode>('pick');
  const [drumType, setDrumType] = useState<PickedRef | null>(null);
  const [openings, setOpenings] = useState<OpeningDraft[]>(() => [newOpening('large bung')]);
  const [depth, setDepth] = useState<LengthDraft>(() => lengthDraft(null, unit));
  const [station, setStation] = useState<PickedRef | null>(null);
  const [errors, setErrors] = useState<Errors>({});
  const [formError, setFormError] = useState<string | null>(null);
  const lotRef = useRef<TextInput>(null);
  const shown = !!recordId && !!record.data;

  // The verdict replaces the form: bring its top into view (the form was scrolled to its submit button).
  useEffect(() => {
    if (shown) revealNativeId(RESULT_ID);
  }, [shown, recordId]);

  if (session && !DOCK_ROLES.includes(session.user.role)) {
    return (
      <Screen title="Dock check" subtitle="Clerks, engineers and administrators record dock checks." testID="dock-screen">
        <Card>
          <Text style={type.body}>You can read every recorded check and its verdict in the history.</Text>
          <LinkButton href="/receive/history" label="Open the check history" variant="primary" testID="dock-history-link" />
        </Card>
      </Screen>
    );
  }

  const validate = (): { body: ReceivingCheckInput | null; problems: Errors } => {
    const problems: Errors = {};
    const n = parseNumber(count);
    if (!lot.trim()) problems.lotNumber = 'Enter the lot number from the drum label.';
    else problems.lotNumber = lotNumberProblem(lot.trim());
    if (n === null || Number.isNaN(n) || !Number.isInteger(n) || n < 1) problems.drumCount = 'Enter how many drums arrived: a whole number, 1 or more.';
    let drum: ReceivingCheckInput['drum'];
    if (mode === 'pick') {
      if (!drumType) problems.drumTypeId = 'Pick the drum type, or measure the drum instead.';
    } else {
      const mm = lengthDraftMm(depth);
      if (mm === null || Number.isNaN(mm) || mm <= 0) problems.depth = 'Enter the inside depth, from the bung seat to the inside bottom.';
      openings.forEach((o, i) => {
        if (!o.threadCode) problems[`opening${i}`] = 'Identify this bung’s thread and pick it.';
      });
      drum = { insideDepthMm: mm ?? 0, openings: openings.map((o) => ({ label: o.label, threadCode: o.threadCode ?? '', keyCode: o.keyCode?.id ?? null })) };
    }
    if (Object.values(problems).some(Boolean)) return { body: null, problems };
    return {
      problems,
      body: {
        lotNumber: lot.trim(),
        drumCount: n!,
        ...(supplier ? { supplierId: supplier.id } : {}),
        ...(slurry ? { slurryId: slurry.id } : {}),
        ...(mode === 'pick' ? { drumTypeId: drumType!.id } : { drum }),
        ...(station ? { stationId: station.id } : {}),
      },
    };
  };

  const submit = () => {
    const { body, problems } = validate();
    setErrors(problems);
    setFormError(null);
    if (!body) {
      setFormError('Some fields need attention; see the messages beside them.');
      return;
    }
    create.mutate(body, {
      onSuccess: (saved) => setRecordId(saved.id),
      onError: (err) => {
        const f = err instanceof ApiError ? err.fieldMessages() : {};
        const next: Errors = {
          lotNumber: f.lotNumber && `Lot number ${f.lotNumber}.`,
          drumCount: f.drumCount && `Drum count ${f.drumCount}.`,
          supplierId: f.supplierId && `Supplier ${f.supplierId}.`,
          slurryId: f.slurryId && `Slurry ${f.slurryId}.`,
          drumTypeId: f.drumTypeId && `Drum type ${f.drumTypeId}.`,
          depth: (f['drum.insideDepthMm'] || f.drum) && `Inside depth ${f['drum.insideDepthMm'] ?? f.drum}.`,
          stationId: f.stationId && `Station ${f.stationId}.`,
        };
        openings.forEach((_o, i) => {
          const m = f[`drum.openings.${i}.threadCode`] ?? f[`drum.openings.${i}.keyCode`];
          if (m) next[`opening${i}`] = `This opening ${m}.`;
        });
        setErrors(next);
        setFormError(Object.values(next).some(Boolean) ? 'The check was refused; see the messages beside the fields.' : err.message);
      },
    });
  };

  const startAgain = () => {
    setRecordId(undefined);
    setLot('');
    setLabel(null);
    setCount('1');
    setSupplier(null);
    setSlurry(null);
    setStation(null);
    setMode('pick');
    setDrumType(null);
    setOpenings([newOpening('large bung')]);
    setDepth(lengthDraft(null, unit));
    setErrors({});
    setFormError(null);
    create.reset();
    setTimeout(() => lotRef.current?.focus(), 0);
  };

  const actions = <LinkButton href="/receive/history" label="Check history" testID="dock-history-link" />;

  if (recordId) {
    return (
      <Screen title="Dock check" subtitle="The verdict for this lot, recorded with who checked it and when." actions={actions} testID="dock-screen">
        <View nativeID={RESULT_ID} />
        {record.isPending ? (
          <LoadingState label="Loading the check…" />
        ) : record.isError ? (
          <ErrorState error={record.error} onRetry={() => record.refetch()} />
        ) : (
          <CheckResult
            record={record.data}
            wide={wide}
            hold={<HoldPanel record={record.data} prefix="dock" />}
            files={<CheckFiles checkId={record.data.id} />}
            after={
              <TextLink href={`/receive/${record.data.id}`} testID="dock-lot-link">
                Open the lot page
              </TextLink>
            }
          />
        )}
        <View style={styles.again}>
          <Button label="Check another lot" onPress={startAgain} testID="dock-new" />
        </View>
      </Screen>
    );
  }

  const lotCard = (
    <Card>
      <SectionTitle>The lot</SectionTitle>
      <LotNumberField ref={lotRef} value={lot} onChangeText={setLot} label={label} onLabel={setLabel} error={errors.lotNumber} testID="dock-lot" />
      <NumberField label="Drums in this lot" value={count} onChangeText={setCount} inputMode="numeric" suffix="drums" error={errors.drumCount} testID="dock-count" />
      <RecordPicker<SlurryRecord>
        label="Slurry"
        hint="Foaming and shear-sensitive slurries are checked against the station."
        source={slurryQueries}
        toOption={(s) => ({ id: s.id, label: s.name, detail: s.supplierName ?? undefined })}
        value={slurry}
        onChange={(picked, rec) => {
          setSlurry(picked);
          // The slurry's supplier and usual drum fill in what is still empty.
          if (rec && !supplier && rec.supplierName) setSupplier({ id: rec.supplierId, label: `${rec.supplierName} (${REGION_LABELS[rec.region]})` });
          if (rec && !drumType && rec.drumTypeName && mode === 'pick') setDrumType({ id: rec.drumTypeId, label: rec.drumTypeName });
        }}
        noneLabel="Not recorded"
        error={errors.slurryId}
        testID="dock-slurry"
      />
      <RecordPicker<SupplierRecord>
        label="Supplier"
        source={supplierQueries}
        toOption={(s) => ({ id: s.id, label: `${s.name} (${REGION_LABELS[s.region]})` })}
        value={supplier}
        onChange={setSupplier}
        noneLabel="Not recorded"
        error={errors.supplierId}
        testID="dock-supplier"
      />
    </Card>
  );

  const drumCard = (
    <Card>
      <SectionTitle>The drum</SectionTitle>
      <ChoiceChips label="How do you know the drum?" options={MODES} value={mode} onChange={setMode} testID="dock-drum-mode" />
      {mode === 'pick' ? (
        <RecordPicker<DrumTypeRecord>
          label="Drum type"
          hint="Search by name, part number or supplier."
          source={drumTypeQueries}
          toOption={(d) => ({ id: d.id, label: d.name, detail: `${d.partNumber} · ${d.supplierName ?? ''} · ${d.openings.map((o) => o.threadCode).join(' + ')}` })}
          value={drumType}
          onChange={setDrumType}
          error={errors.drumTypeId}
          testID="dock-drum"
        />
      ) : (
        <View style={styles.describe}>
          <Text style={type.body}>Not in the registry, or no label? Measure each bung and the inside depth.</Text>
          {openings.map((o, i) => (
            <OpeningEditor
              key={o.key}
              index={i}
              value={o}
              onChange={(next) => setOpenings((list) => list.map((x) => (x.key === o.key ? next : x)))}
              onRemove={openings.length > 1 ? () => setOpenings((list) => list.filter((x) => x.key !== o.key)) : undefined}
              error={errors[`opening${i}`]}
              testID={`dock-opening-${i}`}
            />
          ))}
          {openings.length < 3 ? (
            <Button label="Add another bung" variant="secondary" onPress={() => setOpenings((list) => [...list, newOpening(list.length === 1 ? 'small bung' : 'centre bung')])} testID="dock-add-opening" />
          ) : null}
          <LengthField
            label="Inside depth"
            hint="From the bung seat to the inside bottom (a dip stick or tape through the large bung)."
            value={depth}
            onChange={setDepth}
            placeholder={depth.unit === 'in' ? 'e.g. 32.2' : 'e.g. 818'}
            error={errors.depth}
            testID="dock-depth"
          />
        </View>
      )}
    </Card>
  );

  const stationCard = (
    <Card>
      <SectionTitle>Station (optional)</SectionTitle>
      <RecordPicker<StationRecord>
        label="Station the lot is for"
        hint="Adds the station's tapping, agitation, installed head and ready tube set to the check."
        source={stationQueries}
        toOption={(s) => ({ id: s.id, label: s.name, detail: `${s.bay} · head ${s.connectorPartNumber ?? 'none'}` })}
        value={station}
        onChange={setStation}
        noneLabel="No station: check the pairings only"
        error={errors.stationId}
        testID="dock-station"
      />
    </Card>
  );

  const submitRow = (
    <View style={styles.submit}>
      {formError ? (
        <Text role="alert" style={styles.formError} testID="dock-error">
          {formError}
        </Text>
      ) : null}
      <Button label="Check and record the lot" busy={create.isPending} onPress={submit} testID="dock-submit" />
    </View>
  );

  return (
    <Screen title="Dock check" subtitle="Check an arriving lot against the site's tubes and heads before its drums go to a station." actions={actions} testID="dock-screen">
      {wide ? (
        <View style={styles.columns}>
          <View style={styles.col}>
            {lotCard}
            <HandlingCaution />
          </View>
          <View style={styles.col}>
            {drumCard}
            {stationCard}
            {submitRow}
          </View>
        </View>
      ) : (
        <>
          {lotCard}
          {drumCard}
          {stationCard}
          <HandlingCaution />
          {submitRow}
        </>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  columns: { flexDirection: 'row', gap: space.lg, alignItems: 'flex-start' },
  col: { flex: 1, minWidth: 0, gap: space.lg },
  describe: { gap: space.md },
  submit: { gap: space.sm },
  formError: { fontFamily: fonts.semibold, fontSize: 15, color: colors.danger },
  again: { flexDirection: 'row' },
});

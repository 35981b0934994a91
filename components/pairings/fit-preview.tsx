import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { ConnectorRecord, DipTubeRecord, DrumTypeRecord, PairingStatus } from '@/shared/contract/records';
import type { StationInput } from '@/shared/fit';
import { drumTypeQueries } from '../data/drum-types';
import { fitSettingsOf, useSettingsQuery } from '../data/settings';
import { RULE_LABELS, RuleList, VerdictBanner } from '../fit/verdict';
import { DrumTypePicker } from '../forms/pickers';
import { AGITATION_OPTIONS, TAPPING_OPTIONS } from '../forms/options';
import { colors, space, type } from '../theme';
import { Card } from '../ui/card';
import { ChoiceChips } from '../ui/choice-chips';
import { NumberField, parseNumber } from '../ui/number-field';
import type { PickedRef } from '../ui/record-picker';
import { ErrorState, LoadingState } from '../ui/states';
import { previewFit } from './preview-fit';

type Tapping = 'none' | StationInput['tapping'];
const STATION_OPTIONS: ReadonlyArray<{ value: Tapping; label: string }> = [{ value: 'none', label: 'No station' }, ...TAPPING_OPTIONS];

interface FitPreviewProps {
  tube: DipTubeRecord | null;
  connector: ConnectorRecord | null;
  status: PairingStatus;
}

/**
 * The verdict of the tube and head being paired, recomputed on every pick with the shared fit rules and the
 * site's settings. The drum type and station are context for the check only; they are not saved.
 */
export function FitPreview({ tube, connector, status }: FitPreviewProps) {
  const settings = useSettingsQuery();
  const [drumRef, setDrumRef] = useState<PickedRef | null>(null);
  const [pickedDrum, setPickedDrum] = useState<DrumTypeRecord | null>(null);
  const drumDetail = drumTypeQueries.useDetail(drumRef && pickedDrum?.id !== drumRef.id ? drumRef.id : undefined);
  const drum = drumRef ? (pickedDrum?.id === drumRef.id ? pickedDrum : (drumDetail.data ?? null)) : null;
  const [tapping, setTapping] = useState<Tapping>('none');
  const [agitation, setAgitation] = useState<StationInput['agitation']>('pump');
  const [flow, setFlow] = useState('');

  const flowValue = parseNumber(flow);
  const flowError = flowValue !== null && (Number.isNaN(flowValue) || flowValue <= 0) ? 'Flow must be a number more than 0 L/min, or left empty.' : null;
  const station: StationInput | null = tapping === 'none' ? null : { tapping, agitation, ...(flowValue !== null && !flowError ? { flowLpm: flowValue } : {}) };

  // Cheap enough to run on every render: a handful of comparisons and one flow computation.
  const result = (() => {
    if (!tube || !connector || !settings.data || (drumRef && !drum)) return null;
    try {
      return { ok: true as const, ...previewFit({ drum, tube, connector, station, status, settings: fitSettingsOf(settings.data) }) };
    } catch (err) {
      // The rules refuse values no drum could have (a drum shallower than the clearance window).
      return { ok: false as const, message: err instanceof Error ? err.message : String(err) };
    }
  })();

  let body;
  if (!tube || !connector) {
    body = (
      <Text style={type.body} testID="fit-preview-empty">
        Pick a dip tube and a connector to see whether they fit.
      </Text>
    );
  } else if (settings.isPending || (drumRef && !drum && !drumDetail.isError)) {
    body = <LoadingState label="Loading the site's fit settings…" />;
  } else if (settings.isError) {
    body = <ErrorState error={settings.error} onRetry={() => settings.refetch()} />;
  } else if (drumDetail.isError) {
    body = <ErrorState error={drumDetail.error} onRetry={() => drumDetail.refetch()} />;
  } else if (result && !result.ok) {
    body = (
      <Text role="alert" style={[type.body, { color: colors.danger }]}>
        The check could not run: {result.message}
      </Text>
    );
  } else if (result?.ok) {
    const missing = result.notChecked.map((n) => RULE_LABELS[n.rule] ?? n.rule);
    const context = station
      ? `, ${station.tapping} tapping with ${station.agitation === 'pump' ? 'pump recirculation' : 'a mechanical stirrer'}${station.flowLpm ? ` at ${station.flowLpm} L/min` : ''}`
      : ', no station';
    const summary = drum ? `In drum ${drum.partNumber}${context}.` : 'Tube and head only: pick a drum type to check thread, reach and openings.';
    body = (
      <View style={styles.result}>
        <VerdictBanner verdict={result.verdict} summary={summary} testID="fit-preview-verdict" />
        <RuleList rules={result.rules} testID="fit-preview-rules" />
        {missing.length ? (
          <Text style={type.small} testID="fit-preview-not-checked">
            Not checked: {result.notChecked.map((n) => `${RULE_LABELS[n.rule] ?? n.rule} (${n.reason.replace(/^not checked: /, '')})`).join('; ')}.
          </Text>
        ) : null}
      </View>
    );
  }

  return (
    <Card testID="fit-preview" style={styles.card}>
      <Text role="heading" aria-level={2} style={type.heading}>
        Fit preview
      </Text>
      <Text style={type.small}>Checked here as you pick, with the site&apos;s rules. The drum and station below are for the check only and are not saved.</Text>
      <DrumTypePicker
        label="Drum type to check against"
        noneLabel="No drum type"
        value={drumRef}
        onChange={(p, d) => {
          setDrumRef(p);
          setPickedDrum(d);
        }}
        testID="fit-drum"
      />
      <ChoiceChips label="Station tapping" options={STATION_OPTIONS} value={tapping} onChange={setTapping} testID="fit-tapping" />
      {tapping !== 'none' ? (
        <>
          <ChoiceChips label="Agitation" options={AGITATION_OPTIONS} value={agitation} onChange={setAgitation} testID="fit-agitation" />
          <NumberField label="Recirculation flow" hint="Optional; gives the return velocity." suffix="L/min" value={flow} onChangeText={setFlow} error={flowError} testID="fit-flow" />
        </>
      ) : null}
      <View style={styles.divider} />
      {body}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: space.md },
  result: { gap: space.md },
  divider: { height: 1, backgroundColor: colors.line },
});

import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { FitCandidateRecord, FitCheckResult } from '@/shared/contract/records';
import { formatDay, TEMPERATURE_INDICATOR_LABELS } from '@/shared/acceptance';
import { RULE_LABELS, RuleList, VerdictChip } from '../fit/verdict';
import type { ReceivingCheckRecord } from '../data/receiving';
import { useLengthUnit } from '../data/me';
import { stationQueries } from '../data/stations';
import { colors, fonts, space, type } from '../theme';
import { Card } from '../ui/card';
import { Disclosure } from '../ui/disclosure';
import { HandlingCaution } from '../ui/handling-caution';
import { DrumSection } from './drum-section';
import { LotVerdictBanner } from './lot-verdict';
import { Fact, FactGrid } from '../ui/facts';
import { formatWhen } from '../ui/format';
import { SectionTitle } from '../ui/section-title';

/** What drum the lot came in: the registry's drum type, or what the clerk described at the dock. */
export function drumLabel(record: Pick<ReceivingCheckRecord, 'drumTypeName' | 'drumTypePartNumber' | 'drumDescription'>, show: (mm: number) => string): string {
  if (record.drumTypeName) return `${record.drumTypeName} (${record.drumTypePartNumber})`;
  const d = record.drumDescription;
  if (!d) return '—';
  return `Described at the dock: ${d.openings.map((o) => o.threadCode).join(' + ')}, ${show(d.insideDepthMm)} deep`;
}

/** The recorded check: lot, drums, drum, who and when. */
export function RecordFacts({ record, wide }: { record: ReceivingCheckRecord; wide: boolean }) {
  const { show } = useLengthUnit();
  return (
    <FactGrid wide={wide}>
      <Fact label="Lot" value={record.lotNumber} testID="record-lot" />
      <Fact label="Drums" value={String(record.drumCount)} testID="record-drums" />
      <Fact label="Drum" value={drumLabel(record, (mm) => show(mm, 0))} testID="record-drum" />
      <Fact label="Supplier" value={record.supplierName ?? 'Not recorded'} />
      <Fact label="Slurry" value={record.slurryName ?? 'Not recorded'} />
      <Fact label="Station" value={record.stationName ?? 'None chosen'} />
      <Fact label="Produced" value={record.productionDate ? formatDay(record.productionDate) : 'Not recorded'} testID="record-production" />
      <Fact label="Expires" value={record.expiryDate ? formatDay(record.expiryDate) : 'Not on the label'} testID="record-expiry" />
      <Fact label="Temperature indicator" value={record.temperatureIndicator ? TEMPERATURE_INDICATOR_LABELS[record.temperatureIndicator] : 'Not recorded'} testID="record-indicator" />
      <Fact label="Checked by" value={`${record.checkedByName ?? '—'}, ${formatWhen(record.checkedAt)}`} testID="record-checked" />
    </FactGrid>
  );
}

/** The pairing to use and where: the station checked against, or the stations with that head installed. */
function UseThis({ result }: { result: FitCheckResult }) {
  const best = result.candidates[0];
  const stations = stationQueries.useList({ pageSize: 200 }, { enabled: !!best && !result.station });
  if (!best) {
    return (
      <Text style={type.body} testID="check-use">
        No registered dip tube and head pairing threads into this drum's openings. Do not tap it: hold the lot so a buyer orders hardware for this drum design.
      </Text>
    );
  }
  const approved = best.pairingStatus === 'approved';
  const withHead = (stations.data?.items ?? []).filter((s) => s.connectorId === best.connectorId);
  const where = result.station?.name
    ? `at ${result.station.name}${best.installedAtStation ? ', where this head is installed' : ` (this head is not installed there)`}`
    : stations.isPending
      ? ''
      : withHead.length
        ? `at ${withHead.map((s) => s.name).join(' or ')} (stations with this head installed)`
        : 'No station has this head installed yet.';
  const lead = result.verdict === 'fits' ? 'Use' : result.verdict === 'caution' ? 'Use only once the caution is settled:' : 'Nothing fits. Closest pairing:';
  return (
    <View style={styles.use} testID="check-use">
      <Text style={type.body}>
        {lead} dip tube{' '}
        <Text style={styles.part} testID="check-use-tube">
          {best.dipTubePartNumber}
        </Text>{' '}
        with head{' '}
        <Text style={styles.part} testID="check-use-head">
          {best.connectorPartNumber}
        </Text>{' '}
        ({approved ? 'approved pairing' : best.pairingStatus === 'draft' ? 'pairing not yet approved' : 'pairing retired'})
      </Text>
      {result.verdict !== 'no-fit' && where ? (
        <Text style={[type.body, styles.station]} testID="check-use-station">
          {where}
        </Text>
      ) : null}
    </View>
  );
}

function NotChecked({ candidate }: { candidate: FitCandidateRecord }) {
  return <NotCheckedList items={candidate.notChecked} />;
}

/** The rules that could not be judged, each with why. */
function NotCheckedList({ items }: { items: ReadonlyArray<{ rule: string; reason: string }> | undefined }) {
  if (!items?.length) return null;
  return (
    <View style={styles.notChecked}>
      <Text style={type.label}>Not checked</Text>
      {items.map((n) => (
        <Text key={n.rule} style={type.small}>
          • {RULE_LABELS[n.rule] ?? n.rule}: {n.reason.replace(/^not checked: /, '')}
        </Text>
      ))}
    </View>
  );
}

/** The other pairings judged, each with its verdict and first problem. */
function OtherCandidates({ result }: { result: FitCheckResult }) {
  const others = result.candidates.slice(1);
  if (!others.length) return null;
  return (
    <Card testID="check-others">
      <SectionTitle>Other pairings checked</SectionTitle>
      {others.map((c) => {
        const problem = c.rules.find((r) => r.outcome === 'fail') ?? c.rules.find((r) => r.outcome === 'caution');
        return (
          <View key={`${c.dipTubeId}-${c.connectorId}`} style={styles.other}>
            <View style={styles.otherHead}>
              <VerdictChip verdict={c.verdict} />
              <Text style={[type.label, styles.shrink]}>
                {c.dipTubePartNumber} with {c.connectorPartNumber}
              </Text>
            </View>
            {problem ? <Text style={type.small}>{problem.message}</Text> : null}
          </View>
        );
      })}
      {result.candidateCount > result.candidates.length ? (
        <Text style={type.small}>
          Showing {result.candidates.length} of {result.candidateCount} pairings checked.
        </Text>
      ) : null}
    </Card>
  );
}

/** The lot acceptance rules, each with its reason (the hardware rules are listed apart). */
function AcceptanceRules({ record }: { record: ReceivingCheckRecord }) {
  const acceptance = record.lotVerdict?.acceptance;
  if (!acceptance) return null;
  return (
    <Card testID="check-acceptance">
      <SectionTitle>The lot: each rule</SectionTitle>
      <RuleList rules={acceptance.rules} testID="acceptance" />
      <NotCheckedList items={acceptance.notChecked} />
    </Card>
  );
}

interface CheckResultProps {
  record: ReceivingCheckRecord;
  wide: boolean;
  /** The hold or release panel, placed right under the verdict. */
  hold?: ReactNode;
  /** Placed after the facts (e.g. a link to the lot page). */
  after?: ReactNode;
  /** The files kept with the check (delivery notes, label photos, the certificate). */
  files?: ReactNode;
}

/**
 * A recorded check: the verdict in one sentence first, what holds the lot and who lifts it, then the details
 * (what to use, each rule, the drum in section, the record, files), collapsed on a phone.
 */
export function CheckResult({ record, wide, hold, after, files }: CheckResultProps) {
  const result = record.result;
  const best = result.candidates[0];
  const recorded = (
    <Card testID="check-record">
      <SectionTitle>Recorded</SectionTitle>
      <RecordFacts record={record} wide={wide} />
      {after}
    </Card>
  );
  const use = (
    <Card>
      <SectionTitle>What to use</SectionTitle>
      <UseThis result={result} />
    </Card>
  );
  const why = best ? (
    <Card>
      <SectionTitle>The hardware: each rule for {best.dipTubePartNumber}</SectionTitle>
      <RuleList rules={best.rules} testID="rules" />
      <NotChecked candidate={best} />
    </Card>
  ) : null;
  const drawing = (
    <Card>
      <SectionTitle>Drum in section</SectionTitle>
      <DrumSection result={result} />
    </Card>
  );
  const caution = <HandlingCaution items={result.cautions?.length ? result.cautions : undefined} />;

  if (!wide) {
    return (
      <View style={styles.column} testID="check-result">
        <LotVerdictBanner record={record} />
        {hold}
        {caution}
        <Disclosure title="Details: each rule, the drum drawing, files" initiallyOpen={false} testID="check-details">
          {use}
          <AcceptanceRules record={record} />
          {why}
          {drawing}
          {recorded}
          {files}
          <OtherCandidates result={result} />
        </Disclosure>
      </View>
    );
  }
  return (
    <View style={[styles.wrap, styles.wrapWide]} testID="check-result">
      <View style={[styles.column, styles.half]}>
        <LotVerdictBanner record={record} />
        {hold}
        {use}
        <AcceptanceRules record={record} />
        {why}
        {recorded}
      </View>
      <View style={[styles.column, styles.half]}>
        {caution}
        {drawing}
        {files}
        <OtherCandidates result={result} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  wrapWide: { flexDirection: 'row', alignItems: 'flex-start' },
  half: { flex: 1, minWidth: 0 },
  column: { gap: space.lg },
  use: { gap: space.xs },
  part: { fontFamily: fonts.bold, color: colors.ink },
  station: { fontFamily: fonts.semibold },
  notChecked: { gap: 2, marginTop: space.sm },
  other: { gap: 2, paddingVertical: space.xs, borderTopWidth: 1, borderTopColor: colors.line },
  otherHead: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  shrink: { flexShrink: 1 },
});

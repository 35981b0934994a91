import { StyleSheet, Text, View } from 'react-native';
import { REGION_LABELS } from '@/shared/contract/records';
import { VerdictChip } from '../fit/verdict';
import { useSourcingPlanQuery, type StationNeed } from '../data/sourcing';
import { Fact, FactGrid } from '../ui/facts';
import { formatDate, formatWhen } from '../ui/format';
import { LinkButton } from '../ui/link-button';
import { SectionTitle } from '../ui/section-title';
import { TextLink } from '../ui/text-link';
import { Screen } from '../screen';
import { colors, fonts, space, type } from '../theme';
import { Card } from '../ui/card';
import { ErrorState, LoadingState } from '../ui/states';
import { useIsWide } from '../use-layout';
import { OrderList } from './order-list';
import { WarningStatusChip } from './warning-status';

/** A plan's impact: each station the drum would reach, whether its hardware fits, and what to order. */
export function PlanScreen({ id }: { id: string }) {
  const wide = useIsWide();
  const plan = useSourcingPlanQuery(id);
  const actions = (
    <>
      <LinkButton href="/sourcing" label="All plans" testID="plan-back" />
      <LinkButton href="/sourcing/warnings" label="Hardware warnings" testID="plan-warnings-link" />
    </>
  );
  if (plan.isPending || plan.isError) {
    return (
      <Screen title="Sourcing plan" actions={actions} testID="plan-screen">
        {plan.isPending ? <LoadingState label="Working out the impact…" /> : <ErrorState error={plan.error} onRetry={() => plan.refetch()} />}
      </Screen>
    );
  }
  const p = plan.data;
  const region = p.region ? REGION_LABELS[p.region] : '—';
  const lacking = p.impact.stations.filter((s) => s.verdict !== 'fits' || s.order.length > 0).length;

  const stations = (
    <Card testID="plan-stations">
      <SectionTitle>Stations that would receive it</SectionTitle>
      <Text style={type.body} testID="plan-verdict-count">
        {lacking === 0 ? `All ${p.impact.stations.length} stations can run this drum with the hardware they have.` : `${lacking} of ${p.impact.stations.length} stations need hardware for this drum.`}
      </Text>
      <View role="list" style={styles.stations}>
        {p.impact.stations.map((s) => (
          <StationRow key={s.stationId} s={s} />
        ))}
      </View>
    </Card>
  );
  const order = (
    <Card testID="plan-order">
      <SectionTitle>What to order</SectionTitle>
      <Text style={type.small}>Three tube sets per drum position: one online, one in the standby drum, one being cleaned.</Text>
      <OrderList order={p.impact.order} />
    </Card>
  );
  const warnings = (
    <Card testID="plan-warnings">
      <SectionTitle>Warning</SectionTitle>
      {p.warnings.length === 0 ? (
        <Text style={type.body}>No warning: nothing is missing for this plan.</Text>
      ) : (
        p.warnings.map((w) => (
          <View key={w.id} style={styles.warning}>
            <WarningStatusChip status={w.status} testID={`plan-warning-${w.status}`} />
            <Text style={type.body}>{w.summary}</Text>
            <TextLink href="/sourcing/warnings">Follow it on the warnings page</TextLink>
          </View>
        ))
      )}
    </Card>
  );

  return (
    <Screen
      title={p.slurryName}
      subtitle={`From ${p.supplierName ?? '—'} (${region}) from ${formatDate(p.startDate)}, ${p.drumsPerMonth} drums a month`}
      actions={actions}
      testID="plan-screen"
      columns={
        wide
          ? [
              stations,
              <>
                {order}
                {warnings}
              </>,
            ]
          : undefined
      }
    >
      <Card testID="plan-summary">
        <FactGrid wide={wide}>
          <Fact label="Supplier" value={`${p.supplierName ?? '—'} (${region})`} />
          <Fact label="Drum type" value={`${p.drumTypeName ?? '—'} (${p.drumTypePartNumber ?? '—'})`} />
          <Fact label="First delivery" value={formatDate(p.startDate)} />
          <Fact label="Drums a month" value={String(p.drumsPerMonth)} />
          <Fact label="Slurry" value={[p.foams ? 'foams' : 'does not foam', p.shearSensitive ? 'shear-sensitive' : 'not shear-sensitive'].join(', ')} />
          <Fact label="Planned by" value={`${p.createdByName ?? '—'}, ${formatWhen(p.createdAt)}`} />
        </FactGrid>
        {p.notes ? <Text style={type.body}>Notes: {p.notes}</Text> : null}
      </Card>
      {/* A phone shows what to order before the stations it is for. */}
      {wide ? null : (
        <>
          {order}
          {warnings}
          {stations}
        </>
      )}
    </Screen>
  );
}

function StationRow({ s }: { s: StationNeed }) {
  return (
    <View role="listitem" style={styles.station} testID={`plan-station-${s.stationName}`}>
      <View style={styles.stationHead}>
        <TextLink href={`/stations/${s.stationId}`}>{s.stationName}</TextLink>
        <VerdictChip verdict={s.verdict} />
      </View>
      <Text style={type.body}>{s.summary}</Text>
      {s.order.length ? (
        <Text style={type.small}>
          Needs: {s.order.map((o) => `${o.count} × ${o.partNumber ?? (o.kind === 'approval' ? 'approval' : `${o.description.split(' for ')[0].toLowerCase()} to specification`)}`).join(', ')}
        </Text>
      ) : (
        <Text style={[type.small, { color: colors.fits, fontFamily: fonts.semibold }]}>✓ Nothing to order</Text>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  stations: { gap: space.md },
  station: { gap: space.xs, paddingTop: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
  stationHead: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap', justifyContent: 'space-between' },
  warning: { gap: space.xs },
});

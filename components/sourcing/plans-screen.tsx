import { can } from '@/shared/contract/roles';
import { Link } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import { REGION_LABELS } from '@/shared/contract/records';
import { useSourcingPlansQuery, type SourcingPlanRecord } from '../data/sourcing';
import { useWarningsQuery } from '../data/warnings';
import { formatDate, formatWhen } from '../ui/format';
import { LinkButton } from '../ui/link-button';
import { SectionTitle } from '../ui/section-title';
import { Screen } from '../screen';
import { useSession } from '../session';
import { colors, fonts, minTouch, radius, space, type } from '../theme';
import { ErrorState, LoadingState } from '../ui/states';
import { PlanForm } from './plan-form';

/** Sourcing plans: a new plan's form beside the plans made so far. */
export function PlansScreen() {
  const { session } = useSession();
  const plans = useSourcingPlansQuery();
  const open = useWarningsQuery('open');
  const canPlan = can(session?.user.role, 'plan-sourcing');
  const openCount = open.data?.total;
  const actions = <LinkButton href="/sourcing/warnings" label={openCount ? `Hardware warnings (${openCount} open)` : 'Hardware warnings'} testID="sourcing-warnings-link" />;

  const list = (
    <View style={styles.column}>
      <SectionTitle>Plans</SectionTitle>
      {plans.isPending ? (
        <LoadingState label="Loading plans…" />
      ) : plans.isError ? (
        <ErrorState error={plans.error} onRetry={() => plans.refetch()} />
      ) : plans.data.items.length === 0 ? (
        <View style={styles.empty} testID="plans-empty">
          <Text style={type.label}>No sourcing plans yet</Text>
          <Text style={type.body}>
            {canPlan ? 'Fill in the form to see which stations a new slurry source would reach and what hardware to order.' : 'Buyers and engineers plan new slurry sources here.'}
          </Text>
        </View>
      ) : (
        <View role="list" aria-label="Sourcing plans" style={styles.list} testID="plan-list">
          {plans.data.items.map((p) => (
            <PlanRow key={p.id} plan={p} />
          ))}
        </View>
      )}
    </View>
  );

  return (
    <Screen
      title="Sourcing"
      subtitle="Before buying from a new supplier or region: which stations its drums reach, whether they fit, what to order."
      actions={actions}
      testID="sourcing-screen"
      columns={canPlan ? [<PlanForm />, list] : undefined}
      split={[1.1, 1]}
    >
      {canPlan ? null : list}
    </Screen>
  );
}

function PlanRow({ plan }: { plan: SourcingPlanRecord }) {
  return (
    <View role="listitem">
      <Link href={`/sourcing/${plan.id}` as never} testID={`plan-row-${plan.slurryName}`} style={styles.row}>
        <View style={styles.rowInner}>
          <Text style={styles.rowTitle}>{plan.slurryName}</Text>
          <Text style={type.body}>
            {plan.supplierName ?? '—'} ({plan.region ? REGION_LABELS[plan.region] : '—'}), from {formatDate(plan.startDate)}, {plan.drumsPerMonth} drums a month
          </Text>
          <Text style={type.small}>
            {plan.drumTypeName ?? '—'} · {plan.stationIds.length} station{plan.stationIds.length === 1 ? '' : 's'} · by {plan.createdByName ?? '—'}, {formatWhen(plan.createdAt)}
          </Text>
        </View>
      </Link>
    </View>
  );
}

const styles = StyleSheet.create({
  column: { gap: space.md },
  empty: { gap: space.sm, padding: space.lg, borderRadius: radius.md, backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line },
  list: { backgroundColor: colors.surface, borderRadius: radius.lg, borderWidth: 1, borderColor: colors.line, overflow: 'hidden' },
  row: { display: 'flex' as never, minHeight: minTouch, borderBottomWidth: 1, borderBottomColor: colors.line },
  rowInner: { padding: space.md, gap: 2 },
  rowTitle: { fontFamily: fonts.bold, fontSize: 18, color: colors.primary, textDecorationLine: 'underline' },
});

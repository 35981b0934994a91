import { can } from '@/shared/contract/roles';
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { useMoveWarningMutation, useWarningsQuery, type HardwareWarningRecord, type WarningStatus } from '../data/warnings';
import { formatWhen } from '../ui/format';
import { LinkButton } from '../ui/link-button';
import { TextLink } from '../ui/text-link';
import { Screen } from '../screen';
import { useSession } from '../session';
import { colors, fonts, radius, space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ChoiceChips } from '../ui/choice-chips';
import { EmptyState, ErrorState, LoadingState } from '../ui/states';
import { useIsWide } from '../use-layout';
import { WarningStatusChip } from './warning-status';

const FILTERS = [
  { value: 'all', label: 'All' },
  { value: 'open', label: 'Open' },
  { value: 'acknowledged', label: 'Acknowledged' },
  { value: 'resolved', label: 'Resolved' },
] as const;

/** Every plan or held lot that needs hardware the site lacks, moved open -> acknowledged -> resolved. */
export function WarningsScreen() {
  const wide = useIsWide();
  const [filter, setFilter] = useState<'all' | WarningStatus>('all');
  const list = useWarningsQuery(filter === 'all' ? undefined : filter);
  const { session } = useSession();
  const canMove = can(session?.user.role, 'plan-sourcing');

  return (
    <Screen
      title="Hardware warnings"
      subtitle="Plans and held lots that need hardware the site does not have yet."
      actions={<LinkButton href="/sourcing" label="Sourcing plans" testID="warnings-plans-link" />}
      testID="warnings-screen"
    >
      <ChoiceChips label="Show" options={FILTERS} value={filter} onChange={setFilter} testID="warnings-filter" />
      {list.isPending ? (
        <LoadingState label="Loading warnings…" />
      ) : list.isError ? (
        <ErrorState error={list.error} onRetry={() => list.refetch()} />
      ) : list.data.items.length === 0 ? (
        <EmptyState
          title={filter === 'all' ? 'No hardware warnings' : `No ${filter} warnings`}
          next={filter === 'all' ? 'A warning opens when a sourcing plan or a held lot needs hardware the site lacks.' : 'Show all warnings to see the others.'}
          action={filter === 'all' ? undefined : { label: 'Show all warnings', onPress: () => setFilter('all') }}
        />
      ) : (
        <View role="list" aria-label="Hardware warnings" style={[styles.list, wide && styles.listWide]} testID="warnings-list">
          {list.data.items.map((w) => (
            <WarningRow key={w.id} w={w} canMove={canMove} wide={wide} />
          ))}
        </View>
      )}
    </Screen>
  );
}

function WarningRow({ w, canMove, wide }: { w: HardwareWarningRecord; canMove: boolean; wide: boolean }) {
  const move = useMoveWarningMutation();
  const order = w.needs.flatMap((n) => n.order);
  const source =
    w.source === 'plan' && w.sourcingPlanId ? (
      <TextLink href={`/sourcing/${w.sourcingPlanId}`}>Sourcing plan: {w.planSlurryName ?? 'plan'}</TextLink>
    ) : w.receivingCheckId ? (
      <TextLink href={`/receive/${w.receivingCheckId}`}>Held lot {w.lotNumber ?? ''}</TextLink>
    ) : (
      <Text style={type.label}>{w.source === 'plan' ? 'Sourcing plan' : 'Held lot'}</Text>
    );
  return (
    <View role="listitem" style={wide ? styles.itemWide : undefined}>
      <Card testID={`warning-row-${w.id}`} style={w.status === 'open' ? styles.open : undefined}>
        <View style={styles.head}>
          {source}
          <WarningStatusChip status={w.status} testID={`warning-${w.id}-status`} />
        </View>
        <Text style={type.body}>{w.summary}</Text>
        {order.length ? (
          <View style={styles.order}>
            <Text style={type.label}>Needs</Text>
            {order.slice(0, 6).map((o, i) => (
              <Text key={`${o.kind}-${o.id ?? i}`} style={type.small}>
                {o.count} × {o.partNumber ? `${o.partNumber}: ` : ''}
                {o.description}
              </Text>
            ))}
            {order.length > 6 ? <Text style={type.small}>and {order.length - 6} more lines</Text> : null}
          </View>
        ) : null}
        <Text style={type.small}>
          Raised {formatWhen(w.createdAt)}
          {w.acknowledgedAt ? ` · acknowledged by ${w.acknowledgedByName ?? '—'}, ${formatWhen(w.acknowledgedAt)}` : ''}
          {w.resolvedAt ? ` · resolved by ${w.resolvedByName ?? '—'}, ${formatWhen(w.resolvedAt)}` : ''}
        </Text>
        {canMove && w.status !== 'resolved' ? (
          <View style={styles.buttons}>
            {w.status === 'open' ? (
              <Button
                label="Acknowledge"
                variant="secondary"
                accessibilityLabel={`Acknowledge: ${w.summary}`}
                busy={move.isPending && move.variables?.to === 'acknowledge'}
                onPress={() => move.mutate({ id: w.id, to: 'acknowledge' })}
                testID={`warning-${w.id}-acknowledge`}
              />
            ) : null}
            <Button
              label="Mark resolved"
              variant="secondary"
              accessibilityLabel={`Mark resolved: ${w.summary}`}
              busy={move.isPending && move.variables?.to === 'resolve'}
              onPress={() => move.mutate({ id: w.id, to: 'resolve' })}
              testID={`warning-${w.id}-resolve`}
            />
          </View>
        ) : null}
        {move.isError ? (
          <Text role="alert" style={styles.error}>
            {move.error.message}
          </Text>
        ) : null}
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.md },
  listWide: { flexDirection: 'row', flexWrap: 'wrap' },
  itemWide: { flexBasis: '48%', flexGrow: 1, minWidth: 320 },
  open: { borderLeftWidth: 5, borderLeftColor: colors.noFit, borderRadius: radius.lg },
  head: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.sm, flexWrap: 'wrap' },
  order: { gap: 2 },
  buttons: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  error: { fontFamily: fonts.semibold, fontSize: 15, color: colors.danger },
});

import { Link, useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { isCalendarDate } from '@/shared/dates';
import { LOT_STATUS_LABELS, LOT_STATUSES } from '@/shared/contract/lot-status';
import { can } from '@/shared/contract/roles';
import { VerdictChip } from '../fit/verdict';
import { useLengthUnit } from '../data/me';
import { useReceivingChecksQuery, type LotStatus, type ReceivingCheckRow, type Verdict } from '../data/receiving';
import { Screen } from '../screen';
import { useSession } from '../session';
import { colors, fonts, minTouch, radius, space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ChoiceChips } from '../ui/choice-chips';
import { Pager } from '../ui/pager';
import { SearchField } from '../ui/search-field';
import { EmptyState, ErrorState, LoadingState } from '../ui/states';
import { TextField } from '../ui/text-field';
import { useIsWide } from '../use-layout';
import { drumLabel } from './check-result';
import { LotStatusChip } from './lot-status-chip';
import { formatWhen } from '../ui/format';
import { LinkButton } from '../ui/link-button';

const PAGE_SIZE = 20;
const VERDICTS = [
  { value: 'all', label: 'All' },
  { value: 'fits', label: '✓ Fits' },
  { value: 'caution', label: '! Caution' },
  { value: 'no-fit', label: '✕ No fit' },
] as const;
const STATUSES = [{ value: 'all' as const, label: 'All' }, ...LOT_STATUSES.map((value) => ({ value, label: LOT_STATUS_LABELS[value] }))];

const dateProblem = (text: string): string | null => {
  if (!text.trim()) return null;
  return isCalendarDate(text.trim()) ? null : 'Enter a date as YYYY-MM-DD, e.g. 2026-05-14.';
};

/** Every recorded dock check, newest first, filtered by verdict, status, lot and date; each opens its lot page. */
export function HistoryScreen() {
  const wide = useIsWide();
  const router = useRouter();
  const { session } = useSession();
  const [q, setQ] = useState('');
  const [verdict, setVerdict] = useState<'all' | Verdict>('all');
  const [status, setStatus] = useState<'all' | LotStatus>('all');
  const [from, setFrom] = useState('');
  const [to, setTo] = useState('');
  const [page, setPage] = useState(1);
  const fromProblem = dateProblem(from);
  const toProblem = dateProblem(to);
  const params = {
    q: q || undefined,
    verdict: verdict === 'all' ? undefined : verdict,
    status: status === 'all' ? undefined : status,
    // A half-typed date is not sent; its field says what is wrong.
    from: from.trim() && !fromProblem ? from.trim() : undefined,
    to: to.trim() && !toProblem ? to.trim() : undefined,
    page,
    pageSize: PAGE_SIZE,
  };
  const list = useReceivingChecksQuery(params);
  const filtered = !!(params.q || params.verdict || params.status || params.from || params.to);
  const clear = () => {
    setQ('');
    setVerdict('all');
    setStatus('all');
    setFrom('');
    setTo('');
    setPage(1);
  };
  const canCheck = can(session?.user.role, 'check-lots');

  return (
    <Screen
      title="Check history"
      subtitle="Every lot checked at the dock, newest first."
      actions={canCheck ? <LinkButton href="/receive" label="New dock check" variant="primary" testID="history-new" /> : undefined}
      testID="history-screen"
    >
      <Card>
        <View style={[styles.filters, wide && styles.filtersWide]}>
          <View style={wide ? styles.filterWide : undefined}>
            <SearchField label="Lot number" value={q} onSearch={(v) => (setQ(v), setPage(1))} placeholder="Part of a lot number" testID="history-search" />
          </View>
          <View style={wide ? styles.filterWide : undefined}>
            <ChoiceChips label="Verdict" options={VERDICTS} value={verdict} onChange={(v) => (setVerdict(v), setPage(1))} testID="history-verdict" />
          </View>
          <View style={wide ? styles.filterWide : undefined}>
            <ChoiceChips label="Status" options={STATUSES} value={status} onChange={(v) => (setStatus(v), setPage(1))} testID="history-status" />
          </View>
          <View style={[styles.dates, wide && styles.filterWide]}>
            <View style={styles.date}>
              <TextField label="From" placeholder="YYYY-MM-DD" value={from} onChangeText={(v) => (setFrom(v), setPage(1))} error={fromProblem} inputMode="numeric" testID="history-from" />
            </View>
            <View style={styles.date}>
              <TextField label="To" placeholder="YYYY-MM-DD" value={to} onChangeText={(v) => (setTo(v), setPage(1))} error={toProblem} inputMode="numeric" testID="history-to" />
            </View>
          </View>
        </View>
        {filtered ? (
          <View style={styles.clearRow}>
            <Button label="Clear filters" variant="quiet" onPress={clear} testID="history-clear" />
          </View>
        ) : null}
      </Card>

      {list.isPending ? (
        <LoadingState label="Loading checks…" />
      ) : list.isError ? (
        <ErrorState error={list.error} onRetry={() => list.refetch()} />
      ) : list.data.items.length === 0 ? (
        filtered ? (
          <EmptyState title="No checks match these filters" next="Widen the dates or clear the filters to see every check." action={{ label: 'Clear filters', onPress: clear }} />
        ) : (
          <EmptyState
            title="No lots checked yet"
            next={canCheck ? 'Check the first arriving lot at the dock.' : 'Lots appear here once a clerk checks them at the dock.'}
            action={canCheck ? { label: 'Check a lot', onPress: () => router.push('/receive') } : undefined}
          />
        )
      ) : (
        <View style={styles.list} role="list" aria-label="Dock checks" testID="history-list">
          {wide ? <HeaderRow /> : null}
          {list.data.items.map((r) => (
            <HistoryRow key={r.id} row={r} wide={wide} />
          ))}
        </View>
      )}
      {list.data && list.data.total > 0 ? <Pager page={page} pageSize={PAGE_SIZE} total={list.data.total} onPage={setPage} noun="checks" busy={list.isFetching} testID="history-pager" /> : null}
    </Screen>
  );
}

function HeaderRow() {
  return (
    <View style={[styles.row, styles.rowWide, styles.header]} aria-hidden>
      <Text style={[type.label, styles.cLot]}>Lot</Text>
      <Text style={[type.label, styles.cVerdict]}>Verdict</Text>
      <Text style={[type.label, styles.cDrum]}>Drum</Text>
      <Text style={[type.label, styles.cWhen]}>Checked</Text>
    </View>
  );
}

function HistoryRow({ row, wide }: { row: ReceivingCheckRow; wide: boolean }) {
  const { show } = useLengthUnit();
  const drum = drumLabel(row, (mm) => show(mm, 0));
  return (
    <View role="listitem">
      <Link href={`/receive/${row.id}` as never} testID={`history-row-${row.lotNumber}`} style={styles.link}>
        <View style={[styles.row, wide && styles.rowWide]}>
          <View style={wide ? styles.cLot : styles.phoneHead}>
            <Text style={styles.lot}>{row.lotNumber}</Text>
            <Text style={type.small}>
              {row.drumCount} drum{row.drumCount === 1 ? '' : 's'}
              {row.stationName ? ` · ${row.stationName}` : ''}
            </Text>
          </View>
          <View style={[styles.chips, wide && styles.cVerdict]}>
            <VerdictChip verdict={row.verdict} />
            <LotStatusChip status={row.status} />
          </View>
          <View style={[styles.drum, wide && styles.cDrum]}>
            {row.lotVerdict ? (
              <Text style={type.label} numberOfLines={3} testID={`history-row-${row.lotNumber}-sentence`}>
                {row.lotVerdict.sentence}
              </Text>
            ) : null}
            <Text style={type.small} numberOfLines={2}>
              {drum}
            </Text>
          </View>
          <Text style={[type.small, wide && styles.cWhen]}>
            {formatWhen(row.checkedAt)} · {row.checkedByName ?? '—'}
          </Text>
        </View>
      </Link>
    </View>
  );
}

const styles = StyleSheet.create({
  filters: { gap: space.md },
  filtersWide: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.xl, rowGap: space.md },
  filterWide: { flexBasis: '45%', flexGrow: 1 },
  dates: { flexDirection: 'row', gap: space.sm },
  date: { flex: 1, minWidth: 0 },
  clearRow: { flexDirection: 'row' },
  list: { backgroundColor: colors.surface, borderRadius: radius.lg, borderWidth: 1, borderColor: colors.line, overflow: 'hidden' },
  link: { display: 'flex' as never, minHeight: minTouch, borderBottomWidth: 1, borderBottomColor: colors.line },
  row: { gap: space.xs, padding: space.md, width: '100%' },
  rowWide: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  header: { backgroundColor: colors.surfaceSunk, borderBottomWidth: 1, borderBottomColor: colors.line },
  phoneHead: { gap: 2 },
  lot: { fontFamily: fonts.bold, fontSize: 18, color: colors.primary, textDecorationLine: 'underline' },
  drum: { gap: 2 },
  chips: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  cLot: { flex: 1.3, gap: 2 },
  cVerdict: { flex: 1.3 },
  cDrum: { flex: 2.4 },
  cWhen: { flex: 1.4 },
});

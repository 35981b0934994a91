import { useMemo, useState, type ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { ImportPlannedRow, ImportRowError, ImportRun } from '../data/imports';
import { supplierQueries } from '../data/suppliers';
import { SectionTitle } from '../ui/section-title';
import { Tag } from '../ui/tag';
import { colors, fonts, radius, space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { useIsWide } from '../use-layout';
import { plural } from './labels';
import { Cell, HeadRow } from './table-cells';

const PLANNED_PREVIEW = 10;
const ACTION_LOOK: Record<ImportPlannedRow['action'], { word: string; tone: 'primary' | 'caution' | 'muted' }> = {
  new: { word: 'New', tone: 'primary' },
  changed: { word: 'Changed', tone: 'caution' },
  unchanged: { word: 'Unchanged', tone: 'muted' },
};

interface ImportResultProps {
  run: ImportRun;
  /** The heading: what this result is (a dry run, a refused commit). */
  title: string;
  /** Said under the heading, e.g. the server's message for a refused commit. */
  lead?: string;
  /** The commit button and its note, under the tables. */
  footer?: ReactNode;
  testID?: string;
}

/** What a run found in the file: counts, the rows refused with their line and column, and what each other row would do. */
export function ImportResult({ run, title, lead, footer, testID = 'import-result' }: ImportResultProps) {
  const wide = useIsWide();
  const { counts } = run;
  return (
    <Card testID={testID}>
      <SectionTitle>{title}</SectionTitle>
      {lead ? <Text style={type.body}>{lead}</Text> : null}
      <Text style={type.small} testID="import-read-as">
        {run.fileName} was read as {run.encoding}, {run.delimiter === ';' ? 'semicolon' : 'comma'}-separated.
        {run.ignoredColumns.length ? ` Columns left out (not registry fields): ${run.ignoredColumns.join(', ')}.` : ''}
      </Text>
      <View style={[styles.counts, wide && styles.countsWide]} accessibilityLiveRegion="polite" testID="import-counts">
        <Count n={counts.new} word="new" wide={wide} testID="import-count-new" />
        <Count n={counts.changed} word="changed" wide={wide} testID="import-count-changed" />
        <Count n={counts.unchanged} word="unchanged" wide={wide} testID="import-count-unchanged" />
        <Count n={counts.rejected} word="rejected" wide={wide} bad={counts.rejected > 0} testID="import-count-rejected" />
      </View>
      {run.errors.length ? <RejectedRows errors={run.errors} rejected={counts.rejected} wide={wide} /> : null}
      {run.rows.length ? <PlannedRows rows={run.rows} total={counts.new + counts.changed + counts.unchanged} wide={wide} /> : null}
      {footer}
    </Card>
  );
}

function Count({ n, word, wide, bad = false, testID }: { n: number; word: string; wide: boolean; bad?: boolean; testID: string }) {
  return (
    <View style={[styles.count, wide && styles.countWide, bad && styles.countBad]} testID={testID} aria-label={`${n} ${word}`}>
      <Text style={[styles.countN, bad && styles.countNBad]}>{n}</Text>
      <Text style={[styles.countWord, bad && styles.countNBad]}>{word}</Text>
    </View>
  );
}

function RejectedRows({ errors, rejected, wide }: { errors: ImportRowError[]; rejected: number; wide: boolean }) {
  return (
    <View style={styles.section}>
      <View role="alert" style={styles.alert} testID="import-rejected-note">
        <Text style={styles.alertTitle}>{plural(rejected, 'row')} cannot be imported</Text>
        <Text style={type.body}>Nothing is imported while any row is rejected. Correct these rows in the file, save it, and choose it again.</Text>
      </View>
      {wide ? (
        <View role="table" aria-label="Rejected rows" style={styles.table} testID="import-rejected">
          <HeadRow
            columns={[
              ['Line', 0.6],
              ['Column', 1.2],
              ['Reason', 4],
            ]}
            rowStyle={[styles.tr, styles.thead]}
            cellStyle={styles.td}
          />
          {errors.map((e, i) => (
            <View role="row" key={`${e.line}-${i}`} style={[styles.tr, i % 2 === 1 && styles.trAlt]} testID={`import-rejected-line-${e.line}`}>
              <BodyCell flex={0.6} strong>
                {e.line}
              </BodyCell>
              <BodyCell flex={1.2}>{e.column}</BodyCell>
              <BodyCell flex={4}>{e.reason}</BodyCell>
            </View>
          ))}
        </View>
      ) : (
        <View role="list" aria-label="Rejected rows" style={styles.cards} testID="import-rejected">
          {errors.map((e, i) => (
            <View role="listitem" key={`${e.line}-${i}`} style={[styles.card, styles.cardBad]} testID={`import-rejected-line-${e.line}`}>
              <Text style={type.label}>
                Line {e.line}, column {e.column}
              </Text>
              <Text style={type.body}>{e.reason}</Text>
            </View>
          ))}
        </View>
      )}
    </View>
  );
}

function PlannedRows({ rows, total, wide }: { rows: ImportPlannedRow[]; total: number; wide: boolean }) {
  const [all, setAll] = useState(false);
  const suppliers = supplierQueries.useList({ pageSize: 200 });
  const supplierName = useMemo(() => new Map((suppliers.data?.items ?? []).map((s) => [s.id, s.name])), [suppliers.data]);
  const shown = all ? rows : rows.slice(0, PLANNED_PREVIEW);
  const name = (id: string) => supplierName.get(id) ?? '—';
  return (
    <View style={styles.section}>
      <Text role="heading" aria-level={3} style={type.label}>
        What each row would do
      </Text>
      {wide ? (
        <View role="table" aria-label="Planned rows" style={styles.table} testID="import-planned">
          <HeadRow
            columns={[
              ['Line', 0.6],
              ['Part number', 1.6],
              ['Supplier', 2],
              ['Action', 1],
            ]}
            rowStyle={[styles.tr, styles.thead]}
            cellStyle={styles.td}
          />
          {shown.map((r, i) => (
            <View role="row" key={r.line} style={[styles.tr, i % 2 === 1 && styles.trAlt]} testID={`import-planned-line-${r.line}`}>
              <BodyCell flex={0.6}>{r.line}</BodyCell>
              <BodyCell flex={1.6} strong>
                {r.partNumber}
              </BodyCell>
              <BodyCell flex={2}>{name(r.supplierId)}</BodyCell>
              <View role="cell" style={[styles.td, { flex: 1 }]}>
                <Tag label={ACTION_LOOK[r.action].word} tone={ACTION_LOOK[r.action].tone} />
              </View>
            </View>
          ))}
        </View>
      ) : (
        <View role="list" aria-label="Planned rows" style={styles.cards} testID="import-planned">
          {shown.map((r) => (
            <View role="listitem" key={r.line} style={[styles.card, styles.cardRow]} testID={`import-planned-line-${r.line}`}>
              <View style={styles.cardText}>
                <Text style={type.label}>{r.partNumber}</Text>
                <Text style={type.small}>
                  Line {r.line} · {name(r.supplierId)}
                </Text>
              </View>
              <Tag label={ACTION_LOOK[r.action].word} tone={ACTION_LOOK[r.action].tone} />
            </View>
          ))}
        </View>
      )}
      {rows.length > PLANNED_PREVIEW ? (
        <View style={styles.more}>
          <Text style={type.small}>
            {all ? `All ${rows.length} listed` : `${PLANNED_PREVIEW} of ${rows.length} listed`}
            {total > rows.length ? `; the first ${rows.length} of ${total} rows are listed here` : ''}.
          </Text>
          <Button label={all ? 'Show fewer' : `Show all ${rows.length}`} variant="quiet" onPress={() => setAll((a) => !a)} testID="import-planned-more" />
        </View>
      ) : null}
    </View>
  );
}

function BodyCell({ children, flex, strong = false }: { children: ReactNode; flex: number; strong?: boolean }) {
  return (
    <Cell flex={flex} style={styles.td}>
      <Text style={[type.body, strong && styles.strong]}>{children}</Text>
    </Cell>
  );
}

const styles = StyleSheet.create({
  counts: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  countsWide: { gap: space.md },
  count: {
    flexGrow: 1,
    // Two by two on a phone (four across leaves "unchanged" no room), one row on a wide screen.
    flexBasis: '40%',
    paddingVertical: space.sm,
    paddingHorizontal: space.md,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.paper,
    alignItems: 'flex-start',
  },
  countWide: { flexBasis: 0 },
  countBad: { borderColor: colors.danger, borderWidth: 2, backgroundColor: colors.dangerSoft },
  countN: { fontFamily: fonts.bold, fontSize: 26, lineHeight: 30, color: colors.ink },
  countNBad: { color: colors.danger },
  countWord: { fontFamily: fonts.semibold, fontSize: 14, color: colors.inkMuted },
  section: { gap: space.sm, marginTop: space.sm },
  alert: { gap: space.xs, padding: space.md, borderRadius: radius.md, borderWidth: 1, borderColor: colors.danger, backgroundColor: colors.dangerSoft },
  alertTitle: { fontFamily: fonts.semibold, fontSize: 16, color: colors.danger },
  table: { borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, overflow: 'hidden' },
  tr: { flexDirection: 'row', alignItems: 'center', borderBottomWidth: 1, borderBottomColor: colors.line, minHeight: 40 },
  trAlt: { backgroundColor: colors.paper },
  thead: { backgroundColor: colors.surfaceSunk },
  td: { paddingHorizontal: space.md, paddingVertical: space.xs, minWidth: 0 },
  strong: { fontFamily: fonts.semibold },
  cards: { gap: space.sm },
  card: { gap: 2, padding: space.md, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
  cardBad: { borderLeftWidth: 4, borderLeftColor: colors.danger },
  cardRow: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  cardText: { flex: 1, gap: 2 },
  more: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: space.sm, justifyContent: 'space-between' },
});

import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { downloadAttachment } from '../data/attachments';
import { useImportHistoryQuery, type ImportHistoryItem } from '../data/imports';
import { formatWhen } from '../ui/format';
import { SectionTitle } from '../ui/section-title';
import { Tag } from '../ui/tag';
import { colors, fonts, radius, space, type, field } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ErrorState, LoadingState } from '../ui/states';
import { useIsWide } from '../use-layout';
import { countsLine, KIND_LABELS, OUTCOME_WORDS } from './labels';
import { Cell, HeadRow } from './table-cells';

/** Past imports, newest first: who ran which file, what it found, and the file itself as it was read. */
export function ImportHistory() {
  const wide = useIsWide();
  const history = useImportHistoryQuery();
  return (
    <Card testID="import-history">
      <SectionTitle>Past imports</SectionTitle>
      <Text style={type.small}>Every check and every import is kept with its file, newest first (the last 50).</Text>
      {history.isPending ? (
        <LoadingState label="Loading past imports…" />
      ) : history.isError ? (
        <ErrorState error={history.error} onRetry={() => history.refetch()} />
      ) : history.data.items.length === 0 ? (
        <Text style={[type.body, styles.empty]} testID="import-history-empty">
          No spec sheets imported yet. Choose what the file holds and its CSV file above: it is checked first, and nothing is written until you import it.
        </Text>
      ) : wide ? (
        <View role="table" aria-label="Past imports" style={styles.table} testID="import-history-list">
          <HeadRow
            columns={[
              ['When', 1.3],
              ['File', 2],
              ['By', 1.3],
              ['Rows', 2.2],
              ['Outcome', 1],
              ['Kept file', 1.2],
            ]}
            rowStyle={[styles.tr, styles.thead]}
            cellStyle={styles.td}
          />
          {history.data.items.map((item, i) => (
            <HistoryRow key={item.id} item={item} wide alt={i % 2 === 1} />
          ))}
        </View>
      ) : (
        <View role="list" aria-label="Past imports" style={styles.cards} testID="import-history-list">
          {history.data.items.map((item) => (
            <HistoryRow key={item.id} item={item} wide={false} alt={false} />
          ))}
        </View>
      )}
    </Card>
  );
}

function HistoryRow({ item, wide, alt }: { item: ImportHistoryItem; wide: boolean; alt: boolean }) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const outcome = OUTCOME_WORDS[item.outcome];
  const testID = `import-history-item-${item.id}`;
  const save = () => {
    if (!item.attachmentId) return;
    setBusy(true);
    setError(null);
    downloadAttachment(item.attachmentId, item.fileName)
      .catch((e: unknown) => setError(e instanceof Error ? e.message : 'The file could not be fetched.'))
      .finally(() => setBusy(false));
  };
  const download = item.attachmentId ? (
    <Button label="Download file" variant="quiet" busy={busy} accessibilityLabel={`Download ${item.fileName} as it was imported`} onPress={save} testID={`${testID}-download`} />
  ) : (
    <Text style={type.small}>Not kept</Text>
  );
  const problem = error ? (
    <Text role="alert" style={styles.error}>
      {error}
    </Text>
  ) : null;

  if (wide) {
    return (
      <View role="row" style={[styles.tr, alt && styles.trAlt]} testID={testID}>
        <Cell flex={1.3} style={styles.td}>
          <Text style={type.body}>{formatWhen(item.at)}</Text>
        </Cell>
        <Cell flex={2} style={styles.td}>
          <Text style={[type.body, styles.strong]}>{item.fileName}</Text>
          <Text style={type.small}>{KIND_LABELS[item.kind]}</Text>
        </Cell>
        <Cell flex={1.3} style={styles.td}>
          <Text style={type.body}>{item.byName ?? '—'}</Text>
        </Cell>
        <Cell flex={2.2} style={styles.td}>
          <Text style={type.body}>{countsLine(item.counts)}</Text>
        </Cell>
        <Cell flex={1} style={styles.td}>
          <Tag label={outcome.word} tone={outcome.tone} testID={`${testID}-outcome`} />
        </Cell>
        <Cell flex={1.2} style={styles.td}>
          {download}
          {problem}
        </Cell>
      </View>
    );
  }
  return (
    <View role="listitem" style={styles.card} testID={testID}>
      <View style={styles.cardHead}>
        <Text style={[type.label, styles.shrink]}>{item.fileName}</Text>
        <Tag label={outcome.word} tone={outcome.tone} testID={`${testID}-outcome`} />
      </View>
      <Text style={type.body}>
        {KIND_LABELS[item.kind]}: {countsLine(item.counts)}
      </Text>
      <Text style={type.small}>
        {item.byName ?? 'Someone'}, {formatWhen(item.at)}
      </Text>
      <View style={styles.cardFoot}>{download}</View>
      {problem}
    </View>
  );
}

const styles = StyleSheet.create({
  empty: { color: colors.inkMuted },
  table: { borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, overflow: 'hidden' },
  tr: { flexDirection: 'row', alignItems: 'center', borderBottomWidth: 1, borderBottomColor: colors.line, minHeight: 48 },
  trAlt: { backgroundColor: colors.paper },
  thead: { backgroundColor: colors.surfaceSunk, minHeight: 40 },
  td: { paddingHorizontal: space.sm, paddingVertical: space.xs, minWidth: 0, gap: 2, alignItems: 'flex-start' },
  strong: { fontFamily: fonts.semibold },
  cards: { gap: space.sm },
  card: { gap: space.xs, padding: space.md, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line },
  cardHead: { flexDirection: 'row', alignItems: 'flex-start', justifyContent: 'space-between', gap: space.sm },
  cardFoot: { flexDirection: 'row', marginLeft: -space.lg },
  shrink: { flexShrink: 1 },
  error: field.error,
});

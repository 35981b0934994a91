import { StyleSheet, Text, View } from 'react-native';
import type { PairingRecord, PairingReviewRecord } from '@/shared/contract/records';
import { colors, fonts, space, type } from '../theme';
import { Card } from '../ui/card';

const DECISION_LOOK: Record<PairingReviewRecord['decision'] | 'drafted', { word: string; mark: string; fg: string }> = {
  drafted: { word: 'Drafted', mark: '•', fg: colors.inkMuted },
  approved: { word: 'Approved', mark: '✓', fg: colors.fits },
  rejected: { word: 'Rejected', mark: '✕', fg: colors.noFit },
  retired: { word: 'Retired', mark: '■', fg: colors.noFit },
};

const when = (at: string) => new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' }).format(new Date(at));

/** Every decision on the pairing, oldest first, starting with its drafting. Nothing is ever removed from it. */
export function ReviewHistory({ pairing }: { pairing: PairingRecord }) {
  const entries = [
    { key: 'drafted', decision: 'drafted' as const, who: pairing.authorName ?? 'Unknown', at: pairing.createdAt, comment: null as string | null },
    ...(pairing.reviews ?? []).map((r) => ({ key: r.id, decision: r.decision, who: r.reviewerName ?? 'Unknown', at: r.at, comment: r.comment })),
  ];
  return (
    <Card testID="pairing-history">
      <Text role="heading" aria-level={2} style={type.heading}>
        History
      </Text>
      <View role="list" style={styles.list}>
        {entries.map((e, i) => {
          const look = DECISION_LOOK[e.decision];
          return (
            <View key={e.key} role="listitem" style={styles.item} testID={`pairing-history-${i}`}>
              <Text style={[styles.mark, { color: look.fg }]} aria-hidden>
                {look.mark}
              </Text>
              <View style={styles.itemBody}>
                <Text style={type.label}>
                  <Text style={{ color: look.fg }}>{look.word}</Text> by {e.who}
                </Text>
                <Text style={type.small}>{when(e.at)}</Text>
                {e.comment ? <Text style={type.body}>“{e.comment}”</Text> : null}
              </View>
            </View>
          );
        })}
      </View>
      {(pairing.reviews ?? []).length === 0 ? <Text style={type.small}>No review yet.</Text> : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.md },
  item: { flexDirection: 'row', gap: space.sm, alignItems: 'flex-start' },
  mark: { fontFamily: fonts.bold, fontSize: 18, width: 22, textAlign: 'center' },
  itemBody: { flex: 1, gap: 2 },
});

import { StyleSheet, Text, View } from 'react-native';
import { useQueuedChecks } from '../data/dock-queue';
import { colors, fonts, space, type } from '../theme';
import { Card } from '../ui/card';
import { formatWhen } from '../ui/format';
import { LinkButton } from '../ui/link-button';
import { SectionTitle } from '../ui/section-title';

const STATE_WORDS = { waiting: 'Waiting for the network', sent: 'Sent and recorded', refused: 'Refused by the server' } as const;

/** The dock checks made with no network on this phone: each waiting one, and what became of those sent. */
export function WaitingChecks() {
  const queued = useQueuedChecks();
  if (!queued.length) return null;
  const waiting = queued.filter((q) => q.status === 'waiting').length;
  return (
    <Card testID="waiting-checks">
      <SectionTitle>{waiting ? `Waiting to be sent: ${waiting}` : 'Checks made offline: all sent'}</SectionTitle>
      <View role="list" style={styles.list}>
        {queued.map((q) => (
          <View key={q.clientKey} role="listitem" style={styles.row} testID={`waiting-${q.lotNumber}`}>
            <Text style={type.label}>Lot {q.lotNumber}</Text>
            <Text style={[styles.state, q.status === 'refused' && { color: colors.danger }]} testID={`waiting-${q.lotNumber}-state`}>
              {STATE_WORDS[q.status]}
              {q.status === 'sent' && q.record ? `: ${q.record.lotVerdict?.sentence ?? q.record.result.summary}` : ''}
              {q.status === 'refused' && q.error ? `: ${q.error}` : ''}
            </Text>
            <Text style={type.small}>Checked on this phone {formatWhen(q.queuedAt)}</Text>
            {q.record ? <LinkButton href={`/receive/${q.record.id}`} label="Open the lot page" testID={`waiting-${q.lotNumber}-open`} /> : null}
          </View>
        ))}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  row: { gap: 2, paddingTop: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
  state: { fontFamily: fonts.semibold, fontSize: 15, lineHeight: 21, color: colors.ink },
});

import { StyleSheet, Text, View } from 'react-native';
import type { StationBoard } from '../data/station-board';
import { formatWhen } from '../ui/format';
import { SectionTitle } from '../ui/section-title';
import { TextLink } from '../ui/text-link';
import { colors, fonts, space, type } from '../theme';
import { Card } from '../ui/card';

/** The station's change-outs, newest first: which set went online in which lot. */
export function ChangeOuts({ board }: { board: StationBoard }) {
  return (
    <Card testID="change-outs">
      <SectionTitle>Change-outs</SectionTitle>
      <Text style={type.small}>Newest first.</Text>
      {board.changeOuts.length === 0 ? (
        <Text style={type.body}>No change-outs recorded yet. Press Change out when the online drum runs empty.</Text>
      ) : (
        <View role="list" style={styles.entries}>
          {board.changeOuts.map((c) => (
            <View role="listitem" key={c.id} style={styles.entry} testID={`change-out-${c.id}`}>
              <Text style={type.label}>{formatWhen(c.at)}</Text>
              <Text style={type.body}>
                {c.tubeSetLabel ?? '—'} went online{' '}
                {c.receivingCheckId ? (
                  <>
                    in lot{' '}
                    <TextLink href={`/receive/${c.receivingCheckId}`} testID={`change-out-lot-${c.lotNumber ?? c.id}`}>
                      {c.lotNumber ?? '—'}
                    </TextLink>
                  </>
                ) : c.lotNumber ? (
                  <>
                    in lot <Text style={styles.strong}>{c.lotNumber}</Text>
                  </>
                ) : (
                  '(lot not recorded)'
                )}
                {c.drumSerial ? `, drum ${c.drumSerial}` : ''}
                {c.retiredTubeSetLabel ? `; ${c.retiredTubeSetLabel} came out for cleaning` : ''}.
              </Text>
              <Text style={type.small}>
                Tube {c.dipTubePartNumber ?? '—'} · head {c.connectorPartNumber ?? '—'} · by {c.byName ?? '—'}
              </Text>
            </View>
          ))}
        </View>
      )}
    </Card>
  );
}

/** Who rinsed which set, and when. */
export function RinseLog({ board }: { board: StationBoard }) {
  return (
    <Card testID="rinse-log">
      <SectionTitle>Rinse log</SectionTitle>
      <Text style={type.small}>Who rinsed which set with DI water, and when; newest first.</Text>
      {board.rinses.length === 0 ? (
        <Text style={type.body}>No rinses recorded yet. Record one with “Rinsed with DI water” on a set being cleaned.</Text>
      ) : (
        <View role="list" style={styles.entries}>
          {board.rinses.map((r) => (
            <View role="listitem" key={r.id} style={styles.entry}>
              <Text style={type.body}>
                <Text style={styles.strong}>{r.tubeSetLabel ?? '—'}</Text> rinsed by {r.byName ?? '—'}, {formatWhen(r.at)}
              </Text>
              {r.note ? <Text style={type.small}>{r.note}</Text> : null}
            </View>
          ))}
        </View>
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  strong: { fontFamily: fonts.semibold },
  entries: { gap: space.sm },
  entry: { gap: 2, paddingTop: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
});

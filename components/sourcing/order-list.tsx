import { StyleSheet, Text, View } from 'react-native';
import type { OrderLine } from '../data/sourcing';
import { colors, fonts, radius, space, type } from '../theme';

const KINDS: Array<{ kind: OrderLine['kind']; title: string; unit: [string, string] }> = [
  { kind: 'dip-tube', title: 'Dip tubes (tube sets)', unit: ['tube set', 'tube sets'] },
  { kind: 'connector', title: 'Dispense heads', unit: ['dispense head', 'dispense heads'] },
  { kind: 'approval', title: 'Approvals before use', unit: ['approval', 'approvals'] },
  { kind: 'spec', title: 'Buy to a specification (nothing registered fits)', unit: ['item to a specification', 'items to a specification'] },
];

const plural = (n: number, [one, many]: [string, string]) => `${n} ${n === 1 ? one : many}`;

/** What to order, grouped by kind, with part numbers, counts and totals. */
export function OrderList({ order, testID = 'order-list' }: { order: OrderLine[]; testID?: string }) {
  if (order.length === 0) {
    return (
      <Text style={type.body} testID={`${testID}-empty`}>
        Nothing to order: every station already has the tubes, heads and approvals it needs for this drum.
      </Text>
    );
  }
  const totals = KINDS.map((k) => ({ ...k, n: order.filter((o) => o.kind === k.kind).reduce((sum, o) => sum + o.count, 0) })).filter((k) => k.n > 0);
  return (
    <View style={styles.wrap} testID={testID}>
      <View style={styles.totals} testID={`${testID}-totals`}>
        <Text style={type.label}>To order in all</Text>
        <Text style={styles.totalText}>{totals.map((t) => plural(t.n, t.unit)).join(' · ')}</Text>
      </View>
      {KINDS.map((k) => {
        const lines = order.filter((o) => o.kind === k.kind);
        if (!lines.length) return null;
        return (
          <View key={k.kind} style={styles.group} testID={`${testID}-${k.kind}`}>
            <Text role="heading" aria-level={3} style={type.label}>
              {k.title}
            </Text>
            <View role="list" style={styles.lines}>
              {lines.map((line, i) => (
                <View role="listitem" key={`${line.kind}-${line.id ?? line.description}-${i}`} style={styles.line} testID={`order-line-${line.partNumber ?? `${line.kind}-${i}`}`}>
                  <Text style={styles.count} aria-label={`${line.count} of`}>
                    {line.count} ×
                  </Text>
                  <View style={styles.lineBody}>
                    {line.partNumber ? <Text style={styles.part}>{line.partNumber}</Text> : null}
                    <Text style={type.body}>{line.description}</Text>
                    {line.note ? <Text style={type.small}>{line.note}</Text> : null}
                  </View>
                </View>
              ))}
            </View>
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  totals: { gap: 2, padding: space.md, borderRadius: radius.md, backgroundColor: colors.surfaceSunk },
  totalText: { fontFamily: fonts.bold, fontSize: 18, color: colors.ink },
  group: { gap: space.sm },
  lines: { gap: space.sm },
  line: { flexDirection: 'row', gap: space.md, alignItems: 'flex-start', paddingTop: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
  count: { fontFamily: fonts.bold, fontSize: 20, color: colors.primary, minWidth: 44 },
  lineBody: { flex: 1, gap: 2 },
  part: { fontFamily: fonts.bold, fontSize: 16, color: colors.ink },
});

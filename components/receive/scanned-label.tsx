import { StyleSheet, Text, View } from 'react-native';
import type { DrumLabel } from '@/shared/gs1';
import { colors, radius, space, type } from '../theme';
import { formatDate } from '../ui/format';

/** What the scanned label said beyond the lot number, shown read-only under the lot field. */
export function ScannedLabel({ label, testID }: { label: DrumLabel; testID: string }) {
  const rows: Array<[string, string, string | null]> = [
    ['Expiry date', 'expiry', label.expiryDate && formatDate(label.expiryDate)],
    ['Production date', 'production', label.productionDate && formatDate(label.productionDate)],
    ['GTIN', 'gtin', label.gtin],
    ['Serial', 'serial', label.serial],
  ];
  const source =
    label.kind === 'text'
      ? 'Lot number read from the label’s code.'
      : label.batch
        ? 'Lot number filled in from the label’s batch (10).'
        : 'The label carries no batch or lot (10): type the lot number from the label.';
  return (
    <View style={styles.box} testID={testID}>
      <Text style={type.small} testID={`${testID}-source`}>
        {source}
      </Text>
      {rows
        .filter(([, , value]) => value)
        .map(([name, key, value]) => (
          <View key={key} style={styles.row}>
            <Text style={[type.small, styles.name]}>{name}</Text>
            <Text style={type.body} testID={`${testID}-${key}`}>
              {value}
            </Text>
          </View>
        ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs, padding: space.md, borderRadius: radius.md, backgroundColor: colors.surfaceSunk },
  row: { flexDirection: 'row', gap: space.sm, alignItems: 'baseline', flexWrap: 'wrap' },
  name: { minWidth: 120 },
});

import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { fonts, space, type } from '../theme';

/** A label and its value, stacked; used in the record summaries. */
export function Fact({ label, value, testID }: { label: string; value: ReactNode; testID?: string }) {
  return (
    <View style={styles.fact}>
      <Text style={type.small}>{label}</Text>
      {typeof value === 'string' || typeof value === 'number' ? (
        <Text style={[type.body, styles.factValue]} testID={testID}>
          {value}
        </Text>
      ) : (
        <View testID={testID}>{value}</View>
      )}
    </View>
  );
}

/** Facts stacked on a phone, in rows on a wide screen. */
export function FactGrid({ children, wide }: { children: ReactNode; wide: boolean }) {
  return <View style={[styles.facts, wide && styles.factsWide]}>{children}</View>;
}

const styles = StyleSheet.create({
  fact: { gap: 2, minWidth: 140, flexShrink: 1 },
  factValue: { fontFamily: fonts.semibold },
  facts: { gap: space.md },
  factsWide: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.xl, rowGap: space.md },
});

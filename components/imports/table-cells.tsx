import type { ReactNode } from 'react';
import { StyleSheet, Text, View, type StyleProp, type ViewStyle } from 'react-native';
import { colors, fonts } from '../theme';

interface CellProps {
  children: ReactNode;
  /** The column's share of the row's width. */
  flex: number;
  /** The table's own padding for its cells. */
  style: StyleProp<ViewStyle>;
}

/** A column's heading in the import's small tables (the history, the rejected and the planned rows). */
export function HeadCell({ children, flex, style }: CellProps) {
  return (
    <View role="columnheader" style={[style, { flex }]}>
      <Text style={styles.th}>{children}</Text>
    </View>
  );
}

export function Cell({ children, flex, style }: CellProps) {
  return (
    <View role="cell" style={[style, { flex }]}>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  th: { fontFamily: fonts.semibold, fontSize: 14, color: colors.ink },
});

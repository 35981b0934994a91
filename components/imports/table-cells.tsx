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
function HeadCell({ children, flex, style }: CellProps) {
  return (
    <View role="columnheader" style={[style, { flex }]}>
      <Text style={styles.th}>{children}</Text>
    </View>
  );
}

/** A table's heading row: each column's label and its share of the width. */
export function HeadRow({ columns, rowStyle, cellStyle }: { columns: [label: string, flex: number][]; rowStyle: StyleProp<ViewStyle>; cellStyle: StyleProp<ViewStyle> }) {
  return (
    <View role="row" style={rowStyle}>
      {columns.map(([label, flex]) => (
        <HeadCell key={label} flex={flex} style={cellStyle}>
          {label}
        </HeadCell>
      ))}
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

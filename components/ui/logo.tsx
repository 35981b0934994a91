import { StyleSheet, Text, View } from 'react-native';
import Svg, { Circle, Rect } from 'react-native-svg';
import { colors, fonts } from '../theme';

/** The Bungwise mark: a drum head seen from above, with its two bungs. */
export function Logo({ inverse = false }: { inverse?: boolean }) {
  const ink = inverse ? colors.onNav : colors.primary;
  return (
    <View style={styles.row} accessibilityRole="header" aria-label="Bungwise">
      <Svg width={30} height={30} viewBox="0 0 30 30" aria-hidden>
        <Circle cx={15} cy={15} r={13} stroke={ink} strokeWidth={2.5} fill="none" />
        <Circle cx={9.5} cy={11} r={3.2} fill={ink} />
        <Circle cx={21} cy={19} r={2} fill={ink} />
        <Rect x={13} y={4} width={4} height={2} fill={ink} />
      </Svg>
      <Text style={[styles.word, { color: ink }]}>Bungwise</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: 8 },
  word: { fontFamily: fonts.bold, fontSize: 22, letterSpacing: 0.2 },
});

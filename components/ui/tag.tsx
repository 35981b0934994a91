import { StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space } from '../theme';

/** A small bordered chip: its words in `fg` on `bg`. */
export function Chip({ label, fg, bg, testID }: { label: string; fg: string; bg: string; testID?: string }) {
  return (
    <View style={[styles.chip, { borderColor: fg, backgroundColor: bg }]} testID={testID}>
      <Text style={[styles.chipText, { color: fg }]}>{label}</Text>
    </View>
  );
}

/** A small word-and-mark chip in one of the theme's tones. */
export function Tag({ label, tone = 'muted', testID }: { label: string; tone?: 'muted' | 'fits' | 'caution' | 'noFit' | 'primary'; testID?: string }) {
  const fg = tone === 'muted' ? colors.inkMuted : tone === 'primary' ? colors.primary : colors[tone];
  const bg = tone === 'fits' ? colors.fitsSoft : tone === 'caution' ? colors.cautionSoft : tone === 'noFit' ? colors.noFitSoft : colors.surface;
  return <Chip label={label} fg={fg} bg={bg} testID={testID} />;
}

const styles = StyleSheet.create({
  chip: { borderWidth: 1.5, borderRadius: radius.sm, paddingHorizontal: space.sm, paddingVertical: 2, alignSelf: 'flex-start' },
  chipText: { fontFamily: fonts.bold, fontSize: 13, lineHeight: 18 },
});

import { Pressable, StyleSheet, Text, View } from 'react-native';
import { LENGTH_UNITS } from '@/shared/units';
import { useLengthUnit } from '../data/me';
import { colors, fonts, minTouch, radius, space } from '../theme';

/** A small mm / in switch for every length on the page; the choice is kept per user on the server. */
export function UnitToggle() {
  const { unit, setUnit } = useLengthUnit();
  return (
    <View role="radiogroup" aria-label="Show lengths in" style={styles.group} testID="unit-toggle">
      <Text style={styles.caption} aria-hidden>
        Lengths
      </Text>
      {LENGTH_UNITS.map((u) => {
        const on = u === unit;
        return (
          <Pressable
            key={u}
            role="radio"
            aria-checked={on}
            aria-label={u === 'mm' ? 'Millimetres' : 'Inches'}
            testID={`unit-toggle-${u}`}
            onPress={() => setUnit(u)}
            style={(s: { pressed: boolean; focused?: boolean }) => [styles.option, on && styles.optionOn, s.focused && styles.focusRing]}
          >
            <Text style={[styles.text, on && styles.textOn]}>{u}</Text>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  caption: { fontFamily: fonts.semibold, fontSize: 14, color: colors.inkMuted, marginRight: space.xs },
  option: {
    minHeight: minTouch,
    minWidth: minTouch,
    alignItems: 'center',
    justifyContent: 'center',
    borderWidth: 1.5,
    borderColor: colors.inkMuted,
    borderRadius: radius.md,
    backgroundColor: colors.surface,
    paddingHorizontal: space.sm,
  },
  optionOn: { backgroundColor: colors.primary, borderColor: colors.primary },
  focusRing: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: 2 } as object,
  text: { fontFamily: fonts.semibold, fontSize: 15, color: colors.ink },
  textOn: { color: colors.onPrimary },
});

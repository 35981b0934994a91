import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, minTouch, radius, space, type } from '../theme';

/** A labelled yes/no choice: a checkbox to assistive technology, a box with a tick on screen. */
export function Toggle({ label, hint, value, onChange, testID }: { label: string; hint?: string; value: boolean; onChange: (next: boolean) => void; testID?: string }) {
  return (
    <Pressable
      role="checkbox"
      aria-checked={value}
      aria-label={label}
      onPress={() => onChange(!value)}
      testID={testID}
      style={({ focused }: { pressed: boolean; focused?: boolean }) => [styles.row, focused && styles.focusRing]}
    >
      <View style={[styles.box, value && styles.boxOn]}>
        <Text style={styles.tick}>{value ? '✓' : ''}</Text>
      </View>
      <View style={styles.text}>
        <Text style={type.label}>{label}</Text>
        {hint ? <Text style={type.small}>{hint}</Text> : null}
      </View>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md, minHeight: minTouch, paddingVertical: space.xs, borderRadius: radius.md },
  box: { width: 28, height: 28, borderRadius: radius.sm, borderWidth: 2, borderColor: colors.inkMuted, backgroundColor: colors.surface, alignItems: 'center', justifyContent: 'center' },
  boxOn: { backgroundColor: colors.primary, borderColor: colors.primary },
  tick: { color: colors.onPrimary, fontFamily: fonts.bold, fontSize: 18, lineHeight: 22 },
  text: { flex: 1, gap: 2 },
  focusRing: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: 2 } as object,
});

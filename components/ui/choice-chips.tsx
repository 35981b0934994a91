import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, minTouch, radius, space, type } from '../theme';

interface ChoiceChipsProps<T extends string> {
  label: string;
  options: readonly { value: T; label: string }[];
  value: T | null;
  onChange: (value: T) => void;
  error?: string | null;
  testID?: string;
}

/** A labelled single choice shown as a row of chips (a radio group to assistive technology). */
export function ChoiceChips<T extends string>({ label, options, value, onChange, error, testID }: ChoiceChipsProps<T>) {
  return (
    <View style={styles.wrap}>
      <Text style={type.label}>{label}</Text>
      <View role="radiogroup" aria-label={label} style={styles.row} testID={testID}>
        {options.map((o) => {
          const selected = o.value === value;
          return (
            <Pressable
              key={o.value}
              role="radio"
              aria-checked={selected}
              aria-label={o.label}
              testID={testID ? `${testID}-${o.value}` : undefined}
              onPress={() => onChange(o.value)}
              style={[styles.chip, selected && styles.chipOn]}
            >
              <Text style={[styles.text, selected && styles.textOn]}>{o.label}</Text>
            </Pressable>
          );
        })}
      </View>
      {error ? (
        <Text role="alert" style={styles.error}>
          {error}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  chip: {
    minHeight: minTouch,
    paddingHorizontal: space.md,
    justifyContent: 'center',
    borderRadius: radius.md,
    borderWidth: 1.5,
    borderColor: colors.inkMuted,
    backgroundColor: colors.surface,
  },
  chipOn: { backgroundColor: colors.primary, borderColor: colors.primary },
  text: { fontFamily: fonts.semibold, fontSize: 15, color: colors.ink },
  textOn: { color: colors.onPrimary },
  error: { fontFamily: fonts.semibold, fontSize: 14, color: colors.danger },
});

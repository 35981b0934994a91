import { useRef } from 'react';
import { Platform, Pressable, StyleSheet, Text, View } from 'react-native';
import { FieldMessage } from './field-parts';
import { colors, fonts, minTouch, radius, space, type } from '../theme';

interface ChoiceChipsProps<T extends string> {
  label: string;
  options: readonly { value: T; label: string }[];
  value: T | null;
  onChange: (value: T) => void;
  error?: string | null;
  testID?: string;
}

const NEXT_KEYS = new Set(['ArrowRight', 'ArrowDown']);
const PREVIOUS_KEYS = new Set(['ArrowLeft', 'ArrowUp']);

/**
 * A labelled single choice shown as a row of chips (a radio group to assistive technology). On the web it
 * follows the radio-group keyboard pattern: Tab reaches the chosen chip (or the first), the arrow keys move
 * and choose, Space chooses the focused chip.
 */
export function ChoiceChips<T extends string>({ label, options, value, onChange, error, testID }: ChoiceChipsProps<T>) {
  const refs = useRef<Array<View | null>>([]);
  const tabStop = Math.max(
    0,
    options.findIndex((o) => o.value === value),
  );
  const onKeyDown = (index: number) => (e: { nativeEvent: { key: string }; preventDefault: () => void }) => {
    const { key } = e.nativeEvent;
    if (key === ' ') {
      e.preventDefault();
      onChange(options[index].value);
      return;
    }
    const step = NEXT_KEYS.has(key) ? 1 : PREVIOUS_KEYS.has(key) ? -1 : 0;
    if (!step) return;
    e.preventDefault();
    const next = (index + step + options.length) % options.length;
    onChange(options[next].value);
    refs.current[next]?.focus();
  };
  return (
    <View style={styles.wrap}>
      <Text style={type.label}>{label}</Text>
      <View role="radiogroup" aria-label={label} style={styles.row} testID={testID}>
        {options.map((o, index) => {
          const selected = o.value === value;
          return (
            <Pressable
              key={o.value}
              ref={(el) => {
                refs.current[index] = el;
              }}
              tabIndex={index === tabStop ? 0 : -1}
              {...(Platform.OS === 'web' ? { onKeyDown: onKeyDown(index) } : {})}
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
      <FieldMessage error={error} />
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
});

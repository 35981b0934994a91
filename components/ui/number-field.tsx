import { forwardRef, useId, useState } from 'react';
import { Pressable, StyleSheet, Text, TextInput, View, type TextInputProps } from 'react-native';
import { fromMm, LENGTH_UNITS, toMm, type LengthUnit } from '@/shared/units';
import { FieldHead, FieldMessage } from './field-parts';
import { colors, fonts, minTouch, radius, space, type, field } from '../theme';

// ---------------------------------------------------------------------------------------------------
// Numbers as typed. A form keeps the text the person typed (so "12." survives a re-render) and parses
// it only to validate and to send.

/** The number in a typed text, or NaN when it is not one; null when the field is empty. Accepts a decimal comma. */
export function parseNumber(text: string): number | null {
  const t = text.trim().replace(',', '.');
  if (t === '') return null;
  if (!/^[-+]?(\d+\.?\d*|\.\d+)$/.test(t)) return Number.NaN;
  return Number(t);
}

/** A number for an input: at most `digits` decimals, without trailing zeros ("851", "33.5039"). */
export function numberText(value: number | null | undefined, digits = 3): string {
  if (value == null || !Number.isFinite(value)) return '';
  return String(Number(value.toFixed(digits)));
}

// ---------------------------------------------------------------------------------------------------
// Lengths: typed in mm or in, always sent in mm.

/**
 * A length as a form holds it. `exactMm` is the stored value the text was made from: while the person has
 * not typed, saving sends it unchanged, so showing 851 mm as 33.5039 in never rounds the record.
 */
export interface LengthDraft {
  text: string;
  unit: LengthUnit;
  exactMm: number | null;
}

const DIGITS: Record<LengthUnit, number> = { mm: 3, in: 4 };

export function lengthDraft(mm: number | null | undefined, unit: LengthUnit): LengthDraft {
  return mm == null ? { text: '', unit, exactMm: null } : { text: numberText(fromMm(mm, unit), DIGITS[unit]), unit, exactMm: mm };
}

/** The draft in mm: null when empty, NaN when the text is not a number. */
export function lengthDraftMm(d: LengthDraft): number | null {
  if (d.exactMm != null) return d.exactMm;
  const n = parseNumber(d.text);
  return n == null || Number.isNaN(n) ? n : toMm(n, d.unit);
}

/** Switching the unit keeps the length and rewrites the text in the new unit. */
export function withLengthUnit(d: LengthDraft, unit: LengthUnit): LengthDraft {
  if (unit === d.unit) return d;
  const mm = lengthDraftMm(d);
  if (mm == null || Number.isNaN(mm)) return { ...d, unit };
  return { text: numberText(fromMm(mm, unit), DIGITS[unit]), unit, exactMm: mm };
}

// ---------------------------------------------------------------------------------------------------

interface NumberFieldProps extends Omit<TextInputProps, 'style' | 'value' | 'onChangeText'> {
  label: string;
  value: string;
  onChangeText: (text: string) => void;
  /** A fixed unit shown after the input ("L", "%", "L/min"). */
  suffix?: string;
  /** When given, a mm/in selector follows the input. */
  lengthUnit?: LengthUnit;
  onLengthUnitChange?: (unit: LengthUnit) => void;
  error?: string | null;
  hint?: string;
  /** A quiet line under the input, e.g. the value in mm as it will be saved. */
  note?: string | null;
}

/** A labelled numeric input with an optional fixed unit or a mm/in selector. */
export const NumberField = forwardRef<TextInput, NumberFieldProps>(function NumberField(
  { label, value, onChangeText, suffix, lengthUnit, onLengthUnitChange, error, hint, note, testID, onFocus, onBlur, ...rest },
  ref,
) {
  const id = useId();
  const [focused, setFocused] = useState(false);
  const unitLabel = lengthUnit ?? suffix;
  return (
    <View style={styles.wrap}>
      <FieldHead nativeID={`${id}-label`} label={label} hint={hint} />
      <View style={styles.row}>
        <TextInput
          ref={ref}
          testID={testID}
          aria-label={unitLabel ? `${label} (${unitLabel})` : label}
          aria-invalid={!!error}
          inputMode="decimal"
          value={value}
          onChangeText={onChangeText}
          onFocus={(e) => {
            setFocused(true);
            onFocus?.(e);
          }}
          onBlur={(e) => {
            setFocused(false);
            onBlur?.(e);
          }}
          placeholderTextColor={colors.inkMuted}
          style={[styles.input, focused && styles.inputFocused, error ? styles.inputError : null]}
          {...rest}
        />
        {lengthUnit && onLengthUnitChange ? (
          <View role="radiogroup" aria-label={`${label} unit`} style={styles.units} testID={testID ? `${testID}-unit` : undefined}>
            {LENGTH_UNITS.map((u) => {
              const on = u === lengthUnit;
              return (
                <Pressable
                  key={u}
                  role="radio"
                  aria-checked={on}
                  aria-label={u === 'mm' ? 'millimetres' : 'inches'}
                  testID={testID ? `${testID}-unit-${u}` : undefined}
                  onPress={() => onLengthUnitChange(u)}
                  // Space selects a radio too (react-native-web only maps Enter for non-buttons).
                  {...({
                    onKeyDown: (e: { key?: string; nativeEvent?: { key?: string }; preventDefault?: () => void }) => {
                      if ((e.nativeEvent?.key ?? e.key) === ' ') {
                        e.preventDefault?.();
                        onLengthUnitChange(u);
                      }
                    },
                  } as object)}
                  style={({ focused: f }: { pressed: boolean; focused?: boolean }) => [styles.unit, on && styles.unitOn, f && styles.focusRing]}
                >
                  <Text style={[styles.unitText, on && styles.unitTextOn]}>{u}</Text>
                </Pressable>
              );
            })}
          </View>
        ) : suffix ? (
          <Text style={styles.suffix} aria-hidden>
            {suffix}
          </Text>
        ) : null}
      </View>
      {note ? <Text style={type.small}>{note}</Text> : null}
      <FieldMessage error={error} fieldTestID={testID} />
    </View>
  );
});

interface LengthFieldProps extends Omit<NumberFieldProps, 'value' | 'onChange' | 'onChangeText' | 'lengthUnit' | 'onLengthUnitChange' | 'suffix' | 'note'> {
  value: LengthDraft;
  onChange: (next: LengthDraft) => void;
}

/** A length typed in mm or inches; in inches it also shows the mm that will be saved. */
export const LengthField = forwardRef<TextInput, LengthFieldProps>(function LengthField({ value, onChange, ...rest }, ref) {
  const mm = lengthDraftMm(value);
  const note = value.unit === 'in' && mm != null && !Number.isNaN(mm) ? `Saved as ${numberText(mm, 2)} mm` : null;
  return (
    <NumberField
      ref={ref}
      {...rest}
      value={value.text}
      onChangeText={(text) => onChange({ text, unit: value.unit, exactMm: null })}
      lengthUnit={value.unit}
      onLengthUnitChange={(unit) => onChange(withLengthUnit(value, unit))}
      note={note}
    />
  );
});

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  input: { ...field.input, flex: 1, minWidth: 0 },
  inputFocused: { borderColor: colors.focus, borderWidth: 2 },
  inputError: field.inputError,
  units: { flexDirection: 'row', borderRadius: radius.md, borderWidth: 1.5, borderColor: colors.inkMuted, overflow: 'visible' },
  unit: { minHeight: minTouch - 3, minWidth: minTouch + 4, paddingHorizontal: space.sm, alignItems: 'center', justifyContent: 'center', backgroundColor: colors.surface, borderRadius: radius.md - 2 },
  unitOn: { backgroundColor: colors.primary },
  unitText: { fontFamily: fonts.semibold, fontSize: 15, color: colors.ink },
  unitTextOn: { color: colors.onPrimary },
  focusRing: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: 2 } as object,
  suffix: { fontFamily: fonts.semibold, fontSize: 16, color: colors.inkMuted, minWidth: 36 },
});

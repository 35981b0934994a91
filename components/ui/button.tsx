import { ActivityIndicator, Pressable, StyleSheet, Text, type PressableProps } from 'react-native';
import { colors, fonts, gloveTouch, minTouch, radius, space } from '../theme';

interface ButtonProps extends Omit<PressableProps, 'children' | 'style'> {
  label: string;
  variant?: 'primary' | 'secondary' | 'danger' | 'quiet';
  busy?: boolean;
  /** Taller, for use in gloves (the label scanner). */
  large?: boolean;
}

export function Button({ label, variant = 'primary', busy = false, large = false, disabled, ...rest }: ButtonProps) {
  const isDisabled = disabled || busy;
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityLabel={label}
      accessibilityState={{ disabled: !!isDisabled, busy }}
      disabled={isDisabled}
      style={({ pressed, focused }: { pressed: boolean; focused?: boolean }) => [
        styles.base,
        styles[variant],
        large && styles.large,
        pressed && styles[`${variant}Pressed` as const],
        focused && styles.focused,
        isDisabled && styles.disabled,
      ]}
      {...rest}
    >
      {busy ? <ActivityIndicator color={variant === 'primary' || variant === 'danger' ? colors.onPrimary : colors.primary} /> : null}
      <Text style={[styles.text, variant === 'primary' || variant === 'danger' ? styles.textOnFill : styles.textPlain]}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: {
    minHeight: minTouch,
    minWidth: minTouch,
    paddingHorizontal: space.lg,
    borderRadius: radius.md,
    alignItems: 'center',
    justifyContent: 'center',
    flexDirection: 'row',
    gap: space.sm,
    borderWidth: 2,
    borderColor: 'transparent',
  },
  large: { minHeight: gloveTouch, minWidth: gloveTouch },
  primary: { backgroundColor: colors.primary },
  primaryPressed: { backgroundColor: colors.primaryPressed },
  secondary: { backgroundColor: colors.surface, borderColor: colors.primary },
  secondaryPressed: { backgroundColor: colors.surfaceSunk },
  danger: { backgroundColor: colors.danger },
  dangerPressed: { opacity: 0.85 },
  quiet: { backgroundColor: 'transparent' },
  quietPressed: { backgroundColor: colors.surfaceSunk },
  focused: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: 2 } as object,
  disabled: { opacity: 0.55 },
  text: { fontFamily: fonts.semibold, fontSize: 16 },
  textOnFill: { color: colors.onPrimary },
  textPlain: { color: colors.primary },
});

/** The button's look, for a link that looks like one (`LinkButton`). */
export const buttonLook = styles;

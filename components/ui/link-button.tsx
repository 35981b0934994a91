import { Link } from 'expo-router';
import { StyleSheet, Text } from 'react-native';
import { colors, fonts, minTouch, radius, space } from '../theme';

/** A link that looks like a button: it goes somewhere (a form, another page) rather than doing something here. The one LinkButton. */
export function LinkButton({ href, label, variant = 'secondary', testID }: { href: string; label: string; variant?: 'primary' | 'secondary'; testID?: string }) {
  return (
    <Link href={href as never} testID={testID} style={[styles.base, variant === 'primary' ? styles.primary : styles.secondary]}>
      <Text style={[styles.text, { color: variant === 'primary' ? colors.onPrimary : colors.primary }]}>{label}</Text>
    </Link>
  );
}

const styles = StyleSheet.create({
  base: {
    display: 'flex' as never,
    minHeight: minTouch,
    minWidth: minTouch,
    paddingHorizontal: space.lg,
    borderRadius: radius.md,
    alignItems: 'center',
    justifyContent: 'center',
    borderWidth: 2,
    borderColor: 'transparent',
  },
  primary: { backgroundColor: colors.primary },
  secondary: { backgroundColor: colors.surface, borderColor: colors.primary },
  text: { fontFamily: fonts.semibold, fontSize: 16, textAlign: 'center' },
});

import { Link } from 'expo-router';
import type { ReactNode } from 'react';
import { StyleSheet } from 'react-native';
import { colors, fonts, minTouch } from '../theme';

/** An inline text link, underlined so it never rests on colour alone. */
export function TextLink({ href, children, testID }: { href: string; children: ReactNode; testID?: string }) {
  return (
    <Link href={href as never} testID={testID} style={styles.textLink}>
      {children}
    </Link>
  );
}

const styles = StyleSheet.create({
  textLink: { fontFamily: fonts.semibold, fontSize: 16, color: colors.primary, textDecorationLine: 'underline', minHeight: minTouch, display: 'flex' as never, alignItems: 'center' },
});

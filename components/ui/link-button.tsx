import { Link } from 'expo-router';
import { StyleSheet, Text } from 'react-native';
import { buttonLook } from './button';

/** A link that looks like a button: it goes somewhere (a form, another page) rather than doing something here. The one LinkButton. */
export function LinkButton({ href, label, variant = 'secondary', testID }: { href: string; label: string; variant?: 'primary' | 'secondary'; testID?: string }) {
  return (
    <Link href={href as never} testID={testID} style={[buttonLook.base, styles.link, buttonLook[variant]]}>
      <Text style={[buttonLook.text, variant === 'primary' ? buttonLook.textOnFill : buttonLook.textPlain, styles.text]}>{label}</Text>
    </Link>
  );
}

const styles = StyleSheet.create({
  // A Link is a Text on the web: shown as a flex box, one line of words centred in it.
  link: { display: 'flex' as never, flexDirection: 'column' },
  text: { textAlign: 'center' },
});

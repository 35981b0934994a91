import { StyleSheet, Text, View } from 'react-native';
import { MAIL_KINDS, useMailPreferences } from '../data/mail-preferences';
import { SectionTitle } from '../ui/section-title';
import { Toggle } from '../sourcing/toggle';
import { space, type } from '../theme';
import { Card } from '../ui/card';
import { SaveStatus } from '../ui/save-status';

/** Which notices also come by e-mail; each choice is saved on the account as soon as it is made. */
export function MailPreferencesCard() {
  const prefs = useMailPreferences();
  return (
    <Card testID="mailprefs">
      <SectionTitle>Mail me about</SectionTitle>
      <Text style={type.small}>Notices always appear here. Ticked kinds are also sent to your e-mail.</Text>
      <View role="group" aria-label="Mail me about" style={styles.list}>
        {MAIL_KINDS.map(({ kind, label }) => (
          <Toggle key={kind} label={label} value={prefs.isOn(kind)} onChange={(on) => prefs.set(kind, on)} testID={`mailprefs-${kind}`} />
        ))}
      </View>
      <SaveStatus state={prefs} testID="mailprefs" />
    </Card>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.xs },
});

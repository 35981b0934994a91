import { StyleSheet, Text, View } from 'react-native';
import { MAIL_KINDS, useMailPreferences } from '../data/mail-preferences';
import { SectionTitle } from '../ui/section-title';
import { Toggle } from '../sourcing/toggle';
import { colors, fonts, space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';

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
      {prefs.error ? (
        <View role="alert" style={styles.problem} testID="mailprefs-error">
          <Text style={styles.error}>Not saved: {prefs.error.message}</Text>
          <Button label="Try again" variant="secondary" onPress={prefs.retry} testID="mailprefs-retry" />
        </View>
      ) : (
        <Text style={[type.small, prefs.saved && !prefs.saving && styles.saved]} aria-live="polite" testID="mailprefs-status">
          {prefs.saving ? 'Saving…' : prefs.saved ? 'Saved.' : ' '}
        </Text>
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.xs },
  problem: { gap: space.sm, alignItems: 'flex-start' },
  error: { fontFamily: fonts.semibold, fontSize: 15, color: colors.danger },
  saved: { color: colors.fits, fontFamily: fonts.semibold },
});

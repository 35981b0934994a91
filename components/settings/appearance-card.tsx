import { StyleSheet, Text, View } from 'react-native';
import { THEME_CHOICES, type ThemeChoice } from '@/shared/themes';
import { useThemeChoice } from '../data/me';
import { SectionTitle } from '../ui/section-title';
import { colors, fonts, space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ChoiceChips } from '../ui/choice-chips';

const LABELS: Record<ThemeChoice, string> = { system: 'System', light: 'Light', dark: 'Dark', contrast: 'High contrast' };
const OPTIONS = THEME_CHOICES.map((value) => ({ value, label: LABELS[value] }));

/** The colour theme, kept on the account and on this device; shown at once, saved as soon as it is chosen. */
export function AppearanceCard() {
  const theme = useThemeChoice();
  return (
    <Card testID="appearance">
      <SectionTitle>Colours</SectionTitle>
      <Text style={type.small}>System follows this device&apos;s light, dark and contrast settings. Your choice follows you to every device you sign in on.</Text>
      <ChoiceChips label="Theme" options={OPTIONS} value={theme.choice} onChange={theme.choose} testID="appearance-theme" />
      {theme.error ? (
        <View role="alert" style={styles.problem} testID="appearance-error">
          <Text style={styles.error}>Not saved: {theme.error.message}</Text>
          <Button label="Try again" variant="secondary" onPress={theme.retry} testID="appearance-retry" />
        </View>
      ) : (
        <Text style={[type.small, theme.saved && !theme.saving && styles.saved]} aria-live="polite" testID="appearance-status">
          {theme.saving ? 'Saving…' : theme.saved ? 'Saved.' : ' '}
        </Text>
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  problem: { gap: space.sm, alignItems: 'flex-start' },
  error: { fontFamily: fonts.semibold, fontSize: 15, color: colors.danger },
  saved: { color: colors.fits, fontFamily: fonts.semibold },
});

import { Text } from 'react-native';
import { THEME_CHOICES, type ThemeChoice } from '@/shared/themes';
import { useThemeChoice } from '../data/me';
import { SectionTitle } from '../ui/section-title';
import { type } from '../theme';
import { Card } from '../ui/card';
import { ChoiceChips } from '../ui/choice-chips';
import { SaveStatus } from '../ui/save-status';

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
      <SaveStatus state={theme} testID="appearance" />
    </Card>
  );
}

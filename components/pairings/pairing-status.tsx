import { StyleSheet, Text, View } from 'react-native';
import type { PairingStatus } from '@/shared/contract/records';
import { colors, fonts, radius, space } from '../theme';

// Word, mark and colour together, like the verdicts: status never rests on colour alone.
export const STATUS_LOOK: Record<PairingStatus, { word: string; mark: string; fg: string; bg: string; meaning: string }> = {
  draft: { word: 'Draft', mark: '!', fg: colors.caution, bg: colors.cautionSoft, meaning: 'Not approved for use yet.' },
  approved: { word: 'Approved', mark: '✓', fg: colors.fits, bg: colors.fitsSoft, meaning: 'Approved for use.' },
  retired: { word: 'Retired', mark: '✕', fg: colors.noFit, bg: colors.noFitSoft, meaning: 'Retired: must not be used.' },
};

export function PairingStatusBadge({ status, testID }: { status: PairingStatus; testID?: string }) {
  const look = STATUS_LOOK[status];
  return (
    <View style={[styles.badge, { borderColor: look.fg, backgroundColor: look.bg }]} accessibilityLabel={`Status: ${look.word}. ${look.meaning}`}>
      <Text style={[styles.text, { color: look.fg }]} testID={testID}>
        {look.mark} {look.word}
      </Text>
      <Text style={[styles.meaning, { color: colors.ink }]}>{look.meaning}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  badge: { borderWidth: 2, borderRadius: radius.md, paddingHorizontal: space.md, paddingVertical: space.sm, alignSelf: 'flex-start', gap: 2 },
  text: { fontFamily: fonts.bold, fontSize: 20, lineHeight: 24 },
  meaning: { fontFamily: fonts.regular, fontSize: 15 },
});

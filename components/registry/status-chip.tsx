import { StyleSheet, Text, View } from 'react-native';
import type { PairingStatus } from '@/shared/contract/records';
import { colors, fonts, radius, space } from '../theme';
import { STATUS_LABELS } from './labels';

// Word, mark and colour together, as with the fit verdicts.
const LOOK: Record<PairingStatus, { mark: string; fg: string; bg: string }> = {
  approved: { mark: '✓', fg: colors.fits, bg: colors.fitsSoft },
  draft: { mark: '!', fg: colors.caution, bg: colors.cautionSoft },
  retired: { mark: '✕', fg: colors.noFit, bg: colors.noFitSoft },
};

export function StatusChip({ status, testID }: { status: PairingStatus; testID?: string }) {
  const look = LOOK[status];
  return (
    <View style={[styles.chip, { borderColor: look.fg, backgroundColor: look.bg }]} testID={testID}>
      <Text style={[styles.text, { color: look.fg }]}>
        {look.mark} {STATUS_LABELS[status]}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  chip: { borderWidth: 1.5, borderRadius: radius.sm, paddingHorizontal: space.sm, paddingVertical: 2, alignSelf: 'flex-start' },
  text: { fontFamily: fonts.bold, fontSize: 13, lineHeight: 18 },
});

import type { LotStatus } from '../data/receiving';
import { colors } from '../theme';
import { Chip } from '../ui/tag';

const STATUS_LOOK: Record<LotStatus, { word: string; mark: string; fg: string; bg: string }> = {
  checked: { word: 'Checked', mark: '•', fg: colors.inkMuted, bg: colors.surfaceSunk },
  'on-hold': { word: 'ON HOLD', mark: '‖', fg: colors.noFit, bg: colors.noFitSoft },
  quarantined: { word: 'QUARANTINED', mark: '⊘', fg: colors.noFit, bg: colors.noFitSoft },
  released: { word: 'Released', mark: '↗', fg: colors.fits, bg: colors.fitsSoft },
};

/** Where a lot stands at the dock: word, mark and colour. */
export function LotStatusChip({ status, testID }: { status: LotStatus; testID?: string }) {
  const look = STATUS_LOOK[status];
  return <Chip label={`${look.mark} ${look.word}`} fg={look.fg} bg={look.bg} testID={testID} />;
}

import type { WarningStatus } from '../data/warnings';
import { Tag } from '../ui/tag';

const LOOK: Record<WarningStatus, { label: string; tone: 'noFit' | 'caution' | 'fits' }> = {
  open: { label: '! Open', tone: 'noFit' },
  acknowledged: { label: '◐ Acknowledged', tone: 'caution' },
  resolved: { label: '✓ Resolved', tone: 'fits' },
};

/** A warning's status: word, mark and colour. */
export function WarningStatusChip({ status, testID }: { status: WarningStatus; testID?: string }) {
  const look = LOOK[status];
  return <Tag label={look.label} tone={look.tone} testID={testID} />;
}

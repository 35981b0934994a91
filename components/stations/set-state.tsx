import type { TubeSetState } from '@/shared/contract/records';
import { Tag } from '../ui/tag';

// The rotation at a drum position: online -> cleaning -> clean and ready -> standby -> online.
export const SET_STATE_LOOK: Record<TubeSetState, { word: string; mark: string; tone: 'primary' | 'caution' | 'fits' | 'muted' }> = {
  online: { word: 'Online', mark: '▶', tone: 'primary' },
  standby: { word: 'In standby drum', mark: '→', tone: 'muted' },
  cleaning: { word: 'Cleaning', mark: '~', tone: 'caution' },
  ready: { word: 'Clean and ready', mark: '✓', tone: 'fits' },
};

export function SetStateChip({ state, testID }: { state: TubeSetState; testID?: string }) {
  const look = SET_STATE_LOOK[state];
  return <Tag label={`${look.mark} ${look.word}`} tone={look.tone} testID={testID} />;
}

import type { DipTubeRecord } from '@/shared/contract/records';
import { resourceQueries } from './resource';

export type { DipTubeRecord };
export const dipTubeQueries = resourceQueries<DipTubeRecord, Record<string, unknown>>('dip-tubes');

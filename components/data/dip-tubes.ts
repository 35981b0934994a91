import type { DipTubeRecord } from '@/shared/api-types';
import { resourceQueries } from './resource';

export type { DipTubeRecord };
export const dipTubeQueries = resourceQueries<DipTubeRecord, Record<string, unknown>>('dip-tubes');

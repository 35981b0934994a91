import type { TubeSetRecord } from '@/shared/contract/records';
import { resourceQueries } from './resource';

export type { TubeSetRecord };
export const tubeSetQueries = resourceQueries<TubeSetRecord, Record<string, unknown>>('tube-sets');

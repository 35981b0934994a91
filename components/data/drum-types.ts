import type { DrumTypeRecord } from '@/shared/contract/records';
import { resourceQueries } from './resource';

export type { DrumTypeRecord };
export const drumTypeQueries = resourceQueries<DrumTypeRecord, Record<string, unknown>>('drum-types');

import type { SlurryRecord } from '@/shared/contract/records';
import { resourceQueries } from './resource';

export type { SlurryRecord };
export const slurryQueries = resourceQueries<SlurryRecord, Record<string, unknown>>('slurries');

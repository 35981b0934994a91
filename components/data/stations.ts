import type { StationRecord } from '@/shared/contract/records';
import { resourceQueries } from './resource';

export type { StationRecord };
export const stationQueries = resourceQueries<StationRecord, Record<string, unknown>>('stations');

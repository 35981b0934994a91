import type { PairingRecord } from '@/shared/contract/records';
import { resourceQueries } from './resource';

export type { PairingRecord };
export const pairingQueries = resourceQueries<PairingRecord, Record<string, unknown>>('pairings');

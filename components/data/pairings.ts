import type { PairingRecord } from '@/shared/api-types';
import { resourceQueries } from './resource';

export type { PairingRecord };
export const pairingQueries = resourceQueries<PairingRecord, Record<string, unknown>>('pairings');

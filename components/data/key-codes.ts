import type { KeyCodeRecord } from '@/shared/contract/records';
import { resourceQueries } from './resource';

export type { KeyCodeRecord };
export const keyCodeQueries = resourceQueries<KeyCodeRecord, Record<string, unknown>>('key-codes');

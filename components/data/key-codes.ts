import type { KeyCodeRecord } from '@/shared/api-types';
import { resourceQueries } from './resource';

export type { KeyCodeRecord };
export const keyCodeQueries = resourceQueries<KeyCodeRecord, Record<string, unknown>>('key-codes');

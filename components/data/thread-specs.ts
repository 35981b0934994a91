import type { ThreadSpecRecord } from '@/shared/contract/records';
import { resourceQueries } from './resource';

export type { ThreadSpecRecord };
export const threadSpecQueries = resourceQueries<ThreadSpecRecord, Record<string, unknown>>('thread-specs');

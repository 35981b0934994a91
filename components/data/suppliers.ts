import type { SupplierRecord } from '@/shared/contract/records';
import { resourceQueries } from './resource';

export type { SupplierRecord };
export const supplierQueries = resourceQueries<SupplierRecord, Record<string, unknown>>('suppliers');

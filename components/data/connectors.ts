import type { ConnectorRecord } from '@/shared/contract/records';
import { resourceQueries } from './resource';

export type { ConnectorRecord };
export const connectorQueries = resourceQueries<ConnectorRecord, Record<string, unknown>>('connectors');

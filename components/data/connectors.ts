import type { ConnectorRecord } from '@/shared/api-types';
import { resourceQueries } from './resource';

export type { ConnectorRecord };
export const connectorQueries = resourceQueries<ConnectorRecord, Record<string, unknown>>('connectors');

import type { UseQueryResult } from '@tanstack/react-query';
import type { ListParams, Page } from '@/shared/contract/records';
import { connectorQueries } from '../data/connectors';
import { dipTubeQueries } from '../data/dip-tubes';
import { drumTypeQueries } from '../data/drum-types';
import { pairingQueries } from '../data/pairings';
import { slurryQueries } from '../data/slurries';
import { supplierQueries } from '../data/suppliers';

export type RegistryResource = 'drum-types' | 'dip-tubes' | 'connectors' | 'pairings' | 'slurries' | 'suppliers';

interface ResourceEntry {
  /** What one record is called in running text, and several. */
  noun: { one: string; many: string };
  queries: { useList: (params: ListParams) => UseQueryResult<Page<unknown>>; useDetail: (id: string) => UseQueryResult<unknown> };
  /** Pages that show lengths get the mm / in switch. */
  showsLengths: boolean;
}

/** Each registry resource once, for its list page and its detail page. */
export const REGISTRY_RESOURCES = {
  'drum-types': { noun: { one: 'drum type', many: 'drum types' }, queries: drumTypeQueries, showsLengths: true },
  'dip-tubes': { noun: { one: 'dip tube', many: 'dip tubes' }, queries: dipTubeQueries, showsLengths: true },
  connectors: { noun: { one: 'dispense head', many: 'dispense heads' }, queries: connectorQueries, showsLengths: true },
  pairings: { noun: { one: 'pairing', many: 'pairings' }, queries: pairingQueries, showsLengths: false },
  slurries: { noun: { one: 'slurry', many: 'slurries' }, queries: slurryQueries, showsLengths: false },
  suppliers: { noun: { one: 'supplier', many: 'suppliers' }, queries: supplierQueries, showsLengths: false },
} as const satisfies Record<RegistryResource, ResourceEntry>;

/** The record a resource's pages show. */
export type RecordOf<R extends RegistryResource> = ((typeof REGISTRY_RESOURCES)[R]['queries'] extends { useDetail: (id: string) => UseQueryResult<infer T> } ? T : never) & { id: string };

/** The resource's query hooks, typed with its record. */
export function queriesOf<R extends RegistryResource>(resource: R) {
  return REGISTRY_RESOURCES[resource].queries as unknown as {
    useList: (params: ListParams) => UseQueryResult<Page<RecordOf<R>>>;
    useDetail: (id: string) => UseQueryResult<RecordOf<R>>;
  };
}

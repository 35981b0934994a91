import { useLocalSearchParams } from 'expo-router';
import { useMemo, useState } from 'react';
import type { ListParams } from '@/shared/contract/records';
import type { TableSort } from '../ui/data-table';

export const FILTER_NAMES = ['region', 'thread', 'key', 'status', 'supplierId'] as const;
export type FilterName = (typeof FILTER_NAMES)[number];
export type Filters = Partial<Record<FilterName, string>>;

export const DEFAULT_PAGE_SIZE = 10;

const firstParam = (v: string | string[] | undefined): string | undefined => (Array.isArray(v) ? v[0] : v) || undefined;

/**
 * Search, sort, filters and page of one registry list. Starts from the address (a link such as
 * /registry/dip-tubes?thread=NPS-2 opens the list filtered); any change of search, sort or filter goes
 * back to page 1, since the old page number means nothing in the new result.
 */
export function useListState(defaultSort: TableSort) {
  const params = useLocalSearchParams<Record<string, string | string[]>>();
  const [q, setQState] = useState(() => firstParam(params.q) ?? '');
  const [sort, setSortState] = useState<TableSort>(defaultSort);
  const [page, setPage] = useState(1);
  const [filters, setFilters] = useState<Filters>(() => {
    const out: Filters = {};
    for (const name of FILTER_NAMES) {
      const v = firstParam(params[name]);
      if (v) out[name] = v;
    }
    return out;
  });

  const query: ListParams = useMemo(() => ({ q: q || undefined, sort: sort.key, order: sort.order, page, pageSize: DEFAULT_PAGE_SIZE, ...filters }), [q, sort, page, filters]);
  const narrowed = !!q || Object.values(filters).some(Boolean);

  return {
    q,
    sort,
    page,
    filters,
    query,
    /** True when a search or a filter hides part of the registry. */
    narrowed,
    setQ: (next: string) => {
      setQState(next);
      setPage(1);
    },
    setSort: (next: TableSort) => {
      setSortState(next);
      setPage(1);
    },
    setFilter: (name: FilterName, value: string | undefined) => {
      setFilters((f) => ({ ...f, [name]: value || undefined }));
      setPage(1);
    },
    setPage,
    clearFilters: () => {
      setFilters({});
      setPage(1);
    },
    clearAll: () => {
      setQState('');
      setFilters({});
      setPage(1);
    },
  };
}

export type ListState = ReturnType<typeof useListState>;

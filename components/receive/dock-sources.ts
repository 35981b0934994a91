// The dock form's pickers: the registry's list endpoints with the network, the kept snapshot without it
// (same search: every word of the query in the record's words), so a clerk can pick offline too.
import { useQuery, type UseQueryResult } from '@tanstack/react-query';
import type { DrumTypeRecord, ListParams, Page, SlurryRecord, StationRecord, SupplierRecord } from '@/shared/contract/records';
import type { DockSnapshot } from '@/shared/dock/snapshot';
import { useDockSnapshot } from '../data/dock-snapshot';
import { drumTypeQueries } from '../data/drum-types';
import { slurryQueries } from '../data/slurries';
import { stationQueries } from '../data/stations';
import { supplierQueries } from '../data/suppliers';
import { useOnline } from '../offline/use-online';

interface Source<T> {
  useList: (params: ListParams, options?: { enabled?: boolean }) => UseQueryResult<Page<T>, Error>;
}

function matches(words: string, q: string | undefined): boolean {
  if (!q?.trim()) return true;
  const hay = words.toLowerCase();
  return q
    .toLowerCase()
    .split(/\s+/)
    .filter(Boolean)
    .every((w) => hay.includes(w));
}

function keptSource<T extends { id: string }>(name: string, remote: Source<T>, pick: (s: DockSnapshot) => T[], words: (r: T) => string): Source<T> {
  return {
    useList(params, options = {}) {
      const online = useOnline();
      const kept = useDockSnapshot();
      const live = remote.useList(params, { enabled: (options.enabled ?? true) && online });
      const local = useQuery({
        queryKey: ['kept-pick', name, params, kept.data?.snapshot.revision ?? null],
        queryFn: (): Page<T> => {
          const all = kept.data ? pick(kept.data.snapshot).filter((r) => matches(words(r), params.q)) : [];
          const size = params.pageSize ?? 25;
          return { items: all.slice(0, size), total: all.length, page: 1, pageSize: size };
        },
        enabled: (options.enabled ?? true) && !online && !!kept.data,
        networkMode: 'always',
        staleTime: Infinity,
      });
      return online ? live : local;
    },
  };
}

// The snapshot's records carry what the pickers show; the rest of each record is not needed to pick it.
export const keptDrumTypes = keptSource<DrumTypeRecord>(
  'drum-types',
  drumTypeQueries,
  (s) => s.drumTypes as unknown as DrumTypeRecord[],
  (d) => `${d.name} ${d.partNumber} ${d.supplierName ?? ''}`,
);
export const keptStations = keptSource<StationRecord>(
  'stations',
  stationQueries,
  (s) => s.stations as unknown as StationRecord[],
  (d) => `${d.name} ${d.bay}`,
);
export const keptSlurries = keptSource<SlurryRecord>(
  'slurries',
  slurryQueries,
  (s) => s.slurries as unknown as SlurryRecord[],
  (d) => `${d.name} ${d.supplierName ?? ''}`,
);
export const keptSuppliers = keptSource<SupplierRecord>(
  'suppliers',
  supplierQueries,
  (s) => s.suppliers as unknown as SupplierRecord[],
  (d) => d.name,
);

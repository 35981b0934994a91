// The query cache kept on the device, in IndexedDB (idb-keyval) through TanStack's async-storage persister:
// only what the dock needs offline, the registry snapshot and the checks waiting to be sent.
import { createAsyncStoragePersister } from '@tanstack/query-async-storage-persister';
import type { PersistQueryClientOptions } from '@tanstack/react-query-persist-client';
import { del, get, set } from 'idb-keyval';
import { DOCK_SNAPSHOT_KEY } from '../data/dock-snapshot';
import { DOCK_CHECK_KEY } from '../data/dock-queue';

/** Kept for a week at most: a registry older than that should not judge a lot. */
export const KEPT_FOR_MS = 7 * 24 * 3600_000;

export const canPersist = (): boolean => typeof indexedDB !== 'undefined';

export function persistOptions(): Omit<PersistQueryClientOptions, 'queryClient'> {
  const persister = createAsyncStoragePersister({
    storage: { getItem: (k) => get<string>(k).then((v) => v ?? null), setItem: (k, v) => set(k, v), removeItem: (k) => del(k) },
    key: 'bungwise-kept',
    throttleTime: 500,
  });
  return {
    persister,
    maxAge: KEPT_FOR_MS,
    // A new app version with another snapshot shape starts afresh rather than misread the old one.
    buster: 'dock-2',
    dehydrateOptions: {
      shouldDehydrateQuery: (q) => q.queryKey[0] === DOCK_SNAPSHOT_KEY[0] && q.state.status === 'success',
      shouldDehydrateMutation: (m) => m.options.mutationKey?.[0] === DOCK_CHECK_KEY[0] && m.state.status !== 'success' && m.state.status !== 'error',
    },
  };
}

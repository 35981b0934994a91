import { useQuery } from '@tanstack/react-query';
import type { DockSnapshot } from '@/shared/contract/dock';
import { can } from '@/shared/contract/roles';
import { api } from '../api/client';
import { useSession } from '../session';

/** The kept registry, with when this phone last had it confirmed by the server. */
export interface KeptSnapshot {
  snapshot: DockSnapshot;
  fetchedAt: string;
}

export const DOCK_SNAPSHOT_KEY = ['dock-snapshot'] as const;

/**
 * The registry the dock needs to judge a lot offline. Kept on the device (components/offline/persist.ts) and
 * asked again every few minutes and on reconnecting; the server answers 304 when nothing changed, which the
 * browser turns back into the body it holds.
 */
export function useDockSnapshot() {
  const { session } = useSession();
  return useQuery({
    queryKey: DOCK_SNAPSHOT_KEY,
    queryFn: async (): Promise<KeptSnapshot> => ({ snapshot: await api<DockSnapshot>('/dock-snapshot'), fetchedAt: new Date().toISOString() }),
    enabled: !!session && can(session.user.role, 'check-lots'),
    staleTime: 60_000,
    gcTime: Infinity,
    refetchInterval: 5 * 60_000,
    networkMode: 'offlineFirst',
  });
}

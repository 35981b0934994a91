import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { OrderLine, Page, StationNeed } from '@/shared/contract/records';
import { api } from '../api/client';

export type WarningStatus = 'open' | 'acknowledged' | 'resolved';

/** A plan or a held lot that needs hardware the site lacks (GET /warnings). */
export interface HardwareWarningRecord {
  id: string;
  version: number;
  source: 'plan' | 'lot';
  sourcingPlanId: string | null;
  receivingCheckId: string | null;
  lotNumber: string | null;
  planSlurryName: string | null;
  status: WarningStatus;
  summary: string;
  needs: Array<{ stations: StationNeed[]; order: OrderLine[] }>;
  acknowledgedByName: string | null;
  acknowledgedAt: string | null;
  resolvedByName: string | null;
  resolvedAt: string | null;
  createdAt: string;
}

export const warningKeys = {
  all: ['warnings'] as const,
  list: (status: WarningStatus | undefined) => ['warnings', 'list', status ?? 'all'] as const,
};

export function useWarningsQuery(status?: WarningStatus) {
  return useQuery({
    queryKey: warningKeys.list(status),
    queryFn: () => api<Page<HardwareWarningRecord>>(`/warnings${status ? `?status=${status}` : ''}`),
  });
}

/** Moves a warning open -> acknowledged -> resolved. Plans show their warnings, so they are refreshed too. */
export function useMoveWarningMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, to }: { id: string; to: 'acknowledge' | 'resolve' }) => api<HardwareWarningRecord>(`/warnings/${id}/${to}`, { method: 'POST' }),
    onSuccess: () => Promise.all([qc.invalidateQueries({ queryKey: warningKeys.all }), qc.invalidateQueries({ queryKey: ['sourcing-plans'] })]),
  });
}

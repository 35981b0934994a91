import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Page } from '@/shared/contract/records';
import type { HardwareWarningRecord, WarningStatus } from '@/shared/contract/sourcing';
import { api } from '../api/client';

export type { HardwareWarningRecord, WarningStatus };

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

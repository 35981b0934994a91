import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { OrderLine, Page, StationNeed } from '@/shared/contract/records';
import type { SourcingPlanDetail, SourcingPlanRecord } from '@/shared/contract/sourcing';
import { api } from '../api/client';
import { notificationKeys } from './notifications';
import { warningKeys } from './warnings';

export type { OrderLine, SourcingPlanDetail, SourcingPlanRecord, StationNeed };

export interface SourcingPlanInput {
  slurryName: string;
  supplierId: string;
  drumTypeId: string;
  startDate: string;
  drumsPerMonth: number;
  stationIds?: string[];
  foams?: boolean;
  shearSensitive?: boolean;
  notes?: string;
}

export const sourcingKeys = {
  all: ['sourcing-plans'] as const,
  list: () => ['sourcing-plans', 'list'] as const,
  detail: (id: string) => ['sourcing-plans', 'detail', id] as const,
};

export function useSourcingPlansQuery() {
  return useQuery({ queryKey: sourcingKeys.list(), queryFn: () => api<Page<SourcingPlanRecord>>('/sourcing-plans') });
}

export function useSourcingPlanQuery(id: string | undefined) {
  return useQuery({ queryKey: sourcingKeys.detail(id ?? ''), queryFn: () => api<SourcingPlanDetail>(`/sourcing-plans/${id}`), enabled: !!id });
}

/** A new plan may open a warning and notify buyers, so those are refreshed with the plans. */
export function useSourcingPlanCreateMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: SourcingPlanInput) => api<SourcingPlanDetail>('/sourcing-plans', { method: 'POST', body }),
    onSuccess: (saved) => {
      qc.setQueryData(sourcingKeys.detail(saved.id), saved);
      return Promise.all([qc.invalidateQueries({ queryKey: sourcingKeys.list() }), qc.invalidateQueries({ queryKey: warningKeys.all }), qc.invalidateQueries({ queryKey: notificationKeys.all })]);
    },
  });
}

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { OrderLine, Page, Region, StationNeed } from '@/shared/contract/records';

export type { OrderLine };
import { api } from '../api/client';
import { notificationKeys } from './notifications';
import { warningKeys, type HardwareWarningRecord } from './warnings';

/** What one station needs to run the plan's drum. */
export type StationImpact = StationNeed;

export interface SourcingPlanRecord {
  id: string;
  version: number;
  slurryName: string;
  supplierId: string;
  supplierName: string | null;
  region: Region | null;
  drumTypeId: string;
  drumTypeName: string | null;
  drumTypePartNumber: string | null;
  startDate: string;
  drumsPerMonth: number;
  stationIds: string[];
  foams: boolean;
  shearSensitive: boolean;
  notes: string | null;
  createdByName: string | null;
  createdAt: string;
}

export interface SourcingPlanDetail extends SourcingPlanRecord {
  impact: { stations: StationImpact[]; order: OrderLine[] };
  warnings: HardwareWarningRecord[];
}

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

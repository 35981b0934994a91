import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { TemperatureIndicator } from '@/shared/acceptance/types';
import type { DrumDescription, ReceivingCheckDetail, ReceivingCheckRecord, ReceivingCheckRow } from '@/shared/contract/receiving';
import type { Page } from '@/shared/contract/records';
import type { Verdict } from '@/shared/contract/verdicts';
import type { LotStatus } from '@/shared/contract/lot-status';
import type { DockQuestion } from '@/shared/dock/snapshot';
import type { LotDecision, LotVerdict } from '@/shared/dock/verdict';
import { api } from '../api/client';
import { useAttachmentUploadMutation } from './attachments';
import { notificationKeys } from './notifications';
import { warningKeys } from './warnings';

export type { Verdict, LotStatus, LotDecision, LotVerdict, TemperatureIndicator };

export type { DrumDescription, ReceivingCheckDetail, ReceivingCheckRecord, ReceivingCheckRow };

/** POST /receiving-checks: the dock's question (shared with the phone's own check) and the lot's own fields. */
export interface ReceivingCheckInput extends DockQuestion {
  lotNumber: string;
  drumCount: number;
  supplierId?: string;
  /** The phone's key for this check: a second send of it records nothing new. */
  clientKey?: string;
}

export interface ReceivingListParams {
  q?: string;
  verdict?: Verdict;
  status?: LotStatus;
  from?: string;
  to?: string;
  page?: number;
  pageSize?: number;
}

function queryString(params: object): string {
  const entries = Object.entries(params).filter(([, v]) => v !== undefined && v !== '' && v !== null);
  return entries.length ? `?${entries.map(([k, v]) => `${k}=${encodeURIComponent(String(v))}`).join('&')}` : '';
}

export const receivingKeys = {
  all: ['receiving-checks'] as const,
  list: (params: ReceivingListParams) => ['receiving-checks', 'list', params] as const,
  detail: (id: string) => ['receiving-checks', 'detail', id] as const,
};

export function useReceivingChecksQuery(params: ReceivingListParams, options: { enabled?: boolean } = {}) {
  return useQuery({
    queryKey: receivingKeys.list(params),
    queryFn: () => api<Page<ReceivingCheckRow>>(`/receiving-checks${queryString(params)}`),
    placeholderData: keepPreviousData,
    ...options,
  });
}

export function useReceivingCheckQuery(id: string | undefined) {
  return useQuery({ queryKey: receivingKeys.detail(id ?? ''), queryFn: () => api<ReceivingCheckDetail>(`/receiving-checks/${id}`), enabled: !!id });
}

/** Records a dock check: the server runs the fit check and stores it with the lot. */
export function useReceivingCheckCreateMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: ReceivingCheckInput) => api<ReceivingCheckDetail>('/receiving-checks', { method: 'POST', body }),
    onSuccess: (saved) => {
      qc.setQueryData(receivingKeys.detail(saved.id), saved);
      return qc.invalidateQueries({ queryKey: receivingKeys.all });
    },
  });
}

/** Holding a lot also raises a hardware warning and notices for engineers and buyers. */
export function useHoldLotMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, reason }: { id: string; reason: string }) => api<ReceivingCheckDetail>(`/receiving-checks/${id}/hold`, { method: 'POST', body: { reason } }),
    onSuccess: (saved) => {
      qc.setQueryData(receivingKeys.detail(saved.id), saved);
      return Promise.all([qc.invalidateQueries({ queryKey: receivingKeys.all }), qc.invalidateQueries({ queryKey: warningKeys.all }), qc.invalidateQueries({ queryKey: notificationKeys.all })]);
    },
  });
}

export function useReleaseLotMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, comment }: { id: string; comment: string }) => api<ReceivingCheckDetail>(`/receiving-checks/${id}/release`, { method: 'POST', body: { comment } }),
    onSuccess: (saved) => {
      qc.setQueryData(receivingKeys.detail(saved.id), saved);
      return qc.invalidateQueries({ queryKey: receivingKeys.all });
    },
  });
}

/** Attaches a lot's certificate of analysis; the server judges the lot again, which may lift its hold. */
export function useCertificateUploadMutation(checkId: string) {
  const qc = useQueryClient();
  return useAttachmentUploadMutation('receiving-check', checkId, 'certificate', () =>
    Promise.all([qc.invalidateQueries({ queryKey: receivingKeys.all }), qc.invalidateQueries({ queryKey: warningKeys.all })]),
  );
}

import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { TemperatureIndicator } from '@/shared/acceptance/types';
import type { FitCheckResult, Page } from '@/shared/contract/records';
import type { LotStatus } from '@/shared/contract/lot-status';
import type { LotDecision, LotVerdict } from '@/shared/dock/verdict';
import { api } from '../api/client';
import { useAttachmentUploadMutation } from './attachments';
import { notificationKeys } from './notifications';
import { warningKeys } from './warnings';

export type Verdict = FitCheckResult['verdict'];
export type { LotStatus, LotDecision, LotVerdict, TemperatureIndicator };

/** A drum described at the dock instead of picked from the registry. */
export interface DrumDescription {
  insideDepthMm: number;
  openings: Array<{ label?: string; threadCode: string; keyCode?: string | null }>;
}

/** One recorded dock check (GET /receiving-checks/:id, POST /receiving-checks). */
export interface ReceivingCheckRecord {
  id: string;
  version: number;
  lotNumber: string;
  supplierId: string | null;
  supplierName: string | null;
  slurryId: string | null;
  slurryName: string | null;
  drumCount: number;
  drumTypeId: string | null;
  drumTypeName: string | null;
  drumTypePartNumber: string | null;
  drumDescription: DrumDescription | null;
  stationId: string | null;
  stationName: string | null;
  productionDate: string | null;
  expiryDate: string | null;
  temperatureIndicator: TemperatureIndicator | null;
  /** The hardware verdict alone. */
  verdict: Verdict;
  /** The combined decision (hardware and lot acceptance) and its sentence; null for checks stored before it. */
  decision: LotDecision;
  lotVerdict: LotVerdict | null;
  result: FitCheckResult;
  checkedById: string;
  checkedByName: string | null;
  checkedAt: string;
  status: LotStatus;
  holdReason: string | null;
  heldByRules: boolean;
  heldByName: string | null;
  heldAt: string | null;
  releasedByName: string | null;
  releasedAt: string | null;
  releaseComment: string | null;
}

/** A row of the history list: the stored result is cut down to its summary. */
export type ReceivingCheckRow = Omit<ReceivingCheckRecord, 'result' | 'lotVerdict'> & { result: { summary: string }; lotVerdict: Pick<LotVerdict, 'decision' | 'sentence'> | null };

/** A piece of hardware that touched the lot: recorded when a set in one of its drums went online. */
export interface LotChangeOut {
  id: string;
  at: string;
  stationId: string;
  stationName: string | null;
  tubeSetId: string;
  tubeSetLabel: string | null;
  dipTubePartNumber: string | null;
  connectorPartNumber: string | null;
  drumSerial: string | null;
  byName: string | null;
}

export interface ReceivingCheckDetail extends ReceivingCheckRecord {
  changeOuts: LotChangeOut[];
}

export interface ReceivingCheckInput {
  lotNumber: string;
  drumCount: number;
  supplierId?: string;
  slurryId?: string;
  drumTypeId?: string;
  drum?: DrumDescription;
  stationId?: string;
  productionDate?: string;
  expiryDate?: string;
  temperatureIndicator?: TemperatureIndicator;
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

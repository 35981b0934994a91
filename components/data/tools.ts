import { useMutation, useQuery } from '@tanstack/react-query';
import type { DrumTypeChecks, FlowAnswer, PackagingCodeAnswer } from '@/shared/contract/tools';
import type { PackagingFinding, ParsedPackagingCode } from '@/shared/packaging-code';
import type { PackagingMark } from '@/shared/packaging-mark';
import type { ThreadSide } from '@/shared/threads/thread-table';
import type { LengthRecommendation } from '@/shared/recommend-length';
import type { ThreadIdentification } from '@/shared/threads/identify';
import type { FlowUnit, LengthUnit } from '@/shared/units';
import { api } from '../api/client';
import { drumTypeQueries } from './drum-types';

export type { ThreadIdentification, ParsedPackagingCode, PackagingFinding, LengthRecommendation, PackagingMark, DrumTypeChecks, FlowAnswer, PackagingCodeAnswer };

export interface ThreadMatchInput {
  majorDiameter: { value: number; unit: LengthUnit };
  threadsPerInch?: number;
  pitchMm?: number;
  flankAngleDeg?: number;
  taper?: 'tapered' | 'parallel';
  /** A drum opening's thread is internal: ISO 7-1 R (external only) is then never offered. */
  side?: ThreadSide;
}

export interface FlowInput {
  flow: { value: number; unit: FlowUnit };
  feedBoreMm: number;
  returnBoreMm?: number | null;
}

export const toolKeys = {
  packagingCode: (code: string) => ['tools', 'packaging-code', code] as const,
  // Under the drum-types key, so editing a drum type (which invalidates drum-types) refreshes its checks.
  drumTypeChecks: (id: string) => [...drumTypeQueries.keys.all, 'checks', id] as const,
};

/** Thread identification from dock measurements; a calculation, so a mutation the screen re-runs on submit. */
export function useThreadMatchMutation() {
  return useMutation({ mutationFn: (input: ThreadMatchInput) => api<ThreadIdentification>('/tools/thread-match', { method: 'POST', body: input }) });
}

export function useFlowMutation() {
  return useMutation({ mutationFn: (input: FlowInput) => api<FlowAnswer>('/tools/flow', { method: 'POST', body: input }) });
}

/** The explanation of one UN packaging code; nothing is asked until a code is given. */
export function usePackagingCodeQuery(code: string | null) {
  return useQuery({
    queryKey: toolKeys.packagingCode(code ?? ''),
    queryFn: () => api<PackagingCodeAnswer>(`/tools/packaging-codes/${encodeURIComponent(code ?? '')}`),
    enabled: !!code,
    staleTime: Infinity,
  });
}

/** Recommended tube length and the UN packaging-code findings for one drum type. */
export function useDrumTypeChecksQuery(id: string | undefined) {
  return useQuery({
    queryKey: toolKeys.drumTypeChecks(id ?? ''),
    queryFn: () => api<DrumTypeChecks>(`/tools/drum-types/${id}/checks`),
    enabled: !!id,
  });
}

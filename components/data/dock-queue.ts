// Dock checks made with no network: kept on the device as paused TanStack mutations (persisted with the
// query cache, components/offline/persist.ts) and sent when the server answers again. Each carries the key
// the phone gave it, so a send that reached the server before the network dropped records nothing twice.
import { useMutation, useMutationState, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { ProvisionalVerdict } from '@/shared/contract/receiving';
import { api, ApiError, getApiToken, isNetworkError } from '../api/client';
import { receivingKeys, type ReceivingCheckInput, type ReceivingCheckRecord } from './receiving';

export const DOCK_CHECK_KEY = ['dock-check'] as const;

export interface QueuedDockCheck {
  body: ReceivingCheckInput & { clientKey: string; provisional?: ProvisionalVerdict };
  queuedAt: string;
}

/** How a queued check is sent: registered on the client before the kept queue is restored, so it can resume. */
export function registerDockQueue(client: QueryClient): void {
  client.setMutationDefaults(DOCK_CHECK_KEY, {
    mutationFn: async (vars: QueuedDockCheck) => {
      // After a reload the session is restored a moment after the queue: wait for it rather than send unsigned.
      if (!getApiToken()) throw new ApiError(0, 'network', 'Waiting for the session.', null);
      return api<ReceivingCheckRecord>('/receiving-checks', { method: 'POST', body: vars.body, queued: true });
    },
    // No answer: try again (paused while offline). Any answer, even a refusal, ends the wait.
    retry: (_count, err) => isNetworkError(err),
    retryDelay: (attempt) => Math.min(1000 * 2 ** attempt, 30_000),
    onSuccess: () => client.invalidateQueries({ queryKey: receivingKeys.all }),
  });
}

export function useQueueDockCheck() {
  const qc = useQueryClient();
  return useMutation<ReceivingCheckRecord, Error, QueuedDockCheck>({ mutationKey: DOCK_CHECK_KEY }, qc);
}

export interface QueuedState {
  clientKey: string;
  lotNumber: string;
  queuedAt: string;
  status: 'waiting' | 'sent' | 'refused';
  record: ReceivingCheckRecord | null;
  error: string | null;
}

/** Every queued check this session knows of: waiting, sent (with the recorded check), or refused. */
export function useQueuedChecks(): QueuedState[] {
  return useMutationState({
    filters: { mutationKey: DOCK_CHECK_KEY },
    select: (m) => {
      const vars = m.state.variables as QueuedDockCheck | undefined;
      const status: QueuedState['status'] = m.state.status === 'success' ? 'sent' : m.state.status === 'error' ? 'refused' : 'waiting';
      return {
        clientKey: vars?.body.clientKey ?? String(m.mutationId),
        lotNumber: vars?.body.lotNumber ?? '',
        queuedAt: vars?.queuedAt ?? '',
        status,
        record: (m.state.data as ReceivingCheckRecord | undefined) ?? null,
        error: m.state.error ? (m.state.error as Error).message : null,
      };
    },
  });
}

export const useWaitingCount = (): number => useQueuedChecks().filter((q) => q.status === 'waiting').length;

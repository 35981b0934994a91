import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PairingRecord } from '@/shared/contract/records';
import { api } from '../api/client';
import { connectorQueries } from './connectors';
import { dipTubeQueries } from './dip-tubes';
import { drumTypeQueries } from './drum-types';
import { pairingQueries } from './pairings';

export type PairingAction = 'approve' | 'reject' | 'retire';

/**
 * A review decision on a pairing: approve (comment optional), reject or retire (comment required). The
 * server answers with the pairing as it now stands, reviews included.
 */
export function usePairingActionMutation(action: PairingAction) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, comment }: { id: string; comment?: string }) => api<PairingRecord>(`/pairings/${id}/${action}`, { method: 'POST', body: comment?.trim() ? { comment: comment.trim() } : {} }),
    onSuccess: (pairing) => {
      qc.setQueryData(pairingQueries.keys.detail(pairing.id), pairing);
      qc.invalidateQueries({ queryKey: pairingQueries.keys.all });
      // Tube, head and drum pages list their pairings with a status.
      qc.invalidateQueries({ queryKey: dipTubeQueries.keys.all });
      qc.invalidateQueries({ queryKey: connectorQueries.keys.all });
      qc.invalidateQueries({ queryKey: drumTypeQueries.keys.all });
    },
  });
}

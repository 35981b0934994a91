import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ChangeOutRecord, BoardRinse, BoardTubeSet, StationBoard } from '@/shared/contract/stations';
import { api } from '../api/client';
import { receivingKeys } from './receiving';
import { stationQueries } from './stations';
import { tubeSetQueries } from './tube-sets';

export type { ChangeOutRecord, BoardRinse, BoardTubeSet, StationBoard };

export interface StandbyInput {
  id: string;
  version: number;
  receivingCheckId?: string;
  lotNumber?: string;
  drumSerial?: string;
}

export const stationBoardKeys = {
  all: ['station-board'] as const,
  board: (stationId: string) => ['station-board', stationId] as const,
};

export function useStationBoardQuery(stationId: string | undefined) {
  return useQuery({ queryKey: stationBoardKeys.board(stationId ?? ''), queryFn: () => api<StationBoard>(`/stations/${stationId}/board`), enabled: !!stationId });
}

/**
 * Every rotation move changes the board, the station list (which shows each set's state and drum) and, for a
 * change-out, the lot's hardware history; all of them are refreshed after a move, and after a refusal too
 * (a 409 may mean someone else moved the set first).
 */
function useRefreshAfterMove() {
  const qc = useQueryClient();
  return () =>
    Promise.all([
      qc.invalidateQueries({ queryKey: stationBoardKeys.all }),
      qc.invalidateQueries({ queryKey: tubeSetQueries.keys.all }),
      qc.invalidateQueries({ queryKey: stationQueries.keys.all }),
      qc.invalidateQueries({ queryKey: receivingKeys.all }),
    ]);
}

/** Cleaning -> clean and ready, recorded in the rinse log with who and when. */
export function useRinseMutation() {
  const refresh = useRefreshAfterMove();
  return useMutation({
    mutationFn: ({ id, note }: { id: string; note?: string }) => api<void>(`/tube-sets/${id}/rinse`, { method: 'POST', body: note ? { note } : {} }),
    onSettled: refresh,
  });
}

/** Clean and ready -> standby drum; refused (409) without a rinse since the set's last drum. */
export function useStandbyMutation() {
  const refresh = useRefreshAfterMove();
  return useMutation({
    mutationFn: ({ id, ...body }: StandbyInput) => api<void>(`/tube-sets/${id}/standby`, { method: 'POST', body }),
    onSettled: refresh,
  });
}

/** Standby -> online, online -> cleaning; the change-out is recorded with the lot, drum, set and head. */
export function useChangeOutMutation() {
  const refresh = useRefreshAfterMove();
  return useMutation({
    mutationFn: (stationId: string) => api<void>(`/stations/${stationId}/change-out`, { method: 'POST' }),
    onSettled: refresh,
  });
}

import { useState } from 'react';
import { ApiError } from '../api/client';
import { useChangeOutMutation, useRinseMutation, useStandbyMutation, type BoardTubeSet, type StandbyInput, type StationBoard } from '../data/station-board';

/** The answer to the last move on the board, shown where the move was made. */
export interface RotationMessage {
  tone: 'done' | 'refused';
  text: string;
  detail?: string;
  /** Shown where the action was taken: a set's card (its id) or the change-out card. */
  where: string;
}

export const CHANGE_OUT = 'change-out';

function refused(err: Error, where: string, set?: BoardTubeSet): RotationMessage {
  // A set that is not rinsed since its last drum is refused; say why in the rinse rule's own words.
  const detail = set && set.rinse.outcome !== 'pass' ? `${set.label}: ${set.rinse.message} Rinse it with DI water and record the rinse first.` : undefined;
  return { tone: 'refused', text: err instanceof ApiError || err instanceof Error ? err.message : 'The move was refused.', detail, where };
}

/** The station board's moves (rinse, into standby, change out), the notes typed for rinses and the last move's message. */
export function useRotation({ station, tubeSets }: StationBoard) {
  const rinse = useRinseMutation();
  const standby = useStandbyMutation();
  const changeOut = useChangeOutMutation();
  const [message, setMessage] = useState<RotationMessage | null>(null);
  const [standbyFor, setStandbyFor] = useState<string | null>(null);
  const [notes, setNotes] = useState<Record<string, string>>({});
  const online = tubeSets.find((s) => s.state === 'online');
  const inStandby = tubeSets.find((s) => s.state === 'standby');

  const doRinse = (set: BoardTubeSet) => {
    setMessage(null);
    const note = notes[set.id]?.trim();
    rinse.mutate(
      { id: set.id, note: note || undefined },
      {
        onSuccess: () => {
          setNotes((n) => ({ ...n, [set.id]: '' }));
          setMessage({ tone: 'done', text: `${set.label} rinsed with DI water: clean and ready for the next drum.`, where: set.id });
        },
        onError: (err) => setMessage(refused(err, set.id)),
      },
    );
  };

  const doStandby = (set: BoardTubeSet, input: StandbyInput) => {
    setMessage(null);
    standby.mutate(input, {
      onSuccess: () => {
        setStandbyFor(null);
        setMessage({ tone: 'done', text: `${set.label} is in the standby drum. Change out when the online drum runs empty.`, where: set.id });
      },
      onError: (err) => {
        setStandbyFor(null);
        setMessage(refused(err, set.id, set));
      },
    });
  };

  const doChangeOut = () => {
    setMessage(null);
    changeOut.mutate(station.id, {
      onSuccess: () =>
        setMessage({
          tone: 'done',
          text: `Changed out: ${inStandby?.label ?? 'the standby set'} is online${inStandby?.currentLotNumber ? ` with lot ${inStandby.currentLotNumber}` : ''}${online ? `; ${online.label} came out for cleaning: rinse it with DI water now` : ''}.`,
          where: CHANGE_OUT,
        }),
      onError: (err) => setMessage(refused(err, CHANGE_OUT)),
    });
  };

  return {
    online,
    inStandby,
    message,
    notes,
    setNote: (id: string, text: string) => setNotes((n) => ({ ...n, [id]: text })),
    rinsingId: rinse.isPending ? rinse.variables?.id : undefined,
    doRinse,
    standbyFor,
    openStandby: (id: string) => {
      setMessage(null);
      setStandbyFor(id);
    },
    closeStandby: () => setStandbyFor(null),
    standbyBusy: standby.isPending,
    doStandby,
    changeOutBusy: changeOut.isPending,
    doChangeOut,
  };
}

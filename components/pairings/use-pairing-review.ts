import { useState } from 'react';
import type { PairingRecord } from '@/shared/contract/records';
import { ApiError } from '../api/client';
import { usePairingActionMutation, type PairingAction } from '../data/pairing-actions';

const DONE: Record<PairingAction, string> = {
  approve: 'Approved. It can now be used at the dock.',
  reject: 'Rejected. It stays a draft; the author can see your comment in the history.',
  retire: 'Retired. It can no longer be used; the history stays.',
};

/** A pairing's review: the comment being written, the three decisions, and what the last one answered. */
export function usePairingReview(pairing: PairingRecord) {
  const [comment, setComment] = useState('');
  const [commentError, setCommentError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const approve = usePairingActionMutation('approve');
  const reject = usePairingActionMutation('reject');
  const retire = usePairingActionMutation('retire');
  const busy = approve.isPending || reject.isPending || retire.isPending;
  const failed = [approve, reject, retire].find((m) => m.isError)?.error;

  const changeComment = (v: string) => {
    setComment(v);
    if (commentError && v.trim().length >= 3) setCommentError(null);
  };

  const act = (action: PairingAction) => {
    // The buttons stay enabled while a decision is sent (a Button disabled while focused keeps a stale focus ring on the web).
    if (busy) return;
    setDone(null);
    const needsReason = action !== 'approve';
    if (needsReason && comment.trim().length < 3) {
      setCommentError(action === 'reject' ? 'Say why you reject it: a comment of at least 3 characters.' : 'Say why you retire it: a comment of at least 3 characters.');
      return;
    }
    setCommentError(null);
    for (const m of [approve, reject, retire]) m.reset();
    const mutation = action === 'approve' ? approve : action === 'reject' ? reject : retire;
    mutation.mutate(
      { id: pairing.id, comment },
      {
        onSuccess: () => {
          setComment('');
          setDone(DONE[action]);
        },
        onError: (err) => {
          if (err instanceof ApiError && err.fieldMessages().comment) setCommentError(`Comment ${err.fieldMessages().comment}.`);
        },
      },
    );
  };

  const pending = { approve: approve.isPending, reject: reject.isPending, retire: retire.isPending };
  return { comment, changeComment, commentError, done, failed, pending, act };
}

export type PairingReview = ReturnType<typeof usePairingReview>;

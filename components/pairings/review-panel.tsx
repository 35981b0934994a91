import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { PairingRecord } from '@/shared/contract/records';
import { ApiError } from '../api/client';
import { usePairingActionMutation, type PairingAction } from '../data/pairing-actions';
import { useCanEditRegistry } from '../registry/use-can-edit-registry';
import { useSession } from '../session';
import { colors, radius, space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { TextField } from '../ui/text-field';

const DONE: Record<PairingAction, string> = {
  approve: 'Approved. It can now be used at the dock.',
  reject: 'Rejected. It stays a draft; the author can see your comment in the history.',
  retire: 'Retired. It can no longer be used; the history stays.',
};

/** Four eyes: who may decide on this pairing, and the decision itself for those who may. */
export function ReviewPanel({ pairing }: { pairing: PairingRecord }) {
  const { session } = useSession();
  const [comment, setComment] = useState('');
  const [commentError, setCommentError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const approve = usePairingActionMutation('approve');
  const reject = usePairingActionMutation('reject');
  const retire = usePairingActionMutation('retire');
  const busy = approve.isPending || reject.isPending || retire.isPending;
  const failed = [approve, reject, retire].find((m) => m.isError)?.error;

  const user = session?.user;
  const reviewer = useCanEditRegistry();
  const isAuthor = !!user && user.id === pairing.authorId;
  const author = pairing.authorName ?? 'its author';

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

  const commentField = (hint: string) => (
    <TextField
      label="Review comment"
      hint={hint}
      value={comment}
      onChangeText={(v) => {
        setComment(v);
        if (commentError && v.trim().length >= 3) setCommentError(null);
      }}
      multiline
      numberOfLines={3}
      maxLength={2000}
      error={commentError}
      testID="pairing-comment"
    />
  );

  let content;
  if (pairing.status === 'draft') {
    content = (
      <>
        <View style={styles.who}>
          <Text style={type.label}>Who may approve</Text>
          <Text style={type.body} testID="pairing-who-may-approve">
            Any engineer other than {author}. Administrators may approve too.
          </Text>
        </View>
        {!reviewer ? (
          <Text style={type.body} testID="pairing-read-only">
            You can read this pairing; engineers review it.
          </Text>
        ) : isAuthor ? (
          <>
            <View style={styles.actions}>
              <Button label="Approve" disabled testID="pairing-approve" />
              <Button label="Reject" variant="secondary" disabled testID="pairing-reject" />
            </View>
            <Text style={styles.reason} testID="pairing-approve-reason">
              You wrote this pairing, so you cannot approve or reject it: ask another engineer to review it.
            </Text>
          </>
        ) : (
          <>
            {commentField('Optional to approve; required to reject.')}
            <View style={styles.actions}>
              <Button label={approve.isPending ? 'Approving…' : 'Approve'} onPress={() => act('approve')} testID="pairing-approve" />
              <Button label={reject.isPending ? 'Rejecting…' : 'Reject'} variant="secondary" onPress={() => act('reject')} testID="pairing-reject" />
            </View>
          </>
        )}
      </>
    );
  } else if (pairing.status === 'approved') {
    content = reviewer ? (
      <>
        <Text style={type.body}>Retire it when the tube or head should no longer be used together. The pairing and its history stay on record.</Text>
        {commentField('Required: why it is retired.')}
        <View style={styles.actions}>
          <Button label={retire.isPending ? 'Retiring…' : 'Retire pairing'} variant="danger" onPress={() => act('retire')} testID="pairing-retire" />
        </View>
      </>
    ) : (
      <Text style={type.body} testID="pairing-read-only">
        Approved for use. Engineers can retire it.
      </Text>
    );
  } else {
    content = (
      <Text style={type.body} testID="pairing-read-only">
        This pairing is retired and must not be used. Its history stays below.
      </Text>
    );
  }

  return (
    <Card testID="pairing-review">
      <Text role="heading" aria-level={2} style={type.heading}>
        Review
      </Text>
      {done ? (
        <View style={[styles.banner, styles.done]} role="status" testID="pairing-action-done">
          <Text style={type.body}>{done}</Text>
        </View>
      ) : null}
      {content}
      {failed && !commentError ? (
        <View style={[styles.banner, styles.failed]} role="alert" testID="pairing-action-error">
          <Text style={[type.body, { color: colors.danger }]}>{failed.message}</Text>
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  who: { gap: 2 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  reason: { ...type.body, color: colors.inkMuted },
  banner: { borderRadius: radius.md, padding: space.md, borderWidth: 1.5 },
  done: { backgroundColor: colors.fitsSoft, borderColor: colors.fits },
  failed: { backgroundColor: colors.dangerSoft, borderColor: colors.danger },
});

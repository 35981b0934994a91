import { StyleSheet, Text, View } from 'react-native';
import type { PairingRecord } from '@/shared/contract/records';
import { useCanEditRegistry } from '../registry/use-can-edit-registry';
import { useSession } from '../session';
import { colors, radius, space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { TextField } from '../ui/text-field';
import { usePairingReview, type PairingReview } from './use-pairing-review';

/** Four eyes: who may decide on this pairing, and the decision itself for those who may. */
export function ReviewPanel({ pairing }: { pairing: PairingRecord }) {
  const review = usePairingReview(pairing);
  const reviewer = useCanEditRegistry();
  const { done, failed, commentError } = review;

  let content;
  if (pairing.status === 'draft') {
    content = <DraftReview pairing={pairing} review={review} reviewer={reviewer} />;
  } else if (pairing.status === 'approved') {
    content = reviewer ? (
      <>
        <Text style={type.body}>Retire it when the tube or head should no longer be used together. The pairing and its history stay on record.</Text>
        <CommentField review={review} hint="Required: why it is retired." />
        <View style={styles.actions}>
          <Button label={review.pending.retire ? 'Retiring…' : 'Retire pairing'} variant="danger" onPress={() => review.act('retire')} testID="pairing-retire" />
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

/** A draft: who may approve it, and Approve / Reject for an engineer who did not write it. */
function DraftReview({ pairing, review, reviewer }: { pairing: PairingRecord; review: PairingReview; reviewer: boolean }) {
  const { session } = useSession();
  const user = session?.user;
  const isAuthor = !!user && user.id === pairing.authorId;
  const author = pairing.authorName ?? 'its author';
  return (
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
          <CommentField review={review} hint="Optional to approve; required to reject." />
          <View style={styles.actions}>
            <Button label={review.pending.approve ? 'Approving…' : 'Approve'} onPress={() => review.act('approve')} testID="pairing-approve" />
            <Button label={review.pending.reject ? 'Rejecting…' : 'Reject'} variant="secondary" onPress={() => review.act('reject')} testID="pairing-reject" />
          </View>
        </>
      )}
    </>
  );
}

function CommentField({ review, hint }: { review: PairingReview; hint: string }) {
  return (
    <TextField
      label="Review comment"
      hint={hint}
      value={review.comment}
      onChangeText={review.changeComment}
      multiline
      numberOfLines={3}
      maxLength={2000}
      error={review.commentError}
      testID="pairing-comment"
    />
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

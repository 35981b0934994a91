import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { can, rolesFor, rolesInWords } from '@/shared/contract/roles';
import { ApiError } from '../api/client';
import { useHoldLotMutation, useReleaseLotMutation, type ReceivingCheckRecord } from '../data/receiving';
import { useSession } from '../session';
import { colors, fonts, radius, space, type } from '../theme';
import { Button } from '../ui/button';
import { TextField } from '../ui/text-field';
import { LotStatusChip } from './lot-status-chip';
import { formatWhen } from '../ui/format';
import { SectionTitle } from '../ui/section-title';

/**
 * A held or quarantined lot says why and who may release it; an engineer releases it with a comment. A lot
 * that fits only with caution may be held by hand with a reason.
 * `prefix` keeps the test ids of the dock (dock-hold…) and of the lot page (lot-hold…) apart.
 */
export function HoldPanel({ record, prefix }: { record: ReceivingCheckRecord; prefix: 'dock' | 'lot' }) {
  const { session } = useSession();
  const role = session?.user.role;
  const hold = useHoldLotMutation();
  const release = useReleaseLotMutation();
  const [reason, setReason] = useState('');
  const [comment, setComment] = useState('');
  const [reasonError, setReasonError] = useState<string | null>(null);
  const [commentError, setCommentError] = useState<string | null>(null);
  const [formError, setFormError] = useState<string | null>(null);

  /** Hold and release each need a note of at least 3 characters; the server's word on that field goes beside it. */
  const submitNote = (
    note: string,
    field: 'reason' | 'comment',
    tooShort: string,
    setFieldError: (message: string | null) => void,
    send: (note: string, options: { onError: (err: Error) => void }) => void,
  ) => {
    if (note.trim().length < 3) {
      setFieldError(tooShort);
      return;
    }
    setFieldError(null);
    setFormError(null);
    send(note.trim(), {
      onError: (err) => {
        const fields = err instanceof ApiError ? err.fieldMessages() : {};
        if (fields[field]) setFieldError(`${field === 'reason' ? 'Reason' : 'Comment'} ${fields[field]}.`);
        else setFormError(err.message);
      },
    });
  };
  const onHold = () =>
    submitNote(reason, 'reason', 'Say why the lot is held (at least 3 characters), e.g. "no dip tube reaches this drum".', setReasonError, (note, options) =>
      hold.mutate({ id: record.id, reason: note }, options),
    );
  const onRelease = () =>
    submitNote(comment, 'comment', 'Say why the lot may be used now (at least 3 characters).', setCommentError, (note, options) => release.mutate({ id: record.id, comment: note }, options));

  const problem = formError ? (
    <Text role="alert" style={styles.error} testID={`${prefix}-hold-error`}>
      {formError}
    </Text>
  ) : null;

  if (record.status === 'on-hold' || record.status === 'quarantined') {
    const quarantined = record.status === 'quarantined';
    const onlyCertificate = record.lotVerdict?.blockers.filter((b) => b.severity !== 'caution').every((b) => b.source === 'certificate') ?? false;
    return (
      <View style={[styles.box, styles.held]} testID={`${prefix}-hold-status`}>
        <LotStatusChip status={record.status} />
        <Text style={[type.heading, { color: colors.noFit }]}>{quarantined ? 'This lot is in quarantine: keep its drums apart, unopened.' : 'This lot is on hold: do not tap its drums.'}</Text>
        {record.heldByRules ? null : <Text style={type.body}>Reason: {record.holdReason}</Text>}
        <Text style={type.small}>
          {record.heldByRules ? 'Held by the rules when recorded' : `Held by ${record.heldByName ?? 'someone'}`} on {formatWhen(record.heldAt)}. Engineers and buyers were told, and a warning was
          opened.
        </Text>
        {record.heldByRules && onlyCertificate ? <Text style={type.body}>Attaching the certificate of analysis lifts this hold.</Text> : null}
        {can(role, 'release-lots') ? (
          <View style={styles.form}>
            <TextField
              label="Release comment"
              hint="What changed, so the lot may be used (e.g. the right tubes arrived)."
              value={comment}
              onChangeText={setComment}
              error={commentError}
              multiline
              testID={`${prefix}-release-comment`}
            />
            <Button label="Release the lot" variant="secondary" busy={release.isPending} onPress={onRelease} testID={`${prefix}-release`} />
          </View>
        ) : record.heldByRules ? null : (
          // A hold by the rules says who lifts it beside each reason (components/receive/lot-verdict.tsx).
          <Text style={type.small}>Released by an {rolesInWords(rolesFor('release-lots')).toLowerCase()}, with a comment.</Text>
        )}
        {problem}
      </View>
    );
  }

  if (record.status === 'released') {
    return (
      <View style={styles.box} testID={`${prefix}-hold-status`}>
        <LotStatusChip status="released" />
        <Text style={type.body}>
          Held: {record.holdReason} Released by {record.releasedByName ?? 'an engineer'} on {formatWhen(record.releasedAt)}: {record.releaseComment}
        </Text>
      </View>
    );
  }

  if (record.decision !== 'caution' || !can(role, 'check-lots')) return null;

  return (
    <View style={[styles.box, styles.holdAsk]} testID={`${prefix}-hold-panel`}>
      <SectionTitle>Put this lot on hold</SectionTitle>
      <Text style={type.body}>This lot is accepted only with caution. Holding it keeps it off the stations, tells engineers and buyers, and opens a warning.</Text>
      <TextField
        label="Reason for the hold"
        placeholder="e.g. the return port is too small for this flow"
        value={reason}
        onChangeText={setReason}
        error={reasonError}
        multiline
        testID={`${prefix}-hold-reason`}
      />
      <Button label="Put lot on hold" variant="danger" busy={hold.isPending} onPress={onHold} testID={`${prefix}-hold`} />
      {problem}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm, padding: space.lg, borderRadius: radius.lg, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
  held: { borderWidth: 3, borderColor: colors.noFit, backgroundColor: colors.noFitSoft },
  holdAsk: { borderWidth: 2, borderColor: colors.noFit },
  form: { gap: space.sm, marginTop: space.sm },
  error: { fontFamily: fonts.semibold, fontSize: 15, color: colors.danger },
});

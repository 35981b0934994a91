import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { PickedFile } from '../api/upload';
import { downloadAttachment, openAttachment, useAttachmentsQuery, useAttachmentUploadMutation, type AttachmentOwnerKind, type AttachmentRecord } from '../data/attachments';
import { formatWhen } from '../ui/format';
import { SectionTitle } from '../ui/section-title';
import { colors, fonts, radius, space, type, field } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { UploadProgress } from '../ui/progress-bar';
import { ErrorState, LoadingState } from '../ui/states';
import { useIsWide } from '../use-layout';
import { formatSize, pickPdfOrPhoto, takePhoto } from './pick-file';

interface AttachmentsPanelProps {
  ownerKind: AttachmentOwnerKind;
  ownerId: string;
  /** Whether the signed-in person may add files to this record (the server checks again). */
  canAdd: boolean;
  title?: string;
  /** What belongs here, said under the title. */
  hint?: string;
  testID?: string;
}

const TYPE_WORDS: Record<string, string> = {
  'application/pdf': 'PDF',
  'image/jpeg': 'JPEG photo',
  'image/png': 'PNG photo',
  'image/webp': 'WebP photo',
  'image/heic': 'HEIC photo',
  'image/heif': 'HEIF photo',
  'text/csv': 'CSV file',
};
const typeWord = (contentType: string) => TYPE_WORDS[contentType] ?? contentType;

/** The files kept with one record: listed with who added them and when, opened or saved, and added by the roles allowed. */
export function AttachmentsPanel({ ownerKind, ownerId, canAdd, title = 'Files', hint = 'PDFs and photos kept with this record, up to 10 MB each.', testID = 'files' }: AttachmentsPanelProps) {
  const list = useAttachmentsQuery(ownerKind, ownerId);
  const add = useAttachmentUploadMutation(ownerKind, ownerId);
  const [sending, setSending] = useState<{ name: string; fraction: number } | null>(null);
  const [pickError, setPickError] = useState<string | null>(null);
  const [lastAdded, setLastAdded] = useState<string | null>(null);

  const send = (file: PickedFile | null) => {
    if (!file) return;
    setLastAdded(null);
    setSending({ name: file.name, fraction: 0 });
    add.mutate(
      { file, onProgress: (fraction) => setSending({ name: file.name, fraction }) },
      {
        onSuccess: (a) => setLastAdded(a.fileName),
        onSettled: () => setSending(null),
      },
    );
  };
  const choose = (picker: () => Promise<PickedFile | null>) => {
    // Ignored while a file is on its way. The buttons are not disabled for it: a disabled button that has
    // focus never hears its blur on the web and would keep its focus ring after focus moved on.
    if (sending) return;
    setPickError(null);
    add.reset();
    picker().then(send, (e: unknown) => setPickError(e instanceof Error ? e.message : 'The file could not be read.'));
  };

  const problem = add.error?.message ?? pickError;
  return (
    <Card testID={`${testID}-panel`}>
      <SectionTitle>{title}</SectionTitle>
      <Text style={type.small}>{hint}</Text>
      {list.isPending ? (
        <LoadingState label="Loading the files…" />
      ) : list.isError ? (
        <ErrorState error={list.error} onRetry={() => list.refetch()} />
      ) : list.data.items.length === 0 ? (
        <Text style={[type.body, styles.empty]} testID={`${testID}-empty`}>
          {canAdd ? 'No files yet. Attach the delivery note, a certificate or a photo of the drum label.' : 'No files yet.'}
        </Text>
      ) : (
        <View role="list" aria-label={title} style={styles.list} testID={`${testID}-list`}>
          {list.data.items.map((a) => (
            <FileRow key={a.id} a={a} testID={`${testID}-item-${a.id}`} />
          ))}
        </View>
      )}
      {canAdd ? (
        <View style={styles.adding}>
          {sending ? <UploadProgress fileName={sending.name} fraction={sending.fraction} working={`Saving ${sending.name}…`} testID={`${testID}-progress`} /> : null}
          <View style={styles.buttons}>
            <Button label="Attach a PDF or photo" variant="secondary" onPress={() => choose(pickPdfOrPhoto)} testID={`${testID}-add`} />
            <Button label="Take a photo" variant="secondary" onPress={() => choose(takePhoto)} testID={`${testID}-photo`} />
          </View>
          {problem ? (
            <View role="alert" style={styles.problem} testID={`${testID}-error`}>
              <Text style={styles.problemTitle}>The file was not added</Text>
              <Text style={type.body}>{problem}</Text>
            </View>
          ) : lastAdded ? (
            <Text style={[type.small, styles.added]} aria-live="polite" testID={`${testID}-added`}>
              Added {lastAdded}.
            </Text>
          ) : null}
        </View>
      ) : null}
    </Card>
  );
}

function FileRow({ a, testID }: { a: AttachmentRecord; testID: string }) {
  const wide = useIsWide();
  const [busy, setBusy] = useState<'open' | 'save' | null>(null);
  const [error, setError] = useState<string | null>(null);
  const run = (what: 'open' | 'save') => {
    setBusy(what);
    setError(null);
    (what === 'open' ? openAttachment(a.id, a.fileName) : downloadAttachment(a.id, a.fileName))
      .catch((e: unknown) => setError(e instanceof Error ? e.message : 'The file could not be fetched.'))
      .finally(() => setBusy(null));
  };
  return (
    <View role="listitem" style={[styles.row, wide && styles.rowWide]} testID={testID}>
      <View style={styles.about}>
        <Text style={styles.name} testID={`${testID}-name`}>
          {a.fileName}
        </Text>
        <Text style={type.small}>
          {a.purpose === 'certificate' ? 'Certificate of analysis · ' : ''}
          {typeWord(a.contentType)} · {formatSize(a.sizeBytes)} · added by {a.uploadedByName ?? 'someone'}, {formatWhen(a.createdAt)}
        </Text>
        {error ? (
          <Text role="alert" style={styles.rowError}>
            {error}
          </Text>
        ) : null}
      </View>
      <View style={styles.rowButtons}>
        <Button label="Open" variant="quiet" busy={busy === 'open'} accessibilityLabel={`Open ${a.fileName}`} onPress={() => run('open')} testID={`${testID}-open`} />
        <Button label="Download" variant="quiet" busy={busy === 'save'} accessibilityLabel={`Download ${a.fileName}`} onPress={() => run('save')} testID={`${testID}-download`} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  empty: { color: colors.inkMuted },
  list: { gap: 0 },
  row: { gap: space.xs, paddingVertical: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
  rowWide: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  about: { flex: 1, minWidth: 0, gap: 2 },
  name: { fontFamily: fonts.semibold, fontSize: 16, color: colors.ink },
  rowButtons: { flexDirection: 'row', gap: space.xs, flexWrap: 'wrap' },
  rowError: field.error,
  adding: { gap: space.sm, marginTop: space.xs },
  buttons: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  problem: { gap: space.xs, padding: space.md, borderRadius: radius.md, borderWidth: 1, borderColor: colors.danger, backgroundColor: colors.dangerSoft },
  problemTitle: { fontFamily: fonts.semibold, fontSize: 15, color: colors.danger },
  added: { color: colors.fits, fontFamily: fonts.semibold },
});

import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { can, type Role } from '@/shared/contract/roles';
import { pickPdfOrPhoto } from '../attachments/pick-file';
import { useCertificateUploadMutation, type ReceivingCheckRecord } from '../data/receiving';
import { useSession } from '../session';
import { fonts, colors, type } from '../theme';
import { Button } from '../ui/button';

/** Whether the lot waits for its certificate of analysis (and the person may attach it). */
export function needsCertificate(record: ReceivingCheckRecord, role: Role | undefined): boolean {
  const waiting = record.lotVerdict?.blockers.some((b) => b.source === 'certificate' && b.severity === 'hold') ?? false;
  return waiting && can(role, 'check-lots');
}

/** Attaches the certificate of analysis (a PDF or a photo of it); the server judges the lot again. */
export function CertificateButton({ record, variant = 'primary' }: { record: ReceivingCheckRecord; variant?: 'primary' | 'secondary' }) {
  const upload = useCertificateUploadMutation(record.id);
  const [fraction, setFraction] = useState<number | null>(null);
  const [pickError, setPickError] = useState<string | null>(null);
  const choose = () => {
    // Opened straight from the press: a browser shows its file dialog only on a person's gesture.
    if (upload.isPending) return;
    setPickError(null);
    upload.reset();
    pickPdfOrPhoto().then(
      (file) => {
        if (!file) return;
        setFraction(0);
        upload.mutate({ file, onProgress: setFraction }, { onSettled: () => setFraction(null) });
      },
      (e: unknown) => setPickError(e instanceof Error ? e.message : 'The file could not be read.'),
    );
  };
  const problem = upload.error?.message ?? pickError;
  return (
    <View style={styles.wrap}>
      <Button
        label={fraction !== null ? `Sending the certificate… ${Math.round(fraction * 100)}%` : 'Attach the certificate'}
        variant={variant}
        busy={upload.isPending}
        onPress={choose}
        testID="certificate-attach"
      />
      {problem ? (
        <Text role="alert" style={styles.error} testID="certificate-error">
          The certificate was not attached: {problem}
        </Text>
      ) : upload.isSuccess ? (
        <Text style={[type.small, styles.done]} aria-live="polite" testID="certificate-added">
          Certificate attached.
        </Text>
      ) : null}
    </View>
  );
}

export function useRole(): Role | undefined {
  return useSession().session?.user.role;
}

const styles = StyleSheet.create({
  wrap: { gap: 4 },
  error: { fontFamily: fonts.semibold, fontSize: 14, color: colors.danger },
  done: { color: colors.fits, fontFamily: fonts.semibold },
});

// The label scanner: a live preview from the rear camera, or a photo where the camera cannot open, read
// for QR, Data Matrix and Code 128 codes. Loaded on demand (scan-label-button.tsx imports it with
// import()), so neither it nor the decoder weighs on the app's first load. Web target only.
import { useRef, type ChangeEvent } from 'react';
import { ActivityIndicator, Modal, ScrollView, StyleSheet, Text, View } from 'react-native';
import type { DrumLabel } from '@/shared/gs1';
import { colors, fonts, radius, space, type } from '../theme';
import { Button } from '../ui/button';
import { useLabelScan } from './use-label-scan';

export interface LabelScannerProps {
  onScanned: (label: DrumLabel) => void;
  onCancel: () => void;
  testID: string;
}

export function LabelScanner({ onScanned, onCancel, testID }: LabelScannerProps) {
  const scan = useLabelScan(onScanned);
  const { attachVideo } = scan;
  const fileInput = useRef<HTMLInputElement | null>(null);
  const cancel = () => {
    scan.stop();
    onCancel();
  };
  const onFile = (e: ChangeEvent<HTMLInputElement>) => {
    const file = e.target.files?.[0];
    e.target.value = ''; // the same photo chosen again must fire again
    if (file) void scan.readPhoto(file);
  };
  const canPhoto = scan.phase === 'live' || scan.phase === 'photo';

  return (
    <Modal visible transparent={false} animationType="none" onRequestClose={cancel}>
      <ScrollView style={styles.page} contentContainerStyle={styles.content} testID={testID}>
        <Text role="heading" aria-level={1} style={type.title}>
          Scan the drum label
        </Text>
        <Text style={type.body}>Hold the label’s barcode inside the frame. QR, Data Matrix and Code 128 codes are read; the lot number is filled in for you.</Text>

        {scan.phase === 'starting' ? (
          <View style={styles.status} testID={`${testID}-starting`}>
            <ActivityIndicator color={colors.primary} />
            <Text style={type.body}>Opening the camera…</Text>
          </View>
        ) : null}
        {scan.phase === 'live' ? (
          <View style={styles.preview} testID={`${testID}-preview`}>
            <video ref={attachVideo} muted playsInline autoPlay aria-label="Camera preview" data-testid={`${testID}-video`} style={videoStyle} />
            <View style={styles.frame} pointerEvents="none" />
          </View>
        ) : null}

        {scan.cameraProblem ? (
          <Text role="alert" style={styles.notice} testID={`${testID}-camera-problem`}>
            {scan.cameraProblem}
          </Text>
        ) : null}
        <View accessibilityLiveRegion="polite">
          {scan.codeProblem ? (
            <Text role="alert" style={styles.problem} testID={`${testID}-problem`}>
              {scan.codeProblem}
            </Text>
          ) : scan.phase === 'live' ? (
            <Text style={type.body} testID={`${testID}-looking`}>
              {scan.hint ?? 'Looking for a code…'}
            </Text>
          ) : null}
        </View>

        <View style={styles.actions}>
          {canPhoto ? (
            <Button
              label={scan.phase === 'photo' ? 'Take a photo of the label' : 'Take a photo instead'}
              variant={scan.phase === 'photo' ? 'primary' : 'secondary'}
              large
              busy={scan.readingPhoto}
              onPress={() => fileInput.current?.click()}
              testID={`${testID}-photo`}
            />
          ) : null}
          <Button label="Cancel and type the lot number" variant="secondary" large onPress={cancel} testID={`${testID}-cancel`} />
        </View>
        {/* The photo fallback: the phone's camera app (capture) or its gallery, read by the same decoder. */}
        <input ref={fileInput} type="file" accept="image/*" capture="environment" onChange={onFile} data-testid={`${testID}-photo-input`} aria-hidden tabIndex={-1} style={{ display: 'none' }} />
        {scan.engine ? (
          <Text style={type.small} testID={`${testID}-engine`}>
            {scan.engine === 'browser' ? 'Read by the browser’s barcode detector.' : 'Read by the app’s own barcode decoder.'}
          </Text>
        ) : null}
      </ScrollView>
    </Modal>
  );
}

const videoStyle = { width: '100%', height: '100%', objectFit: 'cover', display: 'block' } as const;

const styles = StyleSheet.create({
  page: { flex: 1, backgroundColor: colors.paper },
  content: { padding: space.lg, gap: space.md, maxWidth: 720, width: '100%', alignSelf: 'center' },
  status: { flexDirection: 'row', gap: space.sm, alignItems: 'center', paddingVertical: space.xl },
  preview: {
    width: '100%',
    aspectRatio: 4 / 3,
    maxHeight: 480,
    backgroundColor: colors.ink,
    borderRadius: radius.lg,
    overflow: 'hidden',
  },
  // A guide, not a crop: the whole frame is read.
  frame: { position: 'absolute', top: '20%', bottom: '20%', left: '15%', right: '15%', borderWidth: 3, borderColor: colors.focus, borderRadius: radius.md },
  notice: { fontFamily: fonts.semibold, fontSize: 16, lineHeight: 22, color: colors.ink, backgroundColor: colors.cautionSoft, padding: space.md, borderRadius: radius.md },
  problem: { fontFamily: fonts.semibold, fontSize: 16, lineHeight: 22, color: colors.danger },
  actions: { gap: space.sm },
});

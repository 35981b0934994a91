import { ActivityIndicator, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space, type } from '../theme';

interface UploadProgressProps {
  /** What is being sent: the file's name. */
  fileName: string;
  /** 0 to 1 while the bytes go; 1 once they are all sent and the server is reading them. */
  fraction: number;
  /** Said once every byte is sent, e.g. "Checking the rows…". */
  working: string;
  testID?: string;
}

/** An upload on its way: a bar with its percentage, then what the server is doing with it. */
export function UploadProgress({ fileName, fraction, working, testID }: UploadProgressProps) {
  const percent = Math.round(Math.max(0, Math.min(1, fraction)) * 100);
  const sent = percent >= 100;
  const words = sent ? working : `Uploading ${fileName}: ${percent}%`;
  return (
    <View style={styles.wrap} testID={testID}>
      <View style={styles.line}>
        {sent ? <ActivityIndicator color={colors.primary} /> : null}
        <Text style={[type.body, styles.words]} aria-live="polite" testID={testID ? `${testID}-text` : undefined}>
          {words}
        </Text>
      </View>
      <View role="progressbar" aria-label={`Upload of ${fileName}`} aria-valuemin={0} aria-valuemax={100} aria-valuenow={percent} style={styles.track}>
        <View style={[styles.fill, { width: `${percent}%` }]} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  line: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  words: { fontFamily: fonts.semibold, flexShrink: 1 },
  track: { height: 10, borderRadius: radius.sm, backgroundColor: colors.surfaceSunk, borderWidth: 1, borderColor: colors.inkMuted, overflow: 'hidden' },
  fill: { height: '100%', backgroundColor: colors.primary },
});

import { Link } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import { useWaitingCount } from '../data/dock-queue';
import { colors, fonts, minTouch, space } from '../theme';
import { useOnline } from './use-online';

/**
 * A strip under the app's header while there is no network or a dock check waits to be sent: what still
 * works, and how many checks wait (a link to the dock, where they are listed).
 */
export function NetworkStrip() {
  const online = useOnline();
  const waiting = useWaitingCount();
  if (online && !waiting) return null;
  const checks = waiting ? `${waiting} dock check${waiting === 1 ? '' : 's'} waiting to be sent` : null;
  return (
    <View style={[styles.strip, online ? styles.sending : styles.offline]} role="status" aria-live="polite" testID="network-strip">
      <Text style={styles.text}>
        {online ? 'Sending' : 'No network'}
        {online ? '' : ': dock checks are judged on this phone and sent later; other changes need the network'}
        {checks ? ' · ' : '.'}
        {checks ? (
          <Link href="/receive" style={styles.link} testID="network-strip-waiting">
            {checks}
          </Link>
        ) : null}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  strip: { minHeight: minTouch - 8, justifyContent: 'center', paddingHorizontal: space.lg, paddingVertical: space.xs, borderBottomWidth: 1, borderBottomColor: colors.caution },
  offline: { backgroundColor: colors.cautionSoft },
  sending: { backgroundColor: colors.surfaceSunk },
  text: { fontFamily: fonts.semibold, fontSize: 15, lineHeight: 21, color: colors.ink },
  link: { color: colors.primary, textDecorationLine: 'underline' },
});

import { Link, usePathname } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import Svg, { Circle, Path } from 'react-native-svg';
import { useNotificationsQuery } from '../data/notifications';
import { colors, fonts, minTouch, radius, space } from '../theme';

/**
 * The unread count in the app's chrome, linking to /notices: a labelled row in the wide side bar (`inverse`),
 * a bell with a count in the phone's top bar (`compact`), where space is short. The link's accessible name
 * always says the count in words.
 */
export function NoticesIndicator({ inverse = false, compact = false }: { inverse?: boolean; compact?: boolean }) {
  const pathname = usePathname();
  const list = useNotificationsQuery();
  const unread = list.data?.unread ?? 0;
  const active = pathname === '/notices';
  const label = unread ? `Notices, ${unread} unread` : 'Notices, none unread';
  const count = unread > 99 ? '99+' : String(unread);

  if (compact) {
    return (
      <Link href="/notices" testID="notices-indicator" aria-label={label} aria-current={active ? 'page' : undefined} style={[styles.bellLink, active && styles.activePlain]}>
        <View style={styles.bellBox}>
          <Bell color={colors.primary} />
          {unread ? (
            <View style={styles.bellBadge}>
              <Text style={styles.badgeText} testID="notices-unread">
                {count}
              </Text>
            </View>
          ) : null}
        </View>
      </Link>
    );
  }

  const fg = inverse && !active ? colors.onNav : colors.primary;
  return (
    <Link
      href="/notices"
      testID="notices-indicator"
      aria-label={label}
      aria-current={active ? 'page' : undefined}
      style={[styles.link, active && (inverse ? styles.activeInverse : styles.activePlain)]}
    >
      <View style={styles.row}>
        <Bell color={fg} />
        <Text style={[styles.text, { color: fg }]}>Notices</Text>
        {unread ? (
          <View style={[styles.badge, inverse && !active ? styles.badgeInverse : null]}>
            <Text style={[styles.badgeText, inverse && !active ? { color: colors.primary } : null]} testID="notices-unread">
              {count} new
            </Text>
          </View>
        ) : null}
      </View>
    </Link>
  );
}

function Bell({ color }: { color: string }) {
  return (
    <Svg width={22} height={22} viewBox="0 0 24 24" aria-hidden>
      <Path d="M12 3.5a6 6 0 0 0-6 6v4.2L4 17h16l-2-3.3V9.5a6 6 0 0 0-6-6z" fill="none" stroke={color} strokeWidth={2} strokeLinejoin="round" />
      <Circle cx={12} cy={19.6} r={2} fill={color} />
    </Svg>
  );
}

const styles = StyleSheet.create({
  // A Link is a Text on the web: give it a column so the row centres vertically.
  link: { display: 'flex' as never, flexDirection: 'column', minHeight: minTouch, justifyContent: 'center', alignItems: 'flex-start', paddingHorizontal: space.md, borderRadius: radius.md },
  activePlain: { backgroundColor: colors.surfaceSunk },
  activeInverse: { backgroundColor: colors.surface },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm, width: '100%' },
  text: { fontFamily: fonts.semibold, fontSize: 16 },
  badge: { backgroundColor: colors.danger, borderRadius: radius.lg, paddingHorizontal: space.sm, paddingVertical: 1 },
  badgeInverse: { backgroundColor: colors.surface },
  badgeText: { fontFamily: fonts.bold, fontSize: 13, lineHeight: 17, color: colors.onPrimary },
  bellLink: { display: 'flex' as never, flexDirection: 'column', width: minTouch, height: minTouch, alignItems: 'center', justifyContent: 'center', borderRadius: radius.md },
  bellBox: { width: 30, height: 30, alignItems: 'center', justifyContent: 'center' },
  bellBadge: { position: 'absolute', top: -6, right: -8, minWidth: 20, paddingHorizontal: 4, borderRadius: 10, backgroundColor: colors.danger, alignItems: 'center' },
});

import { Link, usePathname } from 'expo-router';
import { useState, type ReactNode } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { ROLE_LABELS } from '@/shared/contract/roles';
import { isActive, navFor } from './navigation';
import { NoticesIndicator } from './notifications/notices-indicator';
import { NetworkStrip } from './offline/network-strip';
import { SignOutGuard } from './offline/sign-out-guard';
import { useWaitingCount } from './data/dock-queue';
import { useDockSnapshot } from './data/dock-snapshot';
import { useSession } from './session';
import { colors, fonts, minTouch, radius, space, type } from './theme';
import { Logo } from './ui/logo';
import { useIsWide } from './use-layout';

/** Signed-in chrome: side navigation on a wide screen, a top bar and bottom tabs on a phone. */
export function AppShell({ children }: { children: ReactNode }) {
  const wide = useIsWide();
  const pathname = usePathname();
  const { session, end } = useSession();
  const [menuOpen, setMenuOpen] = useState(false);
  const [asking, setAsking] = useState(false);
  const waiting = useWaitingCount();
  // Kept on the device from the first visit, so the dock can judge a lot when the network is gone.
  useDockSnapshot();
  if (!session) return null;
  const items = navFor(session.user.role);
  // On a phone: up to four primary items in the bottom bar, the rest behind "More".
  const primary = items.length <= 5 ? items : items.filter((i) => i.primary).slice(0, 4);
  const more = items.filter((i) => !primary.includes(i));
  const who = (
    <View style={styles.who}>
      <Text style={[type.label, wide && { color: colors.onNav }]} testID="current-user">
        {session.user.name}
      </Text>
      <Text style={[type.small, wide && { color: colors.onNavMuted }]} testID="current-role">
        {ROLE_LABELS[session.user.role]}
      </Text>
    </View>
  );
  const signOut = (
    <Pressable accessibilityRole="button" onPress={waiting ? () => setAsking(true) : end} testID="sign-out" style={[styles.signOut, wide && styles.signOutWide]}>
      <Text style={[styles.signOutText, wide && { color: colors.onNav }]}>Sign out</Text>
    </Pressable>
  );

  if (wide) {
    return (
      <View style={styles.wideRoot}>
        <View style={styles.side} role="navigation" aria-label="Main">
          <Logo inverse />
          <NoticesIndicator inverse />
          <View style={styles.sideItems}>
            {items.map((item) => {
              const active = isActive(item.href, pathname);
              return (
                <Link key={item.href} href={item.href as never} testID={item.testID} aria-current={active ? 'page' : undefined} style={[styles.sideLink, active && styles.sideLinkActive]}>
                  <Text style={[styles.sideText, active && styles.sideTextActive]}>{item.label}</Text>
                </Link>
              );
            })}
          </View>
          <View style={styles.sideFoot}>
            {who}
            {signOut}
          </View>
        </View>
        <View style={styles.main}>
          <NetworkStrip />
          <SignOutGuard asking={asking} setAsking={setAsking} end={end} />
          {children}
        </View>
      </View>
    );
  }

  return (
    <View style={styles.phoneRoot}>
      <View style={styles.topBar}>
        <Logo />
        <View style={styles.topRight}>
          <NoticesIndicator compact />
          {who}
          {signOut}
        </View>
      </View>
      <NetworkStrip />
      <SignOutGuard asking={asking} setAsking={setAsking} end={end} />
      <View style={styles.main}>{children}</View>
      {menuOpen ? (
        <View style={styles.menu} testID="nav-more-menu">
          {more.map((item) => (
            <Link key={item.href} href={item.href as never} testID={item.testID} onPress={() => setMenuOpen(false)} style={styles.menuLink}>
              <Text style={styles.menuText}>{item.label}</Text>
            </Link>
          ))}
        </View>
      ) : null}
      <View style={styles.tabs} role="navigation" aria-label="Main">
        {primary.map((item) => {
          const active = isActive(item.href, pathname);
          return (
            <Link key={item.href} href={item.href as never} testID={item.testID} aria-current={active ? 'page' : undefined} style={[styles.tab, active && styles.tabActive]}>
              <Text style={[styles.tabText, active && styles.tabTextActive]}>{item.label}</Text>
            </Link>
          );
        })}
        {more.length ? (
          <Pressable
            accessibilityRole="button"
            aria-expanded={menuOpen}
            testID="nav-more"
            onPress={() => setMenuOpen((o) => !o)}
            style={[styles.tab, more.some((i) => isActive(i.href, pathname)) && styles.tabActive]}
          >
            <Text style={[styles.tabText, more.some((i) => isActive(i.href, pathname)) && styles.tabTextActive]}>{menuOpen ? 'Close' : 'More'}</Text>
          </Pressable>
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wideRoot: { flex: 1, flexDirection: 'row', backgroundColor: colors.paper },
  side: { width: 240, backgroundColor: colors.nav, padding: space.lg, gap: space.xl },
  sideItems: { gap: space.xs, flex: 1 },
  sideLink: { minHeight: minTouch, justifyContent: 'center', paddingHorizontal: space.md, paddingVertical: space.sm, borderRadius: radius.md, display: 'flex' as never },
  sideLinkActive: { backgroundColor: colors.surface },
  sideText: { fontFamily: fonts.semibold, fontSize: 16, color: colors.onNav, textAlign: 'left', width: '100%' },
  sideTextActive: { color: colors.primary },
  sideFoot: { gap: space.sm },
  main: { flex: 1 },
  phoneRoot: { flex: 1, backgroundColor: colors.paper },
  topBar: {
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    paddingHorizontal: space.lg,
    paddingVertical: space.sm,
    backgroundColor: colors.surface,
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
  },
  // The notices bell joined the top bar: name and role may wrap rather than push the bar past a phone's width.
  topRight: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexShrink: 1 },
  who: { alignItems: 'flex-end', flexShrink: 1 },
  signOut: { minHeight: minTouch, justifyContent: 'center', paddingHorizontal: space.sm, borderRadius: radius.md },
  signOutWide: { borderWidth: 1, borderColor: colors.navLine, alignItems: 'center' },
  signOutText: { fontFamily: fonts.semibold, fontSize: 15, color: colors.primary },
  menu: { backgroundColor: colors.surface, borderTopWidth: 1, borderTopColor: colors.line, paddingVertical: space.xs },
  menuLink: { minHeight: minTouch, justifyContent: 'center', paddingHorizontal: space.lg, display: 'flex' as never },
  menuText: { fontFamily: fonts.semibold, fontSize: 16, color: colors.primary },
  tabs: { flexDirection: 'row', borderTopWidth: 1, borderTopColor: colors.line, backgroundColor: colors.surface },
  tab: { flex: 1, minHeight: 56, alignItems: 'center', justifyContent: 'center', display: 'flex' as never, borderTopWidth: 3, borderTopColor: 'transparent' },
  tabActive: { borderTopColor: colors.primary },
  tabText: { fontFamily: fonts.semibold, fontSize: 14, color: colors.inkMuted, textAlign: 'center' },
  tabTextActive: { color: colors.primary },
});

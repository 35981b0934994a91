import { Link, usePathname } from 'expo-router';
import { ScrollView, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, minTouch, space } from '../theme';
import { useIsWide } from '../use-layout';

export interface SectionTab {
  href: string;
  label: string;
  testID: string;
}

/**
 * The tabs between the pages of one section (the registry's resources, the three tools). A row of links
 * under the page's top edge; on a phone it scrolls sideways rather than wrapping into several rows.
 */
export function SectionTabs({ label, tabs }: { label: string; tabs: readonly SectionTab[] }) {
  const pathname = usePathname();
  const wide = useIsWide();
  const links = tabs.map((tab) => {
    const active = pathname === tab.href || pathname.startsWith(`${tab.href}/`);
    return (
      <Link key={tab.href} href={tab.href as never} testID={tab.testID} aria-current={active ? 'page' : undefined} style={[styles.tab, active && styles.tabActive]}>
        <Text style={[styles.text, active && styles.textActive]}>{tab.label}</Text>
      </Link>
    );
  });
  return (
    <View role="navigation" aria-label={label} style={[styles.bar, wide && styles.barWide]}>
      {wide ? (
        <View style={styles.row}>{links}</View>
      ) : (
        <ScrollView horizontal showsHorizontalScrollIndicator={false} contentContainerStyle={styles.row}>
          {links}
        </ScrollView>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { backgroundColor: colors.surface, borderBottomWidth: 1, borderBottomColor: colors.line, paddingHorizontal: space.sm },
  barWide: { paddingHorizontal: space.xl },
  row: { flexDirection: 'row', gap: space.xs },
  tab: {
    display: 'flex' as never,
    minHeight: minTouch,
    // A Text shown as flex lays out in a row: centre across it.
    alignItems: 'center',
    paddingHorizontal: space.md,
    borderBottomWidth: 3,
    borderBottomColor: 'transparent',
  },
  tabActive: { borderBottomColor: colors.primary },
  text: { fontFamily: fonts.semibold, fontSize: 15, color: colors.inkMuted, whiteSpace: 'nowrap' } as object,
  textActive: { color: colors.primary },
});

import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, Text, View } from 'react-native';
import { colors, maxContentWidth, space, type } from './theme';
import { useIsWide } from './use-layout';

/** Two columns: the page's main content, then what sits beside it on a wide screen. */
export type ScreenColumns = readonly [main: ReactNode, side: ReactNode];

interface ScreenProps {
  title: string;
  subtitle?: string;
  actions?: ReactNode;
  /** The page's content; with `columns`, what runs the full width above them. */
  children?: ReactNode;
  /** Side by side on a wide screen, main first; stacked in that order on a phone. */
  columns?: ScreenColumns;
  /** How a wide screen shares its width between the two columns, as flex weights: [1, 1] unless given. */
  split?: readonly [main: number, side: number];
  testID?: string;
  /** A bar fixed to the bottom of the page (above the phone's navigation) holding the primary action. */
  footer?: ReactNode;
}

/**
 * The one page layout: a single column on a phone; a centred, wider page on a wide screen, in two columns
 * when given `columns`.
 */
export function Screen({ title, subtitle, actions, children, columns, split = [1, 1], testID, footer }: ScreenProps) {
  const wide = useIsWide();
  const page = (
    <ScrollView style={styles.scroll} contentContainerStyle={[styles.content, wide && styles.contentWide]} testID={testID}>
      <View style={[styles.inner, { maxWidth: maxContentWidth }]}>
        <View style={[styles.header, wide && styles.headerWide]}>
          <View style={styles.titles}>
            <Text role="heading" aria-level={1} style={type.title}>
              {title}
            </Text>
            {subtitle ? <Text style={[type.body, { color: colors.inkMuted }]}>{subtitle}</Text> : null}
          </View>
          {actions ? <View style={styles.actions}>{actions}</View> : null}
        </View>
        {children}
        {columns ? (
          <View style={[styles.columns, wide && styles.columnsWide]} testID={testID ? `${testID}-columns` : undefined}>
            {columns.map((column, i) => (
              <View key={i} style={[styles.column, wide && { flex: split[i], minWidth: 0 }]}>
                {column}
              </View>
            ))}
          </View>
        ) : null}
      </View>
    </ScrollView>
  );
  if (!footer) return page;
  return (
    <View style={styles.withFooter}>
      {page}
      <View style={[styles.footer, wide && styles.footerWide]} testID={testID ? `${testID}-footer` : undefined}>
        {footer}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.paper },
  content: { padding: space.lg, paddingBottom: space.xxl * 2 },
  contentWide: { paddingHorizontal: space.xxl, paddingTop: space.xxl },
  inner: { width: '100%', alignSelf: 'center', gap: space.lg },
  header: { gap: space.md },
  headerWide: { flexDirection: 'row', alignItems: 'flex-end', justifyContent: 'space-between' },
  titles: { gap: space.xs, flexShrink: 1 },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  columns: { gap: space.lg },
  columnsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  column: { gap: space.lg },
  withFooter: { flex: 1 },
  footer: { backgroundColor: colors.surface, borderTopWidth: 1, borderTopColor: colors.line, paddingHorizontal: space.lg, paddingVertical: space.sm, gap: space.xs },
  footerWide: { paddingHorizontal: space.xxl, alignItems: 'flex-end' },
});

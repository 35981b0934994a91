import { Link } from 'expo-router';
import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { LotStatus } from '../data/receiving';
import { colors, fonts, minTouch, radius, space, type } from '../theme';

// Small pieces shared by the dock, sourcing, station and notice screens.
export { LinkButton } from '../ui/link-button';

/** A date and time as people at the site read it: "14 May 2026, 09:40". */
export function formatWhen(iso: string | null | undefined): string {
  if (!iso) return '—';
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return '—';
  return d.toLocaleString('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });
}

/** A calendar date (YYYY-MM-DD from the API) without shifting it through a time zone. */
export function formatDate(ymd: string): string {
  const m = /^(\d{4})-(\d{2})-(\d{2})/.exec(ymd);
  if (!m) return ymd;
  const d = new Date(Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3])));
  return d.toLocaleDateString('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });
}

/** An inline text link, underlined so it never rests on colour alone. */
export function TextLink({ href, children, testID }: { href: string; children: ReactNode; testID?: string }) {
  return (
    <Link href={href as never} testID={testID} style={styles.textLink}>
      {children}
    </Link>
  );
}

export function SectionTitle({ children, testID }: { children: ReactNode; testID?: string }) {
  return (
    <Text role="heading" aria-level={2} style={type.heading} testID={testID}>
      {children}
    </Text>
  );
}

/** A label and its value, stacked; used in the record summaries. */
export function Fact({ label, value, testID }: { label: string; value: ReactNode; testID?: string }) {
  return (
    <View style={styles.fact}>
      <Text style={type.small}>{label}</Text>
      {typeof value === 'string' || typeof value === 'number' ? (
        <Text style={[type.body, styles.factValue]} testID={testID}>
          {value}
        </Text>
      ) : (
        <View testID={testID}>{value}</View>
      )}
    </View>
  );
}

export function FactGrid({ children, wide }: { children: ReactNode; wide: boolean }) {
  return <View style={[styles.facts, wide && styles.factsWide]}>{children}</View>;
}

const STATUS_LOOK: Record<LotStatus, { word: string; mark: string; fg: string; bg: string }> = {
  checked: { word: 'Checked', mark: '•', fg: colors.inkMuted, bg: colors.surfaceSunk },
  'on-hold': { word: 'ON HOLD', mark: '‖', fg: colors.noFit, bg: colors.noFitSoft },
  quarantined: { word: 'QUARANTINED', mark: '⊘', fg: colors.noFit, bg: colors.noFitSoft },
  released: { word: 'Released', mark: '↗', fg: colors.fits, bg: colors.fitsSoft },
};

/** Where a lot stands at the dock: word, mark and colour. */
export function LotStatusChip({ status, testID }: { status: LotStatus; testID?: string }) {
  const look = STATUS_LOOK[status];
  return (
    <View style={[styles.chip, { borderColor: look.fg, backgroundColor: look.bg }]} testID={testID}>
      <Text style={[styles.chipText, { color: look.fg }]}>
        {look.mark} {look.word}
      </Text>
    </View>
  );
}

/** A small word-and-mark chip in one of the theme's tones. */
export function Tag({ label, tone = 'muted', testID }: { label: string; tone?: 'muted' | 'fits' | 'caution' | 'noFit' | 'primary'; testID?: string }) {
  const fg = tone === 'muted' ? colors.inkMuted : tone === 'primary' ? colors.primary : colors[tone];
  const bg = tone === 'fits' ? colors.fitsSoft : tone === 'caution' ? colors.cautionSoft : tone === 'noFit' ? colors.noFitSoft : colors.surface;
  return (
    <View style={[styles.chip, { borderColor: fg, backgroundColor: bg }]} testID={testID}>
      <Text style={[styles.chipText, { color: fg }]}>{label}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  textLink: { fontFamily: fonts.semibold, fontSize: 16, color: colors.primary, textDecorationLine: 'underline', minHeight: minTouch, display: 'flex' as never, alignItems: 'center' },
  fact: { gap: 2, minWidth: 140, flexShrink: 1 },
  factValue: { fontFamily: fonts.semibold },
  facts: { gap: space.md },
  factsWide: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.xl, rowGap: space.md },
  chip: { borderWidth: 1.5, borderRadius: radius.sm, paddingHorizontal: space.sm, paddingVertical: 2, alignSelf: 'flex-start' },
  chipText: { fontFamily: fonts.bold, fontSize: 13, lineHeight: 18 },
});

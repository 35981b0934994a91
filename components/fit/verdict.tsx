import { StyleSheet, Text, View } from 'react-native';
import type { FitRuleRecord } from '@/shared/contract/records';
import type { Verdict } from '@/shared/contract/verdicts';
import { FIT_RULE_LABELS } from '@/shared/fit/registry';
import { colors, fonts, radius, space, type } from '../theme';

type Outcome = FitRuleRecord['outcome'];

// Word, mark and colour together: the verdict never rests on colour alone.
export const VERDICT_LOOK: Record<Verdict, { word: string; mark: string; fg: string; bg: string }> = {
  fits: { word: 'FITS', mark: '✓', fg: colors.fits, bg: colors.fitsSoft },
  caution: { word: 'CAUTION', mark: '!', fg: colors.caution, bg: colors.cautionSoft },
  'no-fit': { word: 'NO FIT', mark: '✕', fg: colors.noFit, bg: colors.noFitSoft },
};

const OUTCOME_LOOK: Record<Outcome, { word: string; mark: string; fg: string }> = {
  pass: { word: 'ok', mark: '✓', fg: colors.fits },
  caution: { word: 'caution', mark: '!', fg: colors.caution },
  fail: { word: 'fails', mark: '✕', fg: colors.noFit },
};

// The fit rules' labels live with the rules (shared/fit/registry.ts); the lot rules' here.
export const RULE_LABELS: Record<string, string> = {
  ...FIT_RULE_LABELS,
  'shelf-life': 'Shelf life',
  temperature: 'Temperature indicator',
  certificate: 'Certificate of analysis',
};

/** The verdict, large enough to read at arm's length on a phone at the dock. */
export function VerdictBanner({ verdict, summary, testID }: { verdict: Verdict; summary?: string; testID?: string }) {
  const look = VERDICT_LOOK[verdict];
  return (
    <View style={[styles.banner, { backgroundColor: look.bg, borderColor: look.fg }]} role="status" aria-live="polite" testID={testID} accessibilityLabel={`Verdict: ${look.word}. ${summary ?? ''}`}>
      <View style={styles.bannerRow}>
        <View style={[styles.mark, { backgroundColor: look.fg }]}>
          <Text style={styles.markText}>{look.mark}</Text>
        </View>
        <Text style={[styles.word, { color: look.fg }]} testID={testID ? `${testID}-word` : undefined}>
          {look.word}
        </Text>
      </View>
      {summary ? <Text style={type.body}>{summary}</Text> : null}
    </View>
  );
}

export function VerdictChip({ verdict }: { verdict: Verdict }) {
  const look = VERDICT_LOOK[verdict];
  return (
    <View style={[styles.chip, { borderColor: look.fg, backgroundColor: look.bg }]}>
      <Text style={[styles.chipText, { color: look.fg }]}>
        {look.mark} {look.word}
      </Text>
    </View>
  );
}

/** Each rule's outcome with its plain-words reason. */
export function RuleList({ rules, testID }: { rules: FitRuleRecord[]; testID?: string }) {
  return (
    <View style={styles.rules} testID={testID}>
      {rules.map((r) => {
        const look = OUTCOME_LOOK[r.outcome];
        return (
          <View key={r.rule} style={styles.rule} testID={testID ? `${testID}-${r.rule}` : undefined}>
            <Text style={[styles.ruleMark, { color: look.fg }]} aria-hidden>
              {look.mark}
            </Text>
            <View style={{ flex: 1 }}>
              <Text style={type.label}>
                {RULE_LABELS[r.rule] ?? r.rule} <Text style={{ color: look.fg }}>— {look.word}</Text>
              </Text>
              <Text style={type.body}>{r.message}</Text>
            </View>
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  banner: { borderWidth: 3, borderRadius: radius.lg, padding: space.lg, gap: space.sm },
  bannerRow: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  mark: { width: 48, height: 48, borderRadius: 24, alignItems: 'center', justifyContent: 'center' },
  markText: { color: colors.onPrimary, fontFamily: fonts.bold, fontSize: 28, lineHeight: 32 },
  word: { fontFamily: fonts.bold, fontSize: 40, lineHeight: 46, letterSpacing: 1 },
  chip: { borderWidth: 1.5, borderRadius: radius.sm, paddingHorizontal: space.sm, paddingVertical: 2, alignSelf: 'flex-start' },
  chipText: { fontFamily: fonts.bold, fontSize: 13 },
  rules: { gap: space.md },
  rule: { flexDirection: 'row', gap: space.sm, alignItems: 'flex-start' },
  ruleMark: { fontFamily: fonts.bold, fontSize: 20, width: 22, textAlign: 'center' },
});

import { StyleSheet, Text, View } from 'react-native';
import { LOT_STATUS_LABELS } from '@/shared/contract/lot-status';
import type { Blocker, LotDecision, LotVerdict } from '@/shared/dock/verdict';
import { rolesInWords } from '@/shared/contract/roles';
import { VERDICT_LOOK } from '../fit/verdict';
import type { ReceivingCheckRecord } from '../data/receiving';
import { colors, fonts, radius, space, type } from '../theme';

// Word, mark and colour together: the decision never rests on colour alone.
export const DECISION_LOOK: Record<LotDecision, { word: string; mark: string; fg: string; bg: string }> = {
  accept: { word: 'ACCEPT', mark: '✓', fg: colors.fits, bg: colors.fitsSoft },
  caution: { word: 'CAUTION', mark: '!', fg: colors.caution, bg: colors.cautionSoft },
  hold: { word: 'HOLD', mark: '‖', fg: colors.noFit, bg: colors.noFitSoft },
  quarantine: { word: 'QUARANTINE', mark: '⊘', fg: colors.noFit, bg: colors.noFitSoft },
};

export const SOURCE_LABELS: Record<Blocker['source'], string> = {
  fit: 'Hardware',
  'shelf-life': 'Shelf life',
  temperature: 'Temperature indicator',
  certificate: 'Certificate of analysis',
};

function whoReleases(b: Blocker): string | null {
  if (b.severity === 'caution' || !b.releasedBy) return null;
  if (b.release === 'certificate') return `Lifted when the certificate is attached (${rolesInWords(b.releasedBy)}).`;
  return `Released by an ${rolesInWords(b.releasedBy).toLowerCase()}, with a comment.`;
}

/** A verdict for checks stored before lot acceptance existed: the hardware summary alone. */
function fallbackVerdict(record: ReceivingCheckRecord): Pick<LotVerdict, 'decision' | 'sentence' | 'blockers'> {
  return { decision: record.decision, sentence: record.result.summary, blockers: [] };
}

/** The verdict first, in one sentence a clerk acts on; then each blocker, largest first, with who lifts it. */
export function LotVerdictBanner({ record }: { record: ReceivingCheckRecord }) {
  const v = record.lotVerdict ?? fallbackVerdict(record);
  const look = DECISION_LOOK[v.decision];
  const hardware = VERDICT_LOOK[record.verdict];
  return (
    <View style={[styles.banner, { backgroundColor: look.bg, borderColor: look.fg }]} role="status" aria-live="polite" testID="lot-verdict">
      <Text style={styles.sentence} testID="lot-verdict-sentence">
        {v.sentence}
      </Text>
      <View style={styles.chips}>
        <View style={[styles.chip, { borderColor: look.fg }]}>
          <Text style={[styles.chipText, { color: look.fg }]} testID="lot-verdict-word">
            {look.mark} {look.word}
          </Text>
        </View>
        <View style={[styles.chip, { borderColor: hardware.fg }]}>
          <Text style={[styles.chipText, { color: hardware.fg }]}>
            Hardware: <Text testID="verdict-word">{hardware.word}</Text>
          </Text>
        </View>
        <View style={[styles.chip, { borderColor: colors.inkMuted }]}>
          <Text style={[styles.chipText, { color: colors.inkMuted }]} testID="lot-verdict-status">
            {LOT_STATUS_LABELS[record.status]}
          </Text>
        </View>
      </View>
      {v.blockers.length ? (
        <View style={styles.blockers} role="list" aria-label="What holds the lot">
          {v.blockers.map((b, i) => (
            <View key={`${b.source}-${i}`} role="listitem" style={styles.blocker} testID={`lot-blocker-${b.source}`}>
              <Text style={type.label}>
                {SOURCE_LABELS[b.source]} — {b.severity === 'caution' ? 'caution' : b.severity === 'quarantine' ? 'quarantine' : 'hold'}
              </Text>
              <Text style={type.body}>{b.reason}</Text>
              {whoReleases(b) ? (
                <Text style={type.small} testID={`lot-blocker-${b.source}-who`}>
                  {whoReleases(b)}
                </Text>
              ) : null}
            </View>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  banner: { borderWidth: 3, borderRadius: radius.lg, padding: space.lg, gap: space.md },
  sentence: { fontFamily: fonts.bold, fontSize: 21, lineHeight: 28, color: colors.ink },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  chip: { borderWidth: 1.5, borderRadius: radius.sm, paddingHorizontal: space.sm, paddingVertical: 2, backgroundColor: colors.surface },
  chipText: { fontFamily: fonts.bold, fontSize: 14, lineHeight: 20 },
  blockers: { gap: space.sm },
  blocker: { gap: 2, paddingTop: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
});

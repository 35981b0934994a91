import { StyleSheet, Text, View } from 'react-native';
import { heelVolumeL } from '@/shared/heel';
import { fromLitres } from '@/shared/units';
import { useLengthUnit } from '../data/me';
import { useDrumTypeChecksQuery, type PackagingFinding } from '../data/tools';
import { colors, fonts, space, type } from '../theme';
import { ErrorState, LoadingState } from '../ui/states';
import { Section } from './detail-parts';

const OUTCOME: Record<PackagingFinding['outcome'], { mark: string; word: string; fg: string }> = {
  pass: { mark: '✓', word: 'agrees', fg: colors.fits },
  caution: { mark: '!', word: 'check', fg: colors.caution },
  fail: { mark: '✕', word: 'disagrees', fg: colors.noFit },
};

const CHECK_LABELS: Record<PackagingFinding['check'], string> = {
  code: 'Code',
  kind: 'Kind of packaging',
  material: 'Material',
  head: 'Head',
};

/** The server's checks of one drum type: the tube length that lands the tip in the site's window, and its UN code against the record. */
export function DrumTypeChecks({ id, unPackagingCode, outsideDiameterMm, insideDepthMm }: { id: string; unPackagingCode: string | null; outsideDiameterMm: number; insideDepthMm: number }) {
  const checks = useDrumTypeChecksQuery(id);
  const { show, unit } = useLengthUnit();
  // Litres for a person working in mm, US gallons for one working in inches; the other in brackets.
  const volume = (litres: number) => {
    const l = `${litres.toFixed(1)} L`;
    const gal = `${fromLitres(litres, 'gal').toFixed(2)} gal`;
    return unit === 'in' ? `${gal} (${l})` : `${l} (${gal})`;
  };
  let body;
  if (checks.isPending) body = <LoadingState label="Checking the drum type…" />;
  else if (checks.isError) body = <ErrorState error={checks.error} onRetry={() => checks.refetch()} />;
  else {
    const { recommendedLength: r, packaging } = checks.data;
    body = (
      <View style={styles.body}>
        <View style={styles.block} testID="drum-recommended-length">
          <Text style={type.label}>Recommended dip tube length</Text>
          <Text style={styles.big} testID="drum-recommended-target">
            {show(r.targetMm)}
          </Text>
          <Text style={type.body}>
            Anything from {show(r.minLengthMm)} to {show(r.maxLengthMm)} keeps the tip inside the site's clearance window above the drum bottom.
          </Text>
        </View>
        <View style={styles.block} testID="drum-heel">
          <Text style={type.label}>Left below the tip</Text>
          <Text style={styles.big} testID="drum-heel-volume">
            {volume(heelVolumeL(outsideDiameterMm, insideDepthMm - r.targetMm))}
          </Text>
          <Text style={type.body}>
            At most this much stays in the drum with the tip {show(insideDepthMm - r.targetMm)} above the bottom, worked out from the outside diameter ({show(outsideDiameterMm)}); the inside is a
            little narrower, so the real heel is a little less.
          </Text>
        </View>
        <View style={styles.block} testID="drum-packaging-findings">
          <Text style={type.label}>UN packaging code {unPackagingCode ? `(${unPackagingCode})` : ''}</Text>
          {packaging.length === 0 ? (
            <Text style={type.body}>No UN packaging code is recorded for this drum type, so there is nothing to check.</Text>
          ) : (
            packaging.map((f) => {
              const look = OUTCOME[f.outcome];
              return (
                <View key={f.check} style={styles.finding} testID={`drum-finding-${f.check}`}>
                  <Text style={[styles.mark, { color: look.fg }]} aria-hidden>
                    {look.mark}
                  </Text>
                  <View style={styles.findingText}>
                    <Text style={type.label}>
                      {CHECK_LABELS[f.check]} <Text style={{ color: look.fg }}>— {look.word}</Text>
                    </Text>
                    <Text style={type.body}>{f.message}</Text>
                  </View>
                </View>
              );
            })
          )}
        </View>
      </View>
    );
  }
  return (
    <Section title="Checks" testID="drum-checks">
      {body}
    </Section>
  );
}

const styles = StyleSheet.create({
  body: { gap: space.lg },
  block: { gap: space.xs },
  big: { fontFamily: fonts.bold, fontSize: 26, lineHeight: 32, color: colors.ink },
  finding: { flexDirection: 'row', gap: space.sm, alignItems: 'flex-start' },
  mark: { fontFamily: fonts.bold, fontSize: 20, width: 22, textAlign: 'center' },
  findingText: { flex: 1, minWidth: 0 },
});

import { StyleSheet, Text, View } from 'react-native';
import type { ChangeOutRecord } from '@/shared/contract/stations';
import { useReceivingCheckQuery } from '../data/receiving';
import { Screen } from '../screen';
import { colors, fonts, space, type } from '../theme';
import { Card } from '../ui/card';
import { ErrorState, LoadingState } from '../ui/states';
import { useIsWide } from '../use-layout';
import { CertificateButton, needsCertificate, useRole } from './certificate-button';
import { CheckFiles } from './check-files';
import { CheckResult } from './check-result';
import { HoldPanel } from './hold-panel';
import { formatWhen } from '../ui/format';
import { LinkButton } from '../ui/link-button';
import { SectionTitle } from '../ui/section-title';
import { TextLink } from '../ui/text-link';

/** One lot: its verdict, hold or release, and every piece of hardware that touched it. */
export function LotScreen({ id }: { id: string }) {
  const wide = useIsWide();
  const lot = useReceivingCheckQuery(id);
  const role = useRole();
  const actions = <LinkButton href="/receive/history" label="All checks" testID="lot-history-link" />;

  if (lot.isPending) {
    return (
      <Screen title="Lot" actions={actions} testID="lot-screen">
        <LoadingState label="Loading the lot…" />
      </Screen>
    );
  }
  if (lot.isError) {
    return (
      <Screen title="Lot" actions={actions} testID="lot-screen">
        <ErrorState error={lot.error} onRetry={() => lot.refetch()} />
      </Screen>
    );
  }
  const r = lot.data;
  return (
    <Screen
      title={`Lot ${r.lotNumber}`}
      subtitle={`${r.drumCount} drum${r.drumCount === 1 ? '' : 's'}, checked by ${r.checkedByName ?? '—'} on ${formatWhen(r.checkedAt)}`}
      actions={actions}
      testID="lot-screen"
      footer={needsCertificate(r, role) ? <CertificateButton record={r} /> : undefined}
    >
      <CheckResult record={r} wide={wide} hold={<HoldPanel record={r} prefix="lot" />} files={<CheckFiles checkId={r.id} />} />
      <Card testID="lot-history">
        <SectionTitle>Hardware that touched this lot</SectionTitle>
        {r.changeOuts.length === 0 ? (
          <View style={styles.empty} testID="lot-history-empty">
            <Text style={type.body}>No hardware has touched this lot yet. A tube set is recorded here when it goes into one of the lot's drums at a station and that drum goes online.</Text>
            <TextLink href="/stations">Go to the stations</TextLink>
          </View>
        ) : (
          <View role="list" style={styles.list}>
            {r.changeOuts.map((c, i) => (
              <ChangeOutRow key={c.id} c={c} n={i + 1} wide={wide} />
            ))}
          </View>
        )}
      </Card>
    </Screen>
  );
}

function ChangeOutRow({ c, n, wide }: { c: ChangeOutRecord; n: number; wide: boolean }) {
  return (
    <View role="listitem" style={[styles.row, wide && styles.rowWide]} testID={`lot-history-${c.tubeSetLabel ?? c.id}`}>
      <Text style={[styles.n, wide && styles.nWide]}>{n}</Text>
      <View style={styles.body}>
        <Text style={type.label}>
          {formatWhen(c.at)}: drum {c.drumSerial ?? '(serial not recorded)'} went online at <TextLink href={`/stations/${c.stationId}`}>{c.stationName ?? 'a station'}</TextLink>
        </Text>
        <Text style={type.body}>
          Tube set {c.tubeSetLabel ?? '—'} (dip tube {c.dipTubePartNumber ?? '—'}) with head {c.connectorPartNumber ?? 'none recorded'}
        </Text>
        <Text style={type.small}>Changed out by {c.byName ?? '—'}</Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  empty: { gap: space.sm, alignItems: 'flex-start' },
  list: { gap: space.md },
  row: { flexDirection: 'row', gap: space.md, paddingTop: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
  rowWide: { alignItems: 'flex-start' },
  n: { fontFamily: fonts.bold, fontSize: 18, color: colors.inkMuted, width: 24 },
  nWide: { width: 32 },
  body: { flex: 1, gap: 2 },
});

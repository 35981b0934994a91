import { StyleSheet, Text, View } from 'react-native';
import type { FitCheckResult } from '@/shared/contract/records';
import { useQueuedChecks } from '../data/dock-queue';
import type { ReceivingCheckRecord } from '../data/receiving';
import { useSession } from '../session';
import { Screen } from '../screen';
import { colors, fonts, radius, space, type } from '../theme';
import { Button } from '../ui/button';
import { useIsWide } from '../use-layout';
import { CheckResult } from './check-result';
import { formatWhen } from '../ui/format';
import { LinkButton } from '../ui/link-button';
import { RESULT_ID } from './dock-result';
import type { ProvisionalShown } from './use-dock-form';
import { WaitingChecks } from './waiting-checks';

/** The check as the phone worked it out, in the shape of a recorded one (nothing is recorded yet). */
function asRecord(p: ProvisionalShown, checkedByName: string | null): ReceivingCheckRecord {
  const { body, check } = p;
  const held = check.lotVerdict.decision === 'hold' ? 'on-hold' : check.lotVerdict.decision === 'quarantine' ? 'quarantined' : 'checked';
  return {
    id: p.clientKey,
    version: 0,
    lotNumber: body.lotNumber,
    supplierId: body.supplierId ?? null,
    supplierName: null,
    slurryId: body.slurryId ?? null,
    slurryName: check.result.slurry?.name ?? null,
    drumCount: body.drumCount,
    drumTypeId: body.drumTypeId ?? null,
    drumTypeName: check.result.drum.name,
    drumTypePartNumber: check.result.drum.partNumber,
    drumDescription: body.drum ?? null,
    stationId: body.stationId ?? null,
    stationName: check.result.station?.name ?? null,
    productionDate: body.productionDate ?? null,
    expiryDate: body.expiryDate ?? null,
    temperatureIndicator: body.temperatureIndicator ?? null,
    verdict: check.result.verdict,
    decision: check.lotVerdict.decision,
    lotVerdict: check.lotVerdict,
    // Not recorded yet: the server keeps the phone's verdict beside its own once the check is sent.
    provisional: null,
    result: check.result as unknown as FitCheckResult,
    checkedById: '',
    checkedByName,
    checkedAt: new Date().toISOString(),
    status: held,
    holdReason: null,
    heldByRules: held !== 'checked',
    heldByName: null,
    heldAt: null,
    releasedByName: null,
    releasedAt: null,
    releaseComment: null,
  };
}

/**
 * A dock check made with no network: the verdict the phone worked out from its kept registry, marked as
 * provisional, and the check waiting to be sent. Once it is sent, the server's record is a tap away.
 */
export function ProvisionalResult({ shown, onAgain }: { shown: ProvisionalShown; onAgain: () => void }) {
  const wide = useIsWide();
  const { session } = useSession();
  const mine = useQueuedChecks().find((q) => q.clientKey === shown.clientKey);
  const sent = mine?.status === 'sent' && mine.record ? mine.record : null;
  const footer = (
    <View style={[styles.bar, wide && styles.barWide]}>
      {sent ? <LinkButton href={`/receive/${sent.id}`} label="Open the recorded lot" variant="primary" testID="provisional-open" /> : null}
      <Button label="Check another lot" variant={sent ? 'secondary' : 'primary'} onPress={onAgain} testID="dock-new" />
    </View>
  );
  return (
    <Screen title="Dock check" subtitle="Worked out on this phone, with no network. It is sent and recorded when the network is back." testID="dock-screen" footer={footer}>
      <View nativeID={RESULT_ID} />
      <View style={styles.mark} role="note" testID="provisional-mark">
        <Text style={styles.markTitle}>Provisional: worked out on this phone</Text>
        <Text style={type.body} testID="provisional-registry">
          From the registry as of {formatWhen(shown.registryAsOf)}.{' '}
          {sent ? 'Sent: the server has recorded the lot; its verdict is the one that counts.' : 'Waiting to be sent; the server judges it again and tells you if its verdict differs.'} Act on a hold
          or quarantine now; do not tap a drum on a provisional accept if the station's hardware changed since.
        </Text>
      </View>
      <WaitingChecks />
      <CheckResult record={asRecord(shown, session?.user.name ?? null)} wide={wide} />
    </Screen>
  );
}

const styles = StyleSheet.create({
  mark: { borderWidth: 2, borderStyle: 'dashed', borderColor: colors.caution, backgroundColor: colors.cautionSoft, borderRadius: radius.md, padding: space.md, gap: space.xs },
  markTitle: { fontFamily: fonts.bold, fontSize: 18, lineHeight: 24, color: colors.ink },
  bar: { gap: space.sm },
  barWide: { flexDirection: 'row', alignItems: 'flex-start' },
});

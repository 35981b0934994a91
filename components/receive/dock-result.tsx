import { StyleSheet, View } from 'react-native';
import { useReceivingCheckQuery } from '../data/receiving';
import { Screen } from '../screen';
import { space } from '../theme';
import { Button } from '../ui/button';
import { ErrorState, LoadingState } from '../ui/states';
import { useIsWide } from '../use-layout';
import { CertificateButton, needsCertificate, useRole } from './certificate-button';
import { CheckFiles } from './check-files';
import { CheckResult } from './check-result';
import { HoldPanel } from './hold-panel';
import { LinkButton } from '../ui/link-button';

export const RESULT_ID = 'dock-result';

/** The recorded check at the dock, with its primary action in a bar at the bottom of the screen. */
export function DockResult({ recordId, onAgain }: { recordId: string; onAgain: () => void }) {
  const wide = useIsWide();
  const role = useRole();
  const record = useReceivingCheckQuery(recordId);
  const waiting = !!record.data && needsCertificate(record.data, role);
  const footer = (
    <View style={[styles.bar, wide && styles.barWide]}>
      {waiting && record.data ? <CertificateButton record={record.data} /> : null}
      <Button label="Check another lot" variant={waiting ? 'secondary' : 'primary'} onPress={onAgain} testID="dock-new" />
    </View>
  );
  return (
    <Screen title="Dock check" subtitle="The verdict for this lot, recorded with who checked it and when." actions={<HistoryLink />} testID="dock-screen" footer={footer}>
      <View nativeID={RESULT_ID} />
      {record.isPending ? (
        <LoadingState label="Loading the check…" />
      ) : record.isError ? (
        <ErrorState error={record.error} onRetry={() => record.refetch()} />
      ) : (
        <CheckResult
          record={record.data}
          wide={wide}
          hold={<HoldPanel record={record.data} prefix="dock" />}
          files={<CheckFiles checkId={record.data.id} />}
          after={<LinkButton href={`/receive/${record.data.id}`} label="Open the lot page" testID="dock-lot-link" />}
        />
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  bar: { gap: space.sm },
  barWide: { flexDirection: 'row', alignItems: 'flex-start' },
});

/** The dock pages' way to the recorded checks. */
export function HistoryLink() {
  return <LinkButton href="/receive/history" label="Check history" testID="dock-history-link" />;
}

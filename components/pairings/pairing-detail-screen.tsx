import { Link, router } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import type { PairingRecord } from '@/shared/contract/records';
import { pairingQueries } from '../data/pairings';
import { useCanEditRegistry } from '../registry/use-can-edit-registry';
import { Screen } from '../screen';
import { colors, fonts, minTouch, space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ErrorState, LoadingState } from '../ui/states';
import { useIsWide } from '../use-layout';
import { PairingStatusBadge } from './pairing-status';
import { ReviewHistory } from './review-history';
import { ReviewPanel } from './review-panel';

const when = (at: string) => new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' }).format(new Date(at));

function Fact({ label, children, testID }: { label: string; children: React.ReactNode; testID?: string }) {
  return (
    <View style={styles.fact}>
      <Text style={type.small}>{label}</Text>
      <View testID={testID}>{children}</View>
    </View>
  );
}

function PairingFacts({ pairing: p }: { pairing: PairingRecord }) {
  return (
    <Card testID="pairing-facts">
      <PairingStatusBadge status={p.status} testID="pairing-status" />
      <Fact label="Dip tube" testID="pairing-tube">
        <Link href={`/registry/dip-tubes/${p.dipTubeId}` as never} style={styles.link}>
          {p.dipTubePartNumber ?? 'Dip tube'}
          {p.threadCode ? ` (${p.threadCode})` : ''}
        </Link>
      </Fact>
      <Fact label="Dispense head" testID="pairing-connector">
        <Link href={`/registry/connectors/${p.connectorId}` as never} style={styles.link}>
          {p.connectorPartNumber ?? 'Dispense head'}
        </Link>
      </Fact>
      <Fact label="Author" testID="pairing-author">
        <Text style={type.body}>
          {p.authorName ?? 'Unknown'}, {when(p.createdAt)}
        </Text>
      </Fact>
      <Fact label="Approver" testID="pairing-approver">
        <Text style={type.body}>{p.approverName ? `${p.approverName}${p.approvedAt ? `, ${when(p.approvedAt)}` : ''}` : 'Not approved yet'}</Text>
      </Fact>
      <Fact label="Notes" testID="pairing-notes">
        <Text style={type.body}>{p.notes?.trim() || 'No notes.'}</Text>
      </Fact>
    </Card>
  );
}

/** One pairing: the parts, who wrote and approved it, the review decision and its history. */
export function PairingDetailScreen({ id }: { id: string }) {
  const wide = useIsWide();
  const canEdit = useCanEditRegistry();
  const query = pairingQueries.useDetail(id);

  if (query.isPending) {
    return (
      <Screen title="Pairing" testID="pairing-detail">
        <LoadingState label="Loading the pairing…" />
      </Screen>
    );
  }
  if (query.isError) {
    return (
      <Screen title="Pairing" testID="pairing-detail">
        <ErrorState error={query.error} onRetry={() => query.refetch()} />
      </Screen>
    );
  }
  const p = query.data;
  const actions =
    canEdit && p.status !== 'retired' ? <Button label="Edit notes" variant="secondary" onPress={() => router.push(`/registry/pairings/edit/${p.id}` as never)} testID="pairing-edit" /> : null;
  const title = `${p.dipTubePartNumber ?? 'Dip tube'} + ${p.connectorPartNumber ?? 'connector'}`;
  return (
    <Screen
      title={title}
      subtitle="Pairing of a dip tube and the dispense head it is used with."
      actions={actions}
      testID="pairing-detail"
      // A phone shows the review panel between the facts and the history.
      columns={
        wide
          ? [
              <>
                <PairingFacts pairing={p} />
                <ReviewHistory pairing={p} />
              </>,
              <ReviewPanel pairing={p} />,
            ]
          : undefined
      }
      split={[3, 2]}
    >
      {wide ? null : (
        <>
          <PairingFacts pairing={p} />
          <ReviewPanel pairing={p} />
          <ReviewHistory pairing={p} />
        </>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  fact: { gap: 2 },
  link: {
    fontFamily: fonts.semibold,
    fontSize: 17,
    color: colors.primary,
    textDecorationLine: 'underline',
    minHeight: minTouch,
    paddingVertical: space.sm,
    display: 'flex' as never,
    alignItems: 'center',
    alignSelf: 'flex-start',
  },
});

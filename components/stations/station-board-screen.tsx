import type { ReactNode } from 'react';
import { can } from '@/shared/contract/roles';
import { StyleSheet, Text, View } from 'react-native';
import { useStationBoardQuery, type StationBoard } from '../data/station-board';
import { LinkButton } from '../ui/link-button';
import { SectionTitle } from '../ui/section-title';
import { Screen } from '../screen';
import { useSession } from '../session';
import { space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { HandlingCaution } from '../ui/handling-caution';
import { ErrorState, LoadingState } from '../ui/states';
import { useIsWide } from '../use-layout';
import { ChangeOuts, RinseLog } from './board-logs';
import { RotationNotice, SetCard } from './set-card';
import { StandbyPanel } from './standby-panel';
import { CHANGE_OUT, useRotation } from './use-rotation';

/** One station's board: its three tube sets moved through the rotation, the rinse log and the change-outs. */
export function StationBoardScreen({ id }: { id: string }) {
  const wide = useIsWide();
  const board = useStationBoardQuery(id);
  const actions = <LinkButton href="/stations" label="All stations" testID="board-back" />;
  if (board.isPending || board.isError) {
    return (
      <Screen title="Station" actions={actions} testID="board-screen">
        {board.isPending ? <LoadingState label="Loading the station…" /> : <ErrorState error={board.error} onRetry={() => board.refetch()} />}
      </Screen>
    );
  }
  return <Board board={board.data} wide={wide} actions={actions} />;
}

function Board({ board, wide, actions }: { board: StationBoard; wide: boolean; actions: ReactNode }) {
  const { session } = useSession();
  const canAct = can(session?.user.role, 'tend-stations');
  const rotation = useRotation(board);
  const { message } = rotation;
  const { station, tubeSets } = board;

  const sets = (
    <View style={[styles.sets, wide && styles.setsWide]}>
      {tubeSets.map((set) => (
        <SetCard
          key={set.id}
          set={set}
          wide={wide}
          canAct={canAct}
          note={rotation.notes[set.id] ?? ''}
          onNote={(t) => rotation.setNote(set.id, t)}
          message={message?.where === set.id ? <RotationNotice message={message} /> : null}
          rinsing={rotation.rinsingId === set.id}
          onRinse={() => rotation.doRinse(set)}
          onStandby={() => rotation.openStandby(set.id)}
          standbyPanel={
            rotation.standbyFor === set.id ? (
              <StandbyPanel set={set} busy={rotation.standbyBusy} onConfirm={(input) => rotation.doStandby(set, input)} onCancel={rotation.closeStandby} testID={`set-${set.label}-standby-panel`} />
            ) : null
          }
        />
      ))}
    </View>
  );

  return (
    <Screen
      title={station.name}
      subtitle={`${station.bay} · ${station.tapping === 'one-opening' ? 'one-opening' : 'two-opening'} tapping · ${station.agitation === 'pump' ? 'pump' : 'mechanical'} agitation · head ${station.connectorPartNumber ?? 'none'}`}
      actions={actions}
      testID="board-screen"
      columns={[<ChangeOuts board={board} />, <RinseLog board={board} />]}
    >
      <HandlingCaution pressurised />
      <Text style={type.body}>Rotation: online → cleaning → rinsed, clean and ready → standby drum → online. A set goes into a drum only after a rinse since its last drum.</Text>
      <ChangeOutCard rotation={rotation} canAct={canAct} />
      {sets}
    </Screen>
  );
}

/** What a change-out will do now, and the button that does it. */
function ChangeOutCard({ rotation, canAct }: { rotation: ReturnType<typeof useRotation>; canAct: boolean }) {
  const { inStandby, online, message } = rotation;
  return (
    <Card testID="change-out-card">
      <SectionTitle>Change out</SectionTitle>
      <Text style={type.body}>
        {inStandby
          ? `When the online drum is empty: ${inStandby.label} (standby drum${inStandby.currentLotNumber ? `, lot ${inStandby.currentLotNumber}` : ''}) goes online${online ? `, and ${online.label} comes out for cleaning` : ''}.`
          : 'No set is in a standby drum yet: put a clean and ready set into the next drum before changing out.'}
      </Text>
      {message?.where === CHANGE_OUT ? <RotationNotice message={message} /> : null}
      {canAct ? (
        <Button label="Change out" busy={rotation.changeOutBusy} onPress={rotation.doChangeOut} testID="change-out" />
      ) : (
        <Text style={type.small}>Clerks, engineers and administrators move the sets.</Text>
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  sets: { gap: space.lg },
  setsWide: { flexDirection: 'row', alignItems: 'flex-start' },
});

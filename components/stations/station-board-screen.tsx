import { useState, type ReactNode } from 'react';
import { can } from '@/shared/contract/roles';
import { StyleSheet, Text, View } from 'react-native';
import { ApiError } from '../api/client';
import { useChangeOutMutation, useRinseMutation, useStandbyMutation, useStationBoardQuery, type BoardTubeSet, type StandbyInput, type StationBoard } from '../data/station-board';
import { formatWhen } from '../ui/format';
import { LinkButton } from '../ui/link-button';
import { SectionTitle } from '../ui/section-title';
import { TextLink } from '../ui/text-link';
import { Screen } from '../screen';
import { useSession } from '../session';
import { colors, fonts, radius, space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { HandlingCaution } from '../ui/handling-caution';
import { ErrorState, LoadingState } from '../ui/states';
import { TextField } from '../ui/text-field';
import { useIsWide } from '../use-layout';
import { SetStateChip } from './set-state';
import { StandbyPanel } from './standby-panel';

interface Message {
  tone: 'done' | 'refused';
  text: string;
  detail?: string;
  /** Shown where the action was taken: a set's card (its id) or the change-out card. */
  where: string;
}

const CHANGE_OUT = 'change-out';

const RINSE_LOOK = {
  pass: { mark: '✓', fg: colors.fits, bg: colors.fitsSoft, word: 'Rinsed' },
  caution: { mark: '!', fg: colors.caution, bg: colors.cautionSoft, word: 'No rinse recorded' },
  fail: { mark: '✕', fg: colors.noFit, bg: colors.noFitSoft, word: 'Not rinsed since its last drum' },
} as const;
const IN_DRUM_LOOK = { mark: '▶', fg: colors.inkMuted, bg: colors.surface, word: 'In a drum now' } as const;

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
  const rinse = useRinseMutation();
  const standby = useStandbyMutation();
  const changeOut = useChangeOutMutation();
  const [message, setMessage] = useState<Message | null>(null);
  const [standbyFor, setStandbyFor] = useState<string | null>(null);
  const [notes, setNotes] = useState<Record<string, string>>({});
  const { station, tubeSets } = board;
  const online = tubeSets.find((s) => s.state === 'online');
  const inStandby = tubeSets.find((s) => s.state === 'standby');

  const refused = (err: Error, where: string, set?: BoardTubeSet): Message => {
    // A set that is not rinsed since its last drum is refused; say why in the rinse rule's own words.
    const detail = set && set.rinse.outcome !== 'pass' ? `${set.label}: ${set.rinse.message} Rinse it with DI water and record the rinse first.` : undefined;
    return { tone: 'refused', text: err instanceof ApiError || err instanceof Error ? err.message : 'The move was refused.', detail, where };
  };

  const doRinse = (set: BoardTubeSet) => {
    setMessage(null);
    const note = notes[set.id]?.trim();
    rinse.mutate(
      { id: set.id, note: note || undefined },
      {
        onSuccess: () => {
          setNotes((n) => ({ ...n, [set.id]: '' }));
          setMessage({ tone: 'done', text: `${set.label} rinsed with DI water: clean and ready for the next drum.`, where: set.id });
        },
        onError: (err) => setMessage(refused(err, set.id)),
      },
    );
  };

  const doStandby = (set: BoardTubeSet, input: StandbyInput) => {
    setMessage(null);
    standby.mutate(input, {
      onSuccess: () => {
        setStandbyFor(null);
        setMessage({ tone: 'done', text: `${set.label} is in the standby drum. Change out when the online drum runs empty.`, where: set.id });
      },
      onError: (err) => {
        setStandbyFor(null);
        setMessage(refused(err, set.id, set));
      },
    });
  };

  const doChangeOut = () => {
    setMessage(null);
    changeOut.mutate(station.id, {
      onSuccess: () =>
        setMessage({
          tone: 'done',
          text: `Changed out: ${inStandby?.label ?? 'the standby set'} is online${inStandby?.currentLotNumber ? ` with lot ${inStandby.currentLotNumber}` : ''}${online ? `; ${online.label} came out for cleaning: rinse it with DI water now` : ''}.`,
          where: CHANGE_OUT,
        }),
      onError: (err) => setMessage(refused(err, CHANGE_OUT)),
    });
  };

  const sets = (
    <View style={[styles.sets, wide && styles.setsWide]}>
      {tubeSets.map((set) => (
        <SetCard
          key={set.id}
          set={set}
          wide={wide}
          canAct={canAct}
          note={notes[set.id] ?? ''}
          onNote={(t) => setNotes((n) => ({ ...n, [set.id]: t }))}
          message={message?.where === set.id ? <RotationMessage message={message} /> : null}
          rinsing={rinse.isPending && rinse.variables?.id === set.id}
          onRinse={() => doRinse(set)}
          onStandby={() => {
            setMessage(null);
            setStandbyFor(set.id);
          }}
          standbyPanel={
            standbyFor === set.id ? (
              <StandbyPanel set={set} busy={standby.isPending} onConfirm={(input) => doStandby(set, input)} onCancel={() => setStandbyFor(null)} testID={`set-${set.label}-standby-panel`} />
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
      <Card testID="change-out-card">
        <SectionTitle>Change out</SectionTitle>
        <Text style={type.body}>
          {inStandby
            ? `When the online drum is empty: ${inStandby.label} (standby drum${inStandby.currentLotNumber ? `, lot ${inStandby.currentLotNumber}` : ''}) goes online${online ? `, and ${online.label} comes out for cleaning` : ''}.`
            : 'No set is in a standby drum yet: put a clean and ready set into the next drum before changing out.'}
        </Text>
        {message?.where === CHANGE_OUT ? <RotationMessage message={message} /> : null}
        {canAct ? (
          <Button label="Change out" busy={changeOut.isPending} onPress={doChangeOut} testID="change-out" />
        ) : (
          <Text style={type.small}>Clerks, engineers and administrators move the sets.</Text>
        )}
      </Card>
      {sets}
    </Screen>
  );
}

function RotationMessage({ message }: { message: Message }) {
  return (
    <View role="alert" style={[styles.message, message.tone === 'done' ? styles.messageDone : styles.messageRefused]} testID="rotation-message">
      <Text style={[type.label, { color: message.tone === 'done' ? colors.fits : colors.noFit }]}>{message.tone === 'done' ? '✓ Done' : '✕ Refused'}</Text>
      <Text style={type.body}>{message.text}</Text>
      {message.detail ? <Text style={[type.body, styles.detail]}>{message.detail}</Text> : null}
    </View>
  );
}

interface SetCardProps {
  set: BoardTubeSet;
  message: ReactNode;
  wide: boolean;
  canAct: boolean;
  note: string;
  onNote: (t: string) => void;
  rinsing: boolean;
  onRinse: () => void;
  onStandby: () => void;
  standbyPanel: ReactNode;
}

function SetCard({ set, message, wide, canAct, note, onNote, rinsing, onRinse, onStandby, standbyPanel }: SetCardProps) {
  // A set in a drum is wet by design: it is rinsed when it comes out, so its status is not an alarm there.
  const inDrum = set.state === 'online' || set.state === 'standby';
  const look = inDrum ? IN_DRUM_LOOK : RINSE_LOOK[set.rinse.outcome];
  const t = `set-${set.label}`;
  return (
    <Card style={wide ? styles.setWide : undefined} testID={t}>
      <View style={styles.setHead}>
        <Text role="heading" aria-level={2} style={type.heading}>
          {set.label}
        </Text>
        <SetStateChip state={set.state} testID={`${t}-state`} />
      </View>
      <Text style={type.small}>Dip tube {set.dipTubePartNumber ?? '—'}</Text>
      {set.state === 'online' || set.state === 'standby' ? (
        <Text style={type.body} testID={`${t}-drum`}>
          In lot{' '}
          {set.currentReceivingCheckId ? (
            <TextLink href={`/receive/${set.currentReceivingCheckId}`}>{set.currentLotNumber ?? '—'}</TextLink>
          ) : (
            <Text style={styles.strong}>{set.currentLotNumber ?? 'not recorded'}</Text>
          )}
          {set.currentDrumSerial ? `, drum ${set.currentDrumSerial}` : ''}
        </Text>
      ) : null}
      <View style={[styles.rinse, { borderColor: look.fg, backgroundColor: look.bg }]} testID={`${t}-rinse-status`}>
        <Text style={[type.label, { color: look.fg }]}>
          {look.mark} {look.word}
        </Text>
        <Text style={type.small}>{inDrum ? 'It is rinsed with DI water when it comes out at the next change-out.' : set.rinse.message}</Text>
      </View>
      <Text style={type.small}>
        Last rinsed {formatWhen(set.lastRinsedAt)}
        {set.lastRinsedByName ? ` by ${set.lastRinsedByName}` : ''} · last in a drum {formatWhen(set.lastUsedAt)}
      </Text>
      {canAct && set.state === 'cleaning' ? (
        <View style={styles.actions}>
          <TextField label={`Rinse note for ${set.label} (optional)`} value={note} onChangeText={onNote} placeholder="e.g. DI water, three flushes" testID={`${t}-rinse-note`} />
          <Button label="Rinsed with DI water" busy={rinsing} onPress={onRinse} testID={`${t}-rinse`} accessibilityLabel={`${set.label}: rinsed with DI water`} />
        </View>
      ) : null}
      {canAct && (set.state === 'ready' || set.state === 'cleaning') && !standbyPanel ? (
        <Button
          label="Into standby drum"
          variant={set.state === 'ready' ? 'primary' : 'secondary'}
          onPress={onStandby}
          testID={`${t}-standby`}
          accessibilityLabel={`${set.label}: into standby drum`}
        />
      ) : null}
      {standbyPanel}
      {message}
    </Card>
  );
}

function ChangeOuts({ board }: { board: StationBoard }) {
  return (
    <Card testID="change-outs">
      <SectionTitle>Change-outs</SectionTitle>
      <Text style={type.small}>Newest first.</Text>
      {board.changeOuts.length === 0 ? (
        <Text style={type.body}>No change-outs recorded yet. Press Change out when the online drum runs empty.</Text>
      ) : (
        <View role="list" style={styles.entries}>
          {board.changeOuts.map((c) => (
            <View role="listitem" key={c.id} style={styles.entry} testID={`change-out-${c.id}`}>
              <Text style={type.label}>{formatWhen(c.at)}</Text>
              <Text style={type.body}>
                {c.tubeSetLabel ?? '—'} went online{' '}
                {c.receivingCheckId ? (
                  <>
                    in lot{' '}
                    <TextLink href={`/receive/${c.receivingCheckId}`} testID={`change-out-lot-${c.lotNumber ?? c.id}`}>
                      {c.lotNumber ?? '—'}
                    </TextLink>
                  </>
                ) : c.lotNumber ? (
                  <>
                    in lot <Text style={styles.strong}>{c.lotNumber}</Text>
                  </>
                ) : (
                  '(lot not recorded)'
                )}
                {c.drumSerial ? `, drum ${c.drumSerial}` : ''}
                {c.retiredTubeSetLabel ? `; ${c.retiredTubeSetLabel} came out for cleaning` : ''}.
              </Text>
              <Text style={type.small}>
                Tube {c.dipTubePartNumber ?? '—'} · head {c.connectorPartNumber ?? '—'} · by {c.byName ?? '—'}
              </Text>
            </View>
          ))}
        </View>
      )}
    </Card>
  );
}

function RinseLog({ board }: { board: StationBoard }) {
  return (
    <Card testID="rinse-log">
      <SectionTitle>Rinse log</SectionTitle>
      <Text style={type.small}>Who rinsed which set with DI water, and when; newest first.</Text>
      {board.rinses.length === 0 ? (
        <Text style={type.body}>No rinses recorded yet. Record one with “Rinsed with DI water” on a set being cleaned.</Text>
      ) : (
        <View role="list" style={styles.entries}>
          {board.rinses.map((r) => (
            <View role="listitem" key={r.id} style={styles.entry}>
              <Text style={type.body}>
                <Text style={styles.strong}>{r.tubeSetLabel ?? '—'}</Text> rinsed by {r.byName ?? '—'}, {formatWhen(r.at)}
              </Text>
              {r.note ? <Text style={type.small}>{r.note}</Text> : null}
            </View>
          ))}
        </View>
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  message: { gap: space.xs, padding: space.lg, borderRadius: radius.lg, borderWidth: 3 },
  messageDone: { borderColor: colors.fits, backgroundColor: colors.fitsSoft },
  messageRefused: { borderColor: colors.noFit, backgroundColor: colors.noFitSoft },
  detail: { fontFamily: fonts.semibold },
  sets: { gap: space.lg },
  setsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  setWide: { flex: 1, minWidth: 0 },
  setHead: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.sm, flexWrap: 'wrap' },
  strong: { fontFamily: fonts.semibold },
  rinse: { gap: 2, padding: space.sm, borderRadius: radius.md, borderWidth: 1.5 },
  actions: { gap: space.sm },
  entries: { gap: space.sm },
  entry: { gap: 2, paddingTop: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
});

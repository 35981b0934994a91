import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { BoardTubeSet } from '../data/station-board';
import { formatWhen } from '../ui/format';
import { TextLink } from '../ui/text-link';
import { colors, fonts, radius, space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { TextField } from '../ui/text-field';
import { SetStateChip } from './set-state';
import type { RotationMessage } from './use-rotation';

const RINSE_LOOK = {
  pass: { mark: '✓', fg: colors.fits, bg: colors.fitsSoft, word: 'Rinsed' },
  caution: { mark: '!', fg: colors.caution, bg: colors.cautionSoft, word: 'No rinse recorded' },
  fail: { mark: '✕', fg: colors.noFit, bg: colors.noFitSoft, word: 'Not rinsed since its last drum' },
} as const;
const IN_DRUM_LOOK = { mark: '▶', fg: colors.inkMuted, bg: colors.surface, word: 'In a drum now' } as const;

/** The last move's answer: done, or refused and why. */
export function RotationNotice({ message }: { message: RotationMessage }) {
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

/** One tube set: where it is in the rotation, its rinse status and the moves it can make next. */
export function SetCard({ set, message, wide, canAct, note, onNote, rinsing, onRinse, onStandby, standbyPanel }: SetCardProps) {
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

const styles = StyleSheet.create({
  message: { gap: space.xs, padding: space.lg, borderRadius: radius.lg, borderWidth: 3 },
  messageDone: { borderColor: colors.fits, backgroundColor: colors.fitsSoft },
  messageRefused: { borderColor: colors.noFit, backgroundColor: colors.noFitSoft },
  detail: { fontFamily: fonts.semibold },
  setWide: { flex: 1, minWidth: 0 },
  setHead: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.sm, flexWrap: 'wrap' },
  strong: { fontFamily: fonts.semibold },
  rinse: { gap: 2, padding: space.sm, borderRadius: radius.md, borderWidth: 1.5 },
  actions: { gap: space.sm },
});

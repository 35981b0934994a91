import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { VerdictChip } from '../fit/verdict';
import { useReceivingChecksQuery } from '../data/receiving';
import type { BoardTubeSet, StandbyInput } from '../data/station-board';
import { formatWhen } from '../ui/format';
import { colors, fonts, minTouch, radius, space, type } from '../theme';
import { Button } from '../ui/button';
import { TextField } from '../ui/text-field';

interface StandbyPanelProps {
  set: BoardTubeSet;
  busy: boolean;
  onConfirm: (input: StandbyInput) => void;
  onCancel: () => void;
  testID: string;
}

/**
 * Which drum the set goes into: a lot recorded at the dock (not on hold), or a lot number typed in, and the
 * drum's serial. A recorded lot links the drum's hardware to the lot's history.
 */
export function StandbyPanel({ set, busy, onConfirm, onCancel, testID }: StandbyPanelProps) {
  const recent = useReceivingChecksQuery({ pageSize: 20 });
  const [picked, setPicked] = useState<string | null>(null);
  const [typed, setTyped] = useState('');
  const [serial, setSerial] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const lots = (recent.data?.items ?? []).filter((r) => r.status !== 'on-hold');

  const confirm = () => {
    if (!picked && !typed.trim()) {
      setProblem('Pick the lot this drum belongs to, or type its lot number.');
      return;
    }
    setProblem(null);
    onConfirm({
      id: set.id,
      version: set.version,
      ...(picked ? { receivingCheckId: picked } : { lotNumber: typed.trim() }),
      ...(serial.trim() ? { drumSerial: serial.trim() } : {}),
    });
  };

  return (
    <View style={styles.panel} testID={testID}>
      <Text role="heading" aria-level={3} style={type.label}>
        {set.label} into the standby drum
      </Text>
      <Text style={type.small}>Lots checked at the dock, newest first (lots on hold are left out).</Text>
      {recent.isPending ? (
        <Text style={type.small}>Loading recent lots…</Text>
      ) : recent.isError ? (
        <View style={styles.row}>
          <Text style={[type.small, { color: colors.danger }]}>Could not load recent lots: {recent.error.message}</Text>
          <Button label="Try again" variant="quiet" onPress={() => recent.refetch()} />
        </View>
      ) : lots.length === 0 ? (
        <Text style={type.small}>No lots recorded at the dock yet: type the lot number below.</Text>
      ) : (
        <View role="radiogroup" aria-label="Lot of the standby drum" style={styles.lots}>
          {lots.map((r) => {
            const on = picked === r.id;
            return (
              <Pressable
                key={r.id}
                role="radio"
                aria-checked={on}
                aria-label={`Lot ${r.lotNumber}`}
                onPress={() => {
                  setPicked(on ? null : r.id);
                  setTyped('');
                }}
                testID={`standby-lot-${r.lotNumber}`}
                style={({ focused }: { pressed: boolean; focused?: boolean }) => [styles.lot, on && styles.lotOn, focused && styles.focusRing]}
              >
                <View style={styles.lotHead}>
                  <Text style={[styles.lotText, on && styles.lotTextOn]}>
                    {on ? '● ' : '○ '}Lot {r.lotNumber}
                  </Text>
                  <VerdictChip verdict={r.verdict} />
                </View>
                <Text style={[type.small, on && { color: colors.onPrimary }]}>
                  {r.drumTypeName ?? 'described drum'} · {formatWhen(r.checkedAt)}
                </Text>
              </Pressable>
            );
          })}
        </View>
      )}
      <TextField
        label="Or type the lot number"
        value={typed}
        onChangeText={(t) => {
          setTyped(t);
          if (t) setPicked(null);
        }}
        autoCapitalize="characters"
        testID={`${testID}-lot-number`}
      />
      <TextField label="Drum serial (optional)" value={serial} onChangeText={setSerial} autoCapitalize="characters" testID={`${testID}-serial`} />
      {problem ? (
        <Text role="alert" style={styles.error}>
          {problem}
        </Text>
      ) : null}
      <View style={styles.row}>
        <Button label="Put into standby drum" busy={busy} onPress={confirm} testID={`${testID}-confirm`} />
        <Button label="Cancel" variant="quiet" onPress={onCancel} testID={`${testID}-cancel`} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: space.sm, padding: space.md, borderRadius: radius.md, borderWidth: 2, borderColor: colors.primary, backgroundColor: colors.paper },
  lots: { gap: space.xs },
  lot: { minHeight: minTouch, justifyContent: 'center', padding: space.sm, borderRadius: radius.md, borderWidth: 1.5, borderColor: colors.inkMuted, backgroundColor: colors.surface, gap: 2 },
  lotOn: { backgroundColor: colors.primary, borderColor: colors.primary },
  lotHead: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.sm, flexWrap: 'wrap' },
  lotText: { fontFamily: fonts.semibold, fontSize: 16, color: colors.ink },
  lotTextOn: { color: colors.onPrimary },
  row: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap', alignItems: 'center' },
  error: { fontFamily: fonts.semibold, fontSize: 15, color: colors.danger },
  focusRing: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: 2 } as object,
});

import { useEffect, useId } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space, type } from '../theme';
import { Button } from '../ui/button';
import { focusNativeId } from '../ui/focus';
import type { Conflict } from './use-record-form';

/** Shown when the save was based on an old version: what the other person changed, and the ways on. */
export function ConflictNotice<R extends { version: number }>({ conflict, onReapply, onTakeTheirs }: { conflict: Conflict<R>; onReapply: () => void; onTakeTheirs: () => void }) {
  const firstId = useId();
  // Move the keyboard (and the page) to the choice the person now has to make.
  useEffect(() => focusNativeId(firstId), [conflict, firstId]);
  return (
    <View style={styles.box} role="alert" testID="form-conflict">
      <Text role="heading" aria-level={2} style={[type.heading, { color: colors.caution }]}>
        Someone else saved this first
      </Text>
      <Text style={type.body}>Your changes are not saved yet. They saved version {conflict.theirs.version} while you were editing.</Text>
      {conflict.rows.length ? (
        <View style={styles.rows} testID="form-conflict-changes">
          <Text style={type.label}>What they changed</Text>
          {conflict.rows.map((r) => (
            <View key={r.key} style={styles.row} testID={`form-conflict-${r.key}`}>
              <Text style={type.label}>{r.label}</Text>
              <Text style={type.body}>
                Theirs: <Text style={styles.strong}>{r.theirs}</Text>
              </Text>
              <Text style={type.body}>
                Yours: <Text style={styles.strong}>{r.mine}</Text>
                {r.both ? ' (you both changed this; re-applying keeps yours)' : ''}
              </Text>
            </View>
          ))}
        </View>
      ) : (
        <Text style={type.body}>Their save changed nothing you can see here (only the version moved on).</Text>
      )}
      <Text style={type.body} testID="form-conflict-yours">
        {conflict.yours.length ? `Re-applying puts back your changes to: ${conflict.yours.join(', ')}.` : 'You had not changed anything yet.'}
      </Text>
      <View style={styles.actions}>
        <Button nativeID={firstId} label="Load their version and re-apply my changes" onPress={onReapply} testID="form-conflict-reapply" />
        <Button label="Load their version, drop mine" variant="secondary" onPress={onTakeTheirs} testID="form-conflict-theirs" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 2, borderColor: colors.caution, backgroundColor: colors.cautionSoft, borderRadius: radius.lg, padding: space.lg, gap: space.md },
  rows: { gap: space.sm },
  row: { backgroundColor: colors.surface, borderRadius: radius.md, padding: space.md, gap: 2 },
  strong: { fontFamily: fonts.semibold },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});

// The open record picker's list of matches, and the picked value's types (re-exported by record-picker.tsx).
import type { UseQueryResult } from '@tanstack/react-query';
import { ActivityIndicator, Pressable, StyleSheet, Text, View } from 'react-native';
import type { Page } from '@/shared/contract/records';
import { colors, fonts, minTouch, radius, space, type } from '../theme';
import { Button } from './button';

/** A picked record as a form keeps it: the value the API takes (an id or a code) and what to show. */
export interface PickedRef {
  id: string;
  label: string;
}

export interface PickerOption {
  /** The value the API takes: an id, or a code for thread specs and key codes. */
  id: string;
  label: string;
  detail?: string;
}

interface MatchesProps<T> {
  label: string;
  noneLabel: string | undefined;
  list: UseQueryResult<Page<T>, Error>;
  toOption: (record: T) => PickerOption;
  value: PickedRef | null;
  q: string;
  onChoose: (record: T | null) => void;
  testID: string;
}

/** The open picker's matches: "none" when allowed, each record a button, then a note. */
export function Matches<T>({ label, noneLabel, list, toOption, value, q, onChoose, testID }: MatchesProps<T>) {
  const items = list.data?.items ?? [];
  return (
    <View role="group" aria-label={`${label} matches`} style={styles.options}>
      {noneLabel !== undefined ? <OptionRow label={noneLabel} detail="None" onPress={() => onChoose(null)} testID={`${testID}-none`} /> : null}
      {items.map((r) => {
        const o = toOption(r);
        return <OptionRow key={o.id} label={o.label} detail={o.detail} selected={value?.id === o.id} onPress={() => onChoose(r)} testID={`${testID}-option-${o.id}`} />;
      })}
      <ListNote list={list} shown={items.length} q={q} />
    </View>
  );
}

/** Under the matches: searching, a failed search with a retry, no match, or how many more there are. */
function ListNote<T>({ list, shown, q }: { list: UseQueryResult<Page<T>, Error>; shown: number; q: string }) {
  if (list.isPending) {
    return (
      <View style={styles.note}>
        <ActivityIndicator color={colors.primary} />
        <Text style={type.small}>Searching…</Text>
      </View>
    );
  }
  if (list.isError) {
    return (
      <View style={styles.note}>
        <Text style={[type.small, { color: colors.danger }]}>Could not search: {list.error.message}</Text>
        <Button label="Try again" variant="quiet" onPress={() => list.refetch()} />
      </View>
    );
  }
  if (shown === 0) return <Text style={[type.small, styles.note]}>{q.trim() ? `Nothing matches "${q.trim()}". Try part of the name or code.` : 'Nothing to choose from yet.'}</Text>;
  if (list.data && list.data.total > shown) {
    return (
      <Text style={[type.small, styles.note]}>
        Showing {shown} of {list.data.total}; type to narrow the list.
      </Text>
    );
  }
  return null;
}

function OptionRow({ label, detail, selected, onPress, testID }: { label: string; detail?: string; selected?: boolean; onPress: () => void; testID: string }) {
  return (
    <Pressable
      role="button"
      aria-label={`Choose ${label}`}
      aria-current={selected ? true : undefined}
      onPress={onPress}
      testID={testID}
      style={({ pressed, focused }: { pressed: boolean; focused?: boolean }) => [styles.option, selected && styles.optionOn, pressed && styles.optionPressed, focused && styles.focusRing]}
    >
      <Text style={styles.optionLabel}>{label}</Text>
      {detail ? <Text style={type.small}>{detail}</Text> : null}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  options: { borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, backgroundColor: colors.surface, overflow: 'hidden' },
  option: { minHeight: minTouch, justifyContent: 'center', paddingHorizontal: space.md, paddingVertical: space.xs, borderBottomWidth: 1, borderBottomColor: colors.line },
  optionOn: { backgroundColor: colors.surfaceSunk },
  optionPressed: { backgroundColor: colors.surfaceSunk },
  optionLabel: { fontFamily: fonts.semibold, fontSize: 16, color: colors.primary },
  focusRing: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: -3 } as object,
  note: { flexDirection: 'row', alignItems: 'center', gap: space.sm, padding: space.md },
});

import type { UseQueryResult } from '@tanstack/react-query';
import { forwardRef, useEffect, useId, useImperativeHandle, useRef, useState } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, Text, TextInput, View } from 'react-native';
import type { ListParams, Page } from '@/shared/contract/records';
import { colors, fonts, minTouch, radius, space, type, field } from '../theme';
import { Button } from './button';
import { focusNativeId } from './focus';

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

interface ListSource<T> {
  useList: (params: ListParams, options?: { enabled?: boolean }) => UseQueryResult<Page<T>, Error>;
}

interface RecordPickerProps<T> {
  label: string;
  hint?: string;
  /** The resource's query module (components/data/<resource>.ts); searched with ?q=. */
  source: ListSource<T>;
  toOption: (record: T) => PickerOption;
  value: PickedRef | null;
  onChange: (picked: PickedRef | null, record: T | null) => void;
  /** When set, "none" is a valid choice and is shown with this label (e.g. "No key"). */
  noneLabel?: string;
  /** Extra list filters, e.g. { thread: 'NPS-2' }. */
  filter?: Omit<ListParams, 'q' | 'page' | 'pageSize'>;
  error?: string | null;
  onBlur?: () => void;
  testID: string;
  disabled?: boolean;
}

export interface RecordPickerHandle {
  focus: () => void;
}

const PAGE = 8;

function useDebounced<T>(value: T, ms: number): T {
  const [v, setV] = useState(value);
  useEffect(() => {
    const t = setTimeout(() => setV(value), ms);
    return () => clearTimeout(t);
  }, [value, ms]);
  return v;
}

/**
 * A searchable pick of one record from the API's list endpoint. Closed, it shows the choice and a Change
 * button; open, a search box and up to eight matches, each a button (Tab to it, Enter to choose).
 */
function RecordPickerInner<T>(
  { label, hint, source, toOption, value, onChange, noneLabel, filter, error, onBlur, testID, disabled }: RecordPickerProps<T>,
  ref: React.ForwardedRef<RecordPickerHandle>,
) {
  const id = useId();
  const hasChoice = value !== null || noneLabel !== undefined;
  const [open, setOpen] = useState(!hasChoice);
  // Matches are listed once the person starts on the search, so an untouched form stays short.
  const [listing, setListing] = useState(false);
  const [q, setQ] = useState('');
  const query = useDebounced(q, 200);
  const list = source.useList({ q: query.trim() || undefined, pageSize: PAGE, ...filter }, { enabled: open && listing && !disabled });
  const inputRef = useRef<TextInput>(null);
  const changeId = `${id}-change`;
  const focusChange = useRef(false);

  useImperativeHandle(ref, () => ({ focus: () => (open ? inputRef.current?.focus() : focusNativeId(changeId)) }), [open, changeId]);

  // After a choice the search box goes away; keep the keyboard where the person was.
  useEffect(() => {
    if (!open && focusChange.current) {
      focusChange.current = false;
      focusNativeId(changeId);
    }
  }, [open, changeId]);

  // A value set from outside (a record loaded for editing) closes the search.
  useEffect(() => {
    if (value !== null) setOpen(false);
  }, [value]);

  const choose = (record: T | null) => {
    const option = record ? toOption(record) : null;
    focusChange.current = true;
    setOpen(false);
    setListing(false);
    setQ('');
    onChange(option ? { id: option.id, label: option.label } : null, record);
    onBlur?.();
  };

  const keep = () => {
    focusChange.current = true;
    setOpen(false);
    setListing(false);
    setQ('');
  };

  const items = list.data?.items ?? [];
  // Enter takes the first match only once the list answers what was typed, never a stale one.
  const current = q.trim() === query.trim() && !list.isPlaceholderData && !list.isFetching;
  return (
    <View style={styles.wrap} testID={testID}>
      <Text nativeID={`${id}-label`} style={type.label}>
        {label}
      </Text>
      {hint ? <Text style={type.small}>{hint}</Text> : null}
      {!open ? (
        <View style={[styles.chosen, error ? styles.chosenError : null]}>
          <Text style={[type.body, styles.chosenText]} testID={`${testID}-selected`}>
            {value ? value.label : noneLabel}
          </Text>
          {!disabled ? (
            <Button
              nativeID={changeId}
              label="Change"
              variant="secondary"
              accessibilityLabel={`Change ${label.toLowerCase()}`}
              onPress={() => {
                setOpen(true);
                setTimeout(() => inputRef.current?.focus(), 0);
              }}
              testID={`${testID}-change`}
            />
          ) : null}
        </View>
      ) : (
        <View style={styles.panel}>
          <View style={styles.searchRow}>
            <TextInput
              ref={inputRef}
              testID={`${testID}-search`}
              aria-label={`Search ${label.toLowerCase()}`}
              placeholder={`Search ${label.toLowerCase()}`}
              placeholderTextColor={colors.inkMuted}
              value={q}
              onChangeText={(text) => {
                setQ(text);
                setListing(true);
              }}
              onFocus={() => setListing(true)}
              onKeyPress={(e) => {
                if (e.nativeEvent.key === 'Escape') setListing(false);
              }}
              onSubmitEditing={() => (current && items[0] ? choose(items[0]) : undefined)}
              autoCapitalize="none"
              autoCorrect={false}
              style={[styles.input, error ? styles.inputError : null]}
            />
            {hasChoice ? <Button label="Keep" variant="quiet" accessibilityLabel={`Keep the current ${label.toLowerCase()}`} onPress={keep} testID={`${testID}-keep`} /> : null}
          </View>
          {listing ? (
            <View role="group" aria-label={`${label} matches`} style={styles.options}>
              {noneLabel !== undefined ? <OptionRow label={noneLabel} detail="None" onPress={() => choose(null)} testID={`${testID}-none`} /> : null}
              {items.map((r) => {
                const o = toOption(r);
                return <OptionRow key={o.id} label={o.label} detail={o.detail} selected={value?.id === o.id} onPress={() => choose(r)} testID={`${testID}-option-${o.id}`} />;
              })}
              {list.isPending ? (
                <View style={styles.note}>
                  <ActivityIndicator color={colors.primary} />
                  <Text style={type.small}>Searching…</Text>
                </View>
              ) : list.isError ? (
                <View style={styles.note}>
                  <Text style={[type.small, { color: colors.danger }]}>Could not search: {list.error.message}</Text>
                  <Button label="Try again" variant="quiet" onPress={() => list.refetch()} />
                </View>
              ) : items.length === 0 ? (
                <Text style={[type.small, styles.note]}>{q.trim() ? `Nothing matches "${q.trim()}". Try part of the name or code.` : 'Nothing to choose from yet.'}</Text>
              ) : list.data && list.data.total > items.length ? (
                <Text style={[type.small, styles.note]}>
                  Showing {items.length} of {list.data.total}; type to narrow the list.
                </Text>
              ) : null}
            </View>
          ) : null}
        </View>
      )}
      {error ? (
        <Text role="alert" testID={`${testID}-error`} style={styles.error}>
          {error}
        </Text>
      ) : null}
    </View>
  );
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

export const RecordPicker = forwardRef(RecordPickerInner) as <T>(props: RecordPickerProps<T> & { ref?: React.Ref<RecordPickerHandle> }) => React.ReactElement;

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  chosen: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.sm,
    minHeight: minTouch,
    paddingLeft: space.md,
    paddingRight: space.xs,
    paddingVertical: space.xs,
    borderWidth: 1.5,
    borderColor: colors.line,
    borderRadius: radius.md,
    backgroundColor: colors.surfaceSunk,
  },
  chosenError: { borderColor: colors.danger, borderWidth: 2 },
  chosenText: { flex: 1, fontFamily: fonts.semibold },
  panel: { gap: space.xs },
  searchRow: { flexDirection: 'row', gap: space.sm, alignItems: 'center' },
  input: { ...field.input, flex: 1, minWidth: 0 },
  inputError: field.inputError,
  options: { borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, backgroundColor: colors.surface, overflow: 'hidden' },
  option: { minHeight: minTouch, justifyContent: 'center', paddingHorizontal: space.md, paddingVertical: space.xs, borderBottomWidth: 1, borderBottomColor: colors.line },
  optionOn: { backgroundColor: colors.surfaceSunk },
  optionPressed: { backgroundColor: colors.surfaceSunk },
  optionLabel: { fontFamily: fonts.semibold, fontSize: 16, color: colors.primary },
  focusRing: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: -3 } as object,
  note: { flexDirection: 'row', alignItems: 'center', gap: space.sm, padding: space.md },
  error: field.error,
});

import type { UseQueryResult } from '@tanstack/react-query';
import { forwardRef, useEffect, useId, useImperativeHandle, useRef, useState } from 'react';
import { StyleSheet, Text, TextInput, View } from 'react-native';
import type { ListParams, Page } from '@/shared/contract/records';
import { colors, fonts, minTouch, radius, space, type, field } from '../theme';
import { Button } from './button';
import { focusNativeId } from './focus';
import { Matches, type PickedRef, type PickerOption } from './record-picker-matches';

export type { PickedRef, PickerOption } from './record-picker-matches';

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
 * Where the keyboard goes: to the search when asked to focus while open, else to Change, and back to
 * Change after a choice (the search box it was in goes away).
 */
function usePickerFocus(ref: React.ForwardedRef<RecordPickerHandle>, open: boolean, changeId: string) {
  const inputRef = useRef<TextInput>(null);
  const focusChange = useRef(false);
  useImperativeHandle(ref, () => ({ focus: () => (open ? inputRef.current?.focus() : focusNativeId(changeId)) }), [open, changeId]);
  useEffect(() => {
    if (!open && focusChange.current) {
      focusChange.current = false;
      focusNativeId(changeId);
    }
  }, [open, changeId]);
  return {
    inputRef,
    focusChangeOnClose: () => {
      focusChange.current = true;
    },
  };
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
  const changeId = `${id}-change`;
  const { inputRef, focusChangeOnClose } = usePickerFocus(ref, open, changeId);

  // A value set from outside (a record loaded for editing) closes the search.
  useEffect(() => {
    if (value !== null) setOpen(false);
  }, [value]);

  // Closing the search ("Keep", or after a choice) moves the keyboard to the Change button.
  const keep = () => {
    focusChangeOnClose();
    setOpen(false);
    setListing(false);
    setQ('');
  };

  const choose = (record: T | null) => {
    const option = record ? toOption(record) : null;
    keep();
    onChange(option ? { id: option.id, label: option.label } : null, record);
    onBlur?.();
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
        <ChosenRow
          text={value ? value.label : noneLabel}
          label={label}
          changeId={changeId}
          error={!!error}
          disabled={disabled}
          onChange={() => {
            setOpen(true);
            setTimeout(() => inputRef.current?.focus(), 0);
          }}
          testID={testID}
        />
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
          {listing ? <Matches label={label} noneLabel={noneLabel} list={list} toOption={toOption} value={value} q={q} onChoose={choose} testID={testID} /> : null}
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

interface ChosenRowProps {
  text: string | undefined;
  label: string;
  changeId: string;
  error: boolean;
  disabled: boolean | undefined;
  onChange: () => void;
  testID: string;
}

/** The closed picker: the choice, and the Change button that opens the search. */
function ChosenRow({ text, label, changeId, error, disabled, onChange, testID }: ChosenRowProps) {
  return (
    <View style={[styles.chosen, error ? styles.chosenError : null]}>
      <Text style={[type.body, styles.chosenText]} testID={`${testID}-selected`}>
        {text}
      </Text>
      {!disabled ? <Button nativeID={changeId} label="Change" variant="secondary" accessibilityLabel={`Change ${label.toLowerCase()}`} onPress={onChange} testID={`${testID}-change`} /> : null}
    </View>
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
  error: field.error,
});

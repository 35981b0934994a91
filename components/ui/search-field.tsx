import { useEffect, useLayoutEffect, useRef, useState } from 'react';
import { Pressable, StyleSheet, Text, TextInput, View } from 'react-native';
import { colors, fonts, minTouch, radius, space, type } from '../theme';

interface SearchFieldProps {
  label: string;
  /** The search the list is using now; the field follows it when it changes from outside (a "clear" elsewhere). */
  value: string;
  /** Called once typing pauses for `delayMs`, and at once on Enter or clear. */
  onSearch: (q: string) => void;
  placeholder?: string;
  delayMs?: number;
  testID?: string;
}

/** A labelled search box that asks the server only after typing pauses. */
export function SearchField({ label, value, onSearch, placeholder, delayMs = 300, testID }: SearchFieldProps) {
  const [text, setText] = useState(value);
  const [focused, setFocused] = useState(false);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const latest = useRef(onSearch);
  useLayoutEffect(() => {
    latest.current = onSearch;
  });

  // Follow a change made elsewhere (a "Clear the search" button), but not the echo of our own commit,
  // which is trimmed: the space just typed between two words must stay.
  useEffect(() => setText((t) => (t.trim() === value ? t : value)), [value]);
  useEffect(() => () => (timer.current ? clearTimeout(timer.current) : undefined), []);

  const commit = (next: string, delay: number) => {
    if (timer.current) clearTimeout(timer.current);
    if (delay === 0) latest.current(next.trim());
    else timer.current = setTimeout(() => latest.current(next.trim()), delay);
  };

  return (
    <View style={styles.wrap}>
      <Text style={type.label}>{label}</Text>
      <View style={[styles.box, focused && styles.boxFocused]}>
        <Text style={styles.glyph} aria-hidden>
          ⌕
        </Text>
        <TextInput
          testID={testID}
          aria-label={label}
          role="searchbox"
          value={text}
          placeholder={placeholder}
          placeholderTextColor={colors.inkMuted}
          autoCapitalize="none"
          autoCorrect={false}
          enterKeyHint="search"
          onChangeText={(t) => {
            setText(t);
            commit(t, delayMs);
          }}
          onSubmitEditing={() => commit(text, 0)}
          onFocus={() => setFocused(true)}
          onBlur={() => setFocused(false)}
          style={styles.input}
        />
        {text ? (
          <Pressable
            role="button"
            aria-label={`Clear ${label.toLowerCase()}`}
            testID={testID ? `${testID}-clear` : undefined}
            onPress={() => {
              setText('');
              commit('', 0);
            }}
            style={({ focused: f }: { pressed: boolean; focused?: boolean }) => [styles.clear, f && styles.clearFocused]}
          >
            <Text style={styles.clearText}>Clear</Text>
          </Pressable>
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  box: {
    flexDirection: 'row',
    alignItems: 'center',
    minHeight: minTouch,
    borderWidth: 1.5,
    borderColor: colors.inkMuted,
    borderRadius: radius.md,
    backgroundColor: colors.surface,
    paddingLeft: space.md,
  },
  // The input's own outline is kept off; the whole box shows focus instead.
  boxFocused: { borderColor: colors.focus, borderWidth: 2, outlineColor: colors.focus, outlineWidth: 1, outlineStyle: 'solid' } as object,
  glyph: { fontFamily: fonts.semibold, fontSize: 18, color: colors.inkMuted, marginRight: space.sm },
  input: { flex: 1, minHeight: minTouch - 4, fontFamily: fonts.regular, fontSize: 17, color: colors.ink, outlineStyle: 'none', minWidth: 0 } as object,
  clear: { minHeight: minTouch - 4, minWidth: minTouch, paddingHorizontal: space.md, justifyContent: 'center', alignItems: 'center', borderRadius: radius.sm },
  clearFocused: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid' } as object,
  clearText: { fontFamily: fonts.semibold, fontSize: 15, color: colors.primary },
});

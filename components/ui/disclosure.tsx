import { useState, type ReactNode } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, minTouch, radius, space } from '../theme';

/** A titled section that opens and closes; `initiallyOpen` decides how it starts (e.g. open on a wide screen). */
export function Disclosure({ title, initiallyOpen, children, testID }: { title: string; initiallyOpen: boolean; children: ReactNode; testID?: string }) {
  const [open, setOpen] = useState(initiallyOpen);
  return (
    <View style={styles.wrap} testID={testID}>
      <Pressable accessibilityRole="button" aria-expanded={open} onPress={() => setOpen((o) => !o)} style={styles.head} testID={testID ? `${testID}-toggle` : undefined}>
        <Text style={styles.mark} aria-hidden>
          {open ? '▾' : '▸'}
        </Text>
        <Text style={styles.title}>{title}</Text>
      </Pressable>
      {open ? <View style={styles.body}>{children}</View> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  head: {
    minHeight: minTouch,
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.sm,
    paddingHorizontal: space.md,
    borderRadius: radius.md,
    borderWidth: 1.5,
    borderColor: colors.line,
    backgroundColor: colors.surface,
  },
  mark: { fontFamily: fonts.bold, fontSize: 18, color: colors.primary, width: 18 },
  title: { fontFamily: fonts.semibold, fontSize: 17, color: colors.primary, flex: 1 },
  body: { gap: space.lg },
});

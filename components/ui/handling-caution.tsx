import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { handlingCautions } from '@/shared/fit/handling';
import { colors, fonts, minTouch, radius, space, type } from '../theme';

const SHORT: Record<string, string> = { ppe: 'PPE', sds: 'safety data sheet', spills: 'spills', pressure: 'pressure', codes: 'local codes' };

/**
 * The chemical-handling caution, once per screen and compact: one line naming the topics, the full text a
 * tap away. The words come from the shared list, the same the server returns with a fit check.
 */
export function HandlingCaution({ pressurised = false, items }: { pressurised?: boolean; items?: Array<{ topic: string; message: string }> }) {
  const [open, setOpen] = useState(false);
  const list = items ?? handlingCautions({ handlesSlurry: true, pressurised });
  const topics = list.map((c) => SHORT[c.topic] ?? c.topic).join(', ');
  return (
    <View style={styles.box} role="note" aria-label="Handling cautions" testID="handling-caution">
      <Pressable accessibilityRole="button" aria-expanded={open} onPress={() => setOpen((o) => !o)} style={styles.head} testID="handling-caution-toggle">
        <Text style={styles.mark} aria-hidden>
          !
        </Text>
        <Text style={[type.label, styles.grow]}>Before you touch the drum: {topics}</Text>
        <Text style={styles.more}>{open ? 'Hide' : 'Read'}</Text>
      </Pressable>
      {open
        ? list.map((c) => (
            <Text key={c.topic} style={type.body} testID={`handling-caution-${c.topic}`}>
              • {c.message}
            </Text>
          ))
        : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderLeftWidth: 4, borderLeftColor: colors.caution, backgroundColor: colors.surface, borderRadius: radius.md, paddingHorizontal: space.md, paddingBottom: space.xs, gap: space.xs },
  head: { minHeight: minTouch, flexDirection: 'row', alignItems: 'center', gap: space.sm },
  mark: { fontFamily: fonts.bold, fontSize: 18, color: colors.caution, width: 16, textAlign: 'center' },
  grow: { flex: 1 },
  more: { fontFamily: fonts.semibold, fontSize: 15, color: colors.primary, textDecorationLine: 'underline' },
});

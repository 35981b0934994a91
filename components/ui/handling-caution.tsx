import { StyleSheet, Text, View } from 'react-native';
import { handlingCautions } from '@/shared/fit/handling';
import { colors, radius, space, type } from '../theme';

/**
 * The chemical-handling caution shown on the dock check and station screens. The words come from the
 * shared list, the same the server returns with a fit check.
 */
export function HandlingCaution({ pressurised = false, items }: { pressurised?: boolean; items?: Array<{ topic: string; message: string }> }) {
  const list = items ?? handlingCautions({ handlesSlurry: true, pressurised });
  return (
    <View style={styles.box} role="note" aria-label="Handling cautions" testID="handling-caution">
      <Text style={type.label}>Before you touch the drum</Text>
      {list.map((c) => (
        <Text key={c.topic} style={type.body}>
          • {c.message}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderLeftWidth: 4, borderLeftColor: colors.caution, backgroundColor: colors.surface, borderRadius: radius.md, padding: space.md, gap: space.xs },
});

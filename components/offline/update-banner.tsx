import { StyleSheet, Text, View } from 'react-native';
import { Button } from '../ui/button';
import { colors, space, type } from '../theme';

/** Shown when a new version has been installed in the background: reloading now is the person's choice. */
export function UpdateBanner({ onReload }: { onReload: () => void }) {
  return (
    <View style={styles.bar} role="status" testID="update-ready">
      <Text style={styles.text}>A new version of Bungwise is ready.</Text>
      <Button label="Reload" variant="secondary" onPress={onReload} testID="update-reload" />
    </View>
  );
}

const styles = StyleSheet.create({
  bar: {
    position: 'absolute',
    top: space.sm,
    left: space.sm,
    right: space.sm,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: space.md,
    padding: space.md,
    borderRadius: 8,
    backgroundColor: colors.surface,
    borderWidth: 1.5,
    borderColor: colors.primary,
  },
  text: { ...type.body, flexShrink: 1 },
});

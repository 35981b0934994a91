import { StyleSheet, Text, View } from 'react-native';
import { colors, fonts, space, type } from '../theme';
import { Button } from './button';

/** A choice saved as soon as it is made: where its save stands. */
export interface SaveState {
  saving: boolean;
  saved: boolean;
  error: Error | null;
  retry: () => void;
}

/**
 * Under a setting saved at once: "Saving…", then "Saved." (announced politely), or the failure with a retry.
 * Test ids: `<testID>-status`, `<testID>-error`, `<testID>-retry`.
 */
export function SaveStatus({ state, testID }: { state: SaveState; testID: string }) {
  if (state.error) {
    return (
      <View role="alert" style={styles.problem} testID={`${testID}-error`}>
        <Text style={styles.error}>Not saved: {state.error.message}</Text>
        <Button label="Try again" variant="secondary" onPress={state.retry} testID={`${testID}-retry`} />
      </View>
    );
  }
  return (
    <Text style={[type.small, state.saved && !state.saving && styles.saved]} aria-live="polite" testID={`${testID}-status`}>
      {state.saving ? 'Saving…' : state.saved ? 'Saved.' : ' '}
    </Text>
  );
}

const styles = StyleSheet.create({
  problem: { gap: space.sm, alignItems: 'flex-start' },
  error: { fontFamily: fonts.semibold, fontSize: 15, color: colors.danger },
  saved: { color: colors.fits, fontFamily: fonts.semibold },
});

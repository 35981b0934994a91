import { ActivityIndicator, StyleSheet, Text, View } from 'react-native';
import { ApiError } from '../api/client';
import { useOnline } from '../offline/use-online';
import { colors, radius, space, type } from '../theme';
import { Button } from './button';

export function LoadingState({ label = 'Loading…' }: { label?: string }) {
  // With the server out of reach, queries wait (TanStack Query pauses them): say so instead of spinning.
  const online = useOnline();
  if (!online) {
    return (
      <View style={styles.box} accessibilityLiveRegion="polite" testID="state-waiting-network">
        <Text style={type.label}>Waiting for the network</Text>
        <Text style={type.body}>This fills in as soon as the server can be reached again.</Text>
      </View>
    );
  }
  return (
    <View style={styles.box} accessibilityLiveRegion="polite" testID="state-loading">
      <ActivityIndicator color={colors.primary} />
      <Text style={type.body}>{label}</Text>
    </View>
  );
}

export function ErrorState({ error, onRetry }: { error: unknown; onRetry?: () => void }) {
  const message = error instanceof ApiError || error instanceof Error ? error.message : 'Something went wrong.';
  return (
    <View style={[styles.box, styles.error]} role="alert" testID="state-error">
      <Text style={[type.label, { color: colors.danger }]}>Could not load this</Text>
      <Text style={type.body}>{message}</Text>
      {onRetry ? <Button label="Try again" variant="secondary" onPress={onRetry} /> : null}
    </View>
  );
}

export function EmptyState({ title, next, action }: { title: string; next: string; action?: { label: string; onPress: () => void } }) {
  return (
    <View style={styles.box} testID="state-empty">
      <Text style={type.label}>{title}</Text>
      <Text style={type.body}>{next}</Text>
      {action ? <Button label={action.label} onPress={action.onPress} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    gap: space.sm,
    padding: space.lg,
    borderRadius: radius.md,
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.line,
    alignItems: 'flex-start',
  },
  error: { backgroundColor: colors.dangerSoft, borderColor: colors.danger },
});

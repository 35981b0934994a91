import { StyleSheet, Text } from 'react-native';
import { field, type } from '../theme';

/** A field's label (named by `nativeID` for the input) and its hint. */
export function FieldHead({ nativeID, label, hint }: { nativeID?: string; label: string; hint?: string }) {
  return (
    <>
      <Text nativeID={nativeID} style={type.label}>
        {label}
      </Text>
      {hint ? <Text style={type.small}>{hint}</Text> : null}
    </>
  );
}

/** A field's message, announced when it appears; its test id is the field's with `-error`. */
export function FieldMessage({ error, nativeID, fieldTestID }: { error?: string | null; nativeID?: string; fieldTestID?: string }) {
  if (!error) return null;
  return (
    <Text nativeID={nativeID} role="alert" testID={fieldTestID ? `${fieldTestID}-error` : undefined} style={styles.error}>
      {error}
    </Text>
  );
}

const styles = StyleSheet.create({
  error: field.error,
});

import { forwardRef, useId } from 'react';
import { StyleSheet, Text, TextInput, View, type TextInputProps } from 'react-native';
import { colors, space, type, field } from '../theme';

interface TextFieldProps extends Omit<TextInputProps, 'style'> {
  label: string;
  error?: string | null;
  hint?: string;
}

/** A labelled input with its hint and its field-level message; the message is announced when it appears. */
export const TextField = forwardRef<TextInput, TextFieldProps>(function TextField({ label, error, hint, testID, ...rest }, ref) {
  const id = useId();
  const messageId = `${id}-msg`;
  return (
    <View style={styles.wrap}>
      <Text nativeID={`${id}-label`} style={type.label}>
        {label}
      </Text>
      {hint ? <Text style={type.small}>{hint}</Text> : null}
      <TextInput
        ref={ref}
        testID={testID}
        aria-label={label}
        aria-invalid={!!error}
        aria-describedby={error ? messageId : undefined}
        placeholderTextColor={colors.inkMuted}
        style={[styles.input, error ? styles.inputError : null]}
        {...rest}
      />
      {error ? (
        <Text nativeID={messageId} role="alert" testID={testID ? `${testID}-error` : undefined} style={styles.error}>
          {error}
        </Text>
      ) : null}
    </View>
  );
});

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  input: field.input,
  inputError: field.inputError,
  error: field.error,
});

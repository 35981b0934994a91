import { forwardRef, useId } from 'react';
import { StyleSheet, TextInput, View, type TextInputProps } from 'react-native';
import { colors, space, field } from '../theme';
import { FieldHead, FieldMessage } from './field-parts';

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
      <FieldHead nativeID={`${id}-label`} label={label} hint={hint} />
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
      <FieldMessage error={error} nativeID={messageId} fieldTestID={testID} />
    </View>
  );
});

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  input: field.input,
  inputError: field.inputError,
});

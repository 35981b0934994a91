import { useRouter } from 'expo-router';
import { useState } from 'react';
import { RESET_LINK_MINUTES } from '@/shared/passwords';
import { useForgotPasswordMutation } from '../data/passwords';
import { Button } from '../ui/button';
import { TextField } from '../ui/text-field';
import { AuthFrame, DoneFrame, FormMessage } from './auth-frame';
import { emailProblem } from './email';

/** "Forgot password?": asks for the address and sends a link; the answer is the same whoever the address belongs to. */
export function ForgotPasswordScreen() {
  const router = useRouter();
  const send = useForgotPasswordMutation();
  const [email, setEmail] = useState('');
  const [fieldError, setFieldError] = useState<string | null>(null);

  const submit = () => {
    if (send.isPending) return;
    const problem = emailProblem(email);
    setFieldError(problem);
    if (!problem) send.mutate(email.trim());
  };

  if (send.isSuccess) return <DoneFrame title="Check your mail" message={send.data.message} testID="forgot" signIn={{ label: 'Back to sign-in', testID: 'forgot-back' }} />;
  return (
    <AuthFrame
      title="Forgot your password?"
      lead={`Enter your work e-mail. We send it a link to choose a new password; the link works once, for ${RESET_LINK_MINUTES} minutes.`}
      testID="forgot-screen"
    >
      <TextField
        label="Work e-mail"
        value={email}
        onChangeText={setEmail}
        error={fieldError}
        autoCapitalize="none"
        autoComplete="email"
        inputMode="email"
        returnKeyType="send"
        onSubmitEditing={submit}
        testID="forgot-email"
      />
      {/* Too many requests, or no connection: the server's own words. */}
      {send.isError && !fieldError ? (
        <FormMessage kind="problem" testID="forgot-message">
          {send.error.message}
        </FormMessage>
      ) : null}
      <Button label={send.isPending ? 'Sending…' : 'Send the link'} onPress={submit} busy={send.isPending} testID="forgot-submit" />
      <Button label="Back to sign-in" variant="quiet" onPress={() => router.replace('/sign-in')} testID="forgot-back" />
    </AuthFrame>
  );
}

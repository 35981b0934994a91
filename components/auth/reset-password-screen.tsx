import { useRouter } from 'expo-router';
import { RESET_LINK_MINUTES } from '@/shared/passwords';
import { useSession } from '../session';
import { useResetPasswordMutation } from '../data/passwords';
import { Button } from '../ui/button';
import { AuthFrame, DoneFrame, FormMessage } from './auth-frame';
import { NewPasswordFields } from './new-password-fields';
import { useResetToken } from './reset-token';
import { useNewPassword } from './use-new-password';

/** Opened from the e-mailed link: choose a new password, then sign in with it. */
export function ResetPasswordScreen() {
  const router = useRouter();
  const token = useResetToken();
  const { session, end } = useSession();
  const reset = useResetPasswordMutation();
  const form = useNewPassword();

  const submit = () => {
    if (reset.isPending || !token || !form.check()) return;
    reset.mutate(
      { token, newPassword: form.newPassword },
      {
        onSuccess: () => {
          form.clear();
          // The server has ended every session of this person; one kept in this browser is of no use now.
          if (session) end();
        },
        onError: form.fail,
      },
    );
  };
  const askAgain = <Button label="Ask for a new link" variant="secondary" onPress={() => router.replace('/forgot-password')} testID="reset-ask-again" />;

  if (!token) {
    return (
      <AuthFrame title="Choose a new password" testID="reset-screen">
        <FormMessage kind="problem" testID="reset-message">
          This page opens from the link in the reset mail, and this address has no link in it. Open the link from the mail again, or ask for a new one.
        </FormMessage>
        {askAgain}
      </AuthFrame>
    );
  }
  if (reset.isSuccess) return <DoneFrame title="New password set" message={reset.data.message} testID="reset" signIn={{ label: 'Sign in', testID: 'reset-sign-in' }} />;
  return (
    <AuthFrame title="Choose a new password" lead="Everywhere you are signed in, you will be signed out; then sign in with the new password." testID="reset-screen">
      <NewPasswordFields form={form} onSubmit={submit} testID="reset" />
      {form.errors.token ? (
        <FormMessage kind="problem" testID="reset-message">
          {form.errors.token} Ask for a new link; each one works once, for {RESET_LINK_MINUTES} minutes.
        </FormMessage>
      ) : form.formError ? (
        <FormMessage kind="problem" testID="reset-message">
          {form.formError}
        </FormMessage>
      ) : null}
      <Button label={reset.isPending ? 'Saving…' : 'Set the new password'} onPress={submit} busy={reset.isPending} testID="reset-submit" />
      {form.errors.token ? askAgain : null}
    </AuthFrame>
  );
}

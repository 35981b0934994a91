import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useChangePasswordMutation } from '../data/passwords';
import { Screen } from '../screen';
import { useSession } from '../session';
import { space } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { TextField } from '../ui/text-field';
import { AuthFrame, FormMessage } from './auth-frame';
import { NewPasswordFields } from './new-password-fields';
import { PASSWORD_LABELS, useNewPassword } from './use-new-password';

const OTHERS_END = 'Wherever else you are signed in (another phone, a shared screen) you will be signed out.';

/**
 * The person's own password change. With a temporary password (an account made or reset by an administrator) it
 * is the only screen open, in the signed-out card with a way to sign out; otherwise a page of the app.
 */
export function ChangePasswordScreen() {
  const router = useRouter();
  const { session, end } = useSession();
  const forced = !!session?.user.mustChangePassword;
  const change = useChangePasswordMutation();
  const labels = { ...PASSWORD_LABELS, currentPassword: forced ? 'Temporary password' : PASSWORD_LABELS.currentPassword };
  const form = useNewPassword(labels);
  const [current, setCurrent] = useState('');
  const [done, setDone] = useState(false);

  const submit = () => {
    if (change.isPending) return;
    setDone(false);
    if (!form.check(current ? {} : { currentPassword: `Enter your ${labels.currentPassword.toLowerCase()}.` })) return;
    change.mutate(
      { currentPassword: current, newPassword: form.newPassword },
      {
        onSuccess: () => {
          setCurrent('');
          form.clear();
          if (forced) router.replace('/');
          else setDone(true);
        },
        onError: form.fail,
      },
    );
  };

  const fields = (
    <>
      <TextField
        label={labels.currentPassword}
        hint={forced ? 'The one you signed in with.' : undefined}
        value={current}
        onChangeText={setCurrent}
        error={form.errors.currentPassword}
        secureTextEntry={!form.shown}
        autoCapitalize="none"
        autoComplete="current-password"
        testID="password-current"
      />
      <NewPasswordFields form={form} onSubmit={submit} testID="password" />
      {form.formError ? (
        <FormMessage kind="problem" testID="password-message">
          {form.formError}
        </FormMessage>
      ) : null}
      {done ? (
        <FormMessage kind="done" testID="password-done">
          Password changed. You stay signed in here; everywhere else you were signed out.
        </FormMessage>
      ) : null}
      <Button label={change.isPending ? 'Saving…' : 'Change password'} onPress={submit} busy={change.isPending} testID="password-submit" />
    </>
  );

  if (forced) {
    return (
      <AuthFrame
        title="Choose your own password"
        lead={`Your account has a temporary password from an administrator. Choose one only you know before you go on. ${OTHERS_END}`}
        testID="password-screen"
      >
        {fields}
        <Button label="Sign out" variant="secondary" onPress={end} testID="password-sign-out" />
      </AuthFrame>
    );
  }
  return (
    <Screen title="Change your password" subtitle={OTHERS_END} testID="password-screen">
      <View style={styles.column}>
        <Card style={styles.card}>{fields}</Card>
        <Button label="Back to notices and settings" variant="quiet" onPress={() => router.push('/notices')} testID="password-back" />
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  // A form of three fields reads better narrow, also on a wide screen.
  column: { width: '100%', maxWidth: 520, gap: space.md },
  card: { gap: space.lg },
});

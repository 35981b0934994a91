import { useRouter } from 'expo-router';
import { useRef, useState } from 'react';
import { TextInput } from 'react-native';
import { ApiError } from '../api/client';
import { useSignInMutation } from '../data/session';
import { useSession } from '../session';
import { Button } from '../ui/button';
import { TextField } from '../ui/text-field';
import { AuthFrame, FormMessage } from './auth-frame';
import { emailProblem } from './email';

type Fields = { email?: string; password?: string };

function checkFields(email: string, password: string): Fields {
  const problems: Fields = {};
  const bad = emailProblem(email);
  if (bad) problems.email = bad;
  if (!password) problems.password = 'Enter your password.';
  return problems;
}

export function SignInScreen() {
  const router = useRouter();
  const { begin } = useSession();
  const signIn = useSignInMutation();
  const passwordRef = useRef<TextInput>(null);
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [fieldErrors, setFieldErrors] = useState<Fields>({});
  const [formError, setFormError] = useState<string | null>(null);

  const submit = () => {
    const problems = checkFields(email, password);
    setFieldErrors(problems);
    setFormError(null);
    if (problems.email || problems.password) return;
    signIn.mutate(
      { email: email.trim(), password },
      {
        onSuccess: (result) => {
          begin(result);
          // A temporary password: the signed-in layout sends the person to the change first.
          router.replace(result.user.mustChangePassword ? '/password' : '/');
        },
        onError: (err) => {
          if (err instanceof ApiError && err.status === 400) setFieldErrors(err.fieldMessages());
          setFormError(err.message);
        },
      },
    );
  };

  return (
    <AuthFrame title="Sign in" lead="Check incoming drums against the site's dip tubes and dispense heads.">
      <TextField
        label="Work e-mail"
        testID="sign-in-email"
        value={email}
        onChangeText={setEmail}
        error={fieldErrors.email}
        autoCapitalize="none"
        autoComplete="email"
        inputMode="email"
        returnKeyType="next"
        onSubmitEditing={() => passwordRef.current?.focus()}
      />
      <TextField
        ref={passwordRef}
        label="Password"
        testID="sign-in-password"
        value={password}
        onChangeText={setPassword}
        error={fieldErrors.password}
        secureTextEntry
        autoComplete="current-password"
        returnKeyType="go"
        onSubmitEditing={submit}
      />
      {formError ? (
        <FormMessage kind="problem" testID="sign-in-message">
          {formError}
        </FormMessage>
      ) : null}
      <Button label="Sign in" testID="sign-in-submit" onPress={submit} busy={signIn.isPending} />
      <Button label="Forgot password?" variant="quiet" testID="sign-in-forgot" onPress={() => router.push('/forgot-password')} />
    </AuthFrame>
  );
}

import { useRouter } from 'expo-router';
import { useRef, useState } from 'react';
import { KeyboardAvoidingView, ScrollView, StyleSheet, Text, TextInput, View } from 'react-native';
import { ApiError } from '../api/client';
import { useSignInMutation } from '../data/session';
import { useSession } from '../session';
import { colors, radius, space, type } from '../theme';
import { Button } from '../ui/button';
import { Logo } from '../ui/logo';
import { TextField } from '../ui/text-field';

type Fields = { email?: string; password?: string };

function checkFields(email: string, password: string): Fields {
  const problems: Fields = {};
  if (!email.trim()) problems.email = 'Enter your work e-mail address.';
  else if (!/^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(email.trim())) problems.email = 'This does not look like an e-mail address.';
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
          router.replace('/');
        },
        onError: (err) => {
          if (err instanceof ApiError && err.status === 400) setFieldErrors(err.fieldMessages());
          setFormError(err.message);
        },
      },
    );
  };

  return (
    <KeyboardAvoidingView style={styles.root} behavior="padding">
      <ScrollView contentContainerStyle={styles.scroll}>
        <View style={styles.card}>
          <Logo />
          <View style={{ gap: space.xs }}>
            <Text role="heading" aria-level={1} style={type.title}>
              Sign in
            </Text>
            <Text style={[type.body, { color: colors.inkMuted }]}>Check incoming drums against the site's dip tubes and dispense heads.</Text>
          </View>
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
            <Text role="alert" testID="sign-in-message" style={styles.formError}>
              {formError}
            </Text>
          ) : null}
          <Button label="Sign in" testID="sign-in-submit" onPress={submit} busy={signIn.isPending} />
        </View>
      </ScrollView>
    </KeyboardAvoidingView>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, backgroundColor: colors.paper },
  scroll: { flexGrow: 1, justifyContent: 'center', alignItems: 'center', padding: space.lg },
  card: {
    width: '100%',
    maxWidth: 420,
    gap: space.lg,
    padding: space.xl,
    backgroundColor: colors.surface,
    borderRadius: radius.lg,
    borderWidth: 1,
    borderColor: colors.line,
  },
  formError: { ...type.body, color: colors.danger, fontFamily: type.label.fontFamily, backgroundColor: colors.dangerSoft, padding: space.md, borderRadius: radius.md },
});

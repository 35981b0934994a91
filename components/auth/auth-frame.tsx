import { useRouter } from 'expo-router';
import type { ReactNode } from 'react';
import { KeyboardAvoidingView, ScrollView, StyleSheet, Text, View } from 'react-native';
import { colors, radius, space, type } from '../theme';
import { Button } from '../ui/button';
import { Logo } from '../ui/logo';

/** The one layout of the signed-out screens (sign-in, forgot, reset) and the forced password change: a centred card. */
export function AuthFrame({ title, lead, children, testID }: { title: string; lead?: string; children: ReactNode; testID?: string }) {
  return (
    <KeyboardAvoidingView style={styles.root} behavior="padding">
      <ScrollView contentContainerStyle={styles.scroll}>
        <View style={styles.card} testID={testID}>
          <Logo />
          <View style={{ gap: space.xs }}>
            <Text role="heading" aria-level={1} style={type.title}>
              {title}
            </Text>
            {lead ? <Text style={[type.body, { color: colors.inkMuted }]}>{lead}</Text> : null}
          </View>
          {children}
        </View>
      </ScrollView>
    </KeyboardAvoidingView>
  );
}

/** A message for the whole form: a problem (`alert`) or a confirmation (`status`), said by screen readers as it appears. */
export function FormMessage({ kind, children, testID }: { kind: 'problem' | 'done'; children: ReactNode; testID?: string }) {
  return (
    <Text role={kind === 'problem' ? 'alert' : 'status'} testID={testID} style={[styles.message, kind === 'problem' ? styles.problem : styles.done]}>
      {children}
    </Text>
  );
}

/**
 * The end of a signed-out flow: what the server said, and the way back to sign-in.
 * Test ids: `<testID>-screen`, `<testID>-done`, and the button's own.
 */
export function DoneFrame({ title, message, testID, signIn }: { title: string; message: string; testID: string; signIn: { label: string; testID: string } }) {
  const router = useRouter();
  return (
    <AuthFrame title={title} testID={`${testID}-screen`}>
      <FormMessage kind="done" testID={`${testID}-done`}>
        {message}
      </FormMessage>
      <Button label={signIn.label} onPress={() => router.replace('/sign-in')} testID={signIn.testID} />
    </AuthFrame>
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
  message: { ...type.body, fontFamily: type.label.fontFamily, padding: space.md, borderRadius: radius.md },
  problem: { color: colors.danger, backgroundColor: colors.dangerSoft },
  done: { color: colors.fits, backgroundColor: colors.fitsSoft },
});

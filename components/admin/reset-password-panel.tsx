import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { useUserResetPasswordMutation, type UserRecord } from '../data/users';
import { colors, fonts, radius, space, type } from '../theme';
import { Button } from '../ui/button';

/**
 * An administrator's reset of someone's password, with a confirmation step. The temporary password is shown
 * once, here, until "Done": it is kept nowhere else in the client, and the server keeps only its hash.
 */
export function ResetPasswordPanel({ user }: { user: UserRecord }) {
  const reset = useUserResetPasswordMutation();
  const [confirming, setConfirming] = useState(false);
  const id = `user-reset-${user.email}`;

  if (reset.isSuccess) {
    return (
      <View style={styles.shown} role="status" testID={`${id}-done`}>
        <Text style={type.label}>Temporary password for {user.name}</Text>
        <Text selectable style={styles.password} testID={`${id}-password`}>
          {reset.data.temporaryPassword}
        </Text>
        <Text style={type.body}>Give it to {user.name} in person. It is shown only now; after signing in with it they choose their own. They were signed out everywhere.</Text>
        <Button label="Done, hide it" variant="secondary" onPress={() => reset.reset()} testID={`${id}-hide`} />
      </View>
    );
  }
  if (confirming) {
    return (
      <View style={styles.confirm} testID={`${id}-confirm`}>
        <Text style={type.body}>
          Reset the password of {user.name}? They are signed out everywhere at once and get a temporary password, which you hand over; they must change it after signing in.
        </Text>
        <View style={styles.buttons}>
          <Button
            label={reset.isPending ? 'Resetting…' : 'Yes, reset the password'}
            variant="danger"
            busy={reset.isPending}
            onPress={() => (reset.isPending ? undefined : reset.mutate(user.id, { onSuccess: () => setConfirming(false) }))}
            testID={`${id}-yes`}
          />
          <Button label="Cancel" variant="quiet" onPress={() => setConfirming(false)} testID={`${id}-cancel`} />
        </View>
        {reset.isError ? (
          <Text role="alert" style={styles.error}>
            Not reset: {reset.error.message}
          </Text>
        ) : null}
      </View>
    );
  }
  return <Button label="Reset password" variant="secondary" onPress={() => setConfirming(true)} accessibilityLabel={`Reset the password of ${user.name}`} testID={id} />;
}

const styles = StyleSheet.create({
  confirm: { gap: space.sm, padding: space.md, borderRadius: radius.md, backgroundColor: colors.cautionSoft, borderWidth: 1, borderColor: colors.caution },
  shown: { gap: space.sm, padding: space.md, borderRadius: radius.md, backgroundColor: colors.fitsSoft, borderWidth: 1, borderColor: colors.fits },
  password: { fontFamily: fonts.bold, fontSize: 24, letterSpacing: 1, color: colors.ink, paddingVertical: space.xs },
  buttons: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  error: { fontFamily: fonts.semibold, fontSize: 15, color: colors.danger },
});

import { StyleSheet, Text, View } from 'react-native';
import { useWaitingCount } from '../data/dock-queue';
import { colors, space, type } from '../theme';
import { Button } from '../ui/button';

/**
 * Signing out clears what the device keeps, dock checks still waiting to be sent included. When one waits,
 * the first tap on "Sign out" asks here instead of signing out.
 */
export function SignOutGuard({ asking, setAsking, end }: { asking: boolean; setAsking: (asking: boolean) => void; end: () => void }) {
  const waiting = useWaitingCount();
  if (!asking || waiting === 0) return null;
  const checks = `${waiting} dock check${waiting === 1 ? '' : 's'}`;
  return (
    <View style={styles.box} role="alertdialog" aria-label="Sign out?" testID="sign-out-guard">
      <Text style={type.body}>
        {checks} {waiting === 1 ? 'is' : 'are'} still waiting to be sent. Signing out deletes {waiting === 1 ? 'it' : 'them'} from this phone; the lot
        {waiting === 1 ? '' : 's'} would have to be checked again.
      </Text>
      <View style={styles.actions}>
        <Button label="Stay signed in" onPress={() => setAsking(false)} testID="sign-out-keep" />
        <Button label={`Sign out and delete ${waiting === 1 ? 'it' : 'them'}`} variant="danger" onPress={end} testID="sign-out-anyway" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm, padding: space.lg, backgroundColor: colors.cautionSoft, borderBottomWidth: 1, borderBottomColor: colors.caution },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});

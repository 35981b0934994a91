import { useRouter } from 'expo-router';
import { Text } from 'react-native';
import { type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';

/** Beside the person's other settings (under Notices): the way to their own password change. */
export function PasswordCard() {
  const router = useRouter();
  return (
    <Card testID="password-card">
      <Text role="heading" aria-level={2} style={type.heading}>
        Your password
      </Text>
      <Text style={type.small}>Change it whenever you like. Changing it signs you out everywhere else.</Text>
      <Button label="Change password" variant="secondary" onPress={() => router.push('/password')} testID="password-open" />
    </Card>
  );
}

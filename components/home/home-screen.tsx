import { StyleSheet, Text, View } from 'react-native';
import { ROLE_LABELS } from '@/shared/contract/roles';
import { Screen } from '../screen';
import { useSession } from '../session';
import { colors, space, type } from '../theme';
import { Card } from '../ui/card';
import { useIsWide } from '../use-layout';
import { CAPABILITIES } from './capabilities';

export function HomeScreen() {
  const { session } = useSession();
  const wide = useIsWide();
  if (!session) return null;
  const { user } = session;
  return (
    <Screen title={`Hello, ${user.name.split(' ')[0]}`} subtitle={`Signed in as ${ROLE_LABELS[user.role].toLowerCase()}. Here is what you can do.`} testID={`home-${user.role}`}>
      <View style={[styles.grid, wide && styles.gridWide]}>
        {CAPABILITIES[user.role].map((c) => (
          <Card key={c.title} style={wide ? styles.cardWide : undefined}>
            <Text role="heading" aria-level={2} style={type.heading}>
              {c.title}
            </Text>
            <Text style={[type.body, { color: colors.inkMuted }]}>{c.text}</Text>
          </Card>
        ))}
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  grid: { gap: space.md },
  gridWide: { flexDirection: 'row', flexWrap: 'wrap' },
  cardWide: { flexBasis: '30%', flexGrow: 1, minWidth: 260 },
});

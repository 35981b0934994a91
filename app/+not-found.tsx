import { Link } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import { colors, space, type } from '@/components/theme';

export default function NotFound() {
  return (
    <View style={styles.box}>
      <Text role="heading" style={type.title}>
        This page does not exist
      </Text>
      <Link href="/" style={[type.body, { color: colors.primary }]}>
        Go to the home page
      </Link>
    </View>
  );
}

const styles = StyleSheet.create({ box: { flex: 1, padding: space.xl, gap: space.md, backgroundColor: colors.paper } });

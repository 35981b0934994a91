import { Slot } from 'expo-router';
import { View } from 'react-native';
import { RegistryNav } from '@/components/registry/registry-nav';

export default function RegistryLayout() {
  return (
    <View style={{ flex: 1 }}>
      <RegistryNav />
      <Slot />
    </View>
  );
}

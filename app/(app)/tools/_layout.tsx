import { Slot } from 'expo-router';
import { View } from 'react-native';
import { ToolsNav } from '@/components/tools/tools-nav';

export default function ToolsLayout() {
  return (
    <View style={{ flex: 1 }}>
      <ToolsNav />
      <Slot />
    </View>
  );
}

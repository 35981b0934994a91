import type { ReactNode } from 'react';
import { Slot } from 'expo-router';
import { View } from 'react-native';

/** A section's layout route: its tabs above, the page below, filling the screen. */
export function SectionLayout({ nav }: { nav: ReactNode }) {
  return (
    <View style={{ flex: 1 }}>
      {nav}
      <Slot />
    </View>
  );
}

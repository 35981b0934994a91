import type { ReactNode } from 'react';
import { Text } from 'react-native';
import { type } from '../theme';

/** A card's or a section's heading (level 2: the page title is level 1). */
export function SectionTitle({ children, testID }: { children: ReactNode; testID?: string }) {
  return (
    <Text role="heading" aria-level={2} style={type.heading} testID={testID}>
      {children}
    </Text>
  );
}

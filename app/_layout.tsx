import { SourceSans3_400Regular } from '@expo-google-fonts/source-sans-3/400Regular';
import { SourceSans3_600SemiBold } from '@expo-google-fonts/source-sans-3/600SemiBold';
import { SourceSans3_700Bold } from '@expo-google-fonts/source-sans-3/700Bold';
import { useFonts } from 'expo-font';
import { Slot } from 'expo-router';
import { AppProviders } from '@/components/app-providers';

export default function RootLayout() {
  // Only the three weights the theme uses; until they load the system font stands in.
  useFonts({ SourceSans3_400Regular, SourceSans3_600SemiBold, SourceSans3_700Bold });
  return (
    <AppProviders>
      <Slot />
    </AppProviders>
  );
}

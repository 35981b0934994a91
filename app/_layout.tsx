import { useFonts } from 'expo-font';
import { Slot } from 'expo-router';
import { AppProviders } from '@/components/app-providers';
import { FONT_FILES } from '@/components/fonts';
import { useServiceWorker } from '@/components/offline/use-service-worker';
import { UpdateBanner } from '@/components/offline/update-banner';

export default function RootLayout() {
  // Only the weights the theme uses; until they load the system font stands in.
  useFonts(FONT_FILES);
  const update = useServiceWorker();
  return (
    <AppProviders>
      <Slot />
      {update.ready ? <UpdateBanner onReload={update.apply} /> : null}
    </AppProviders>
  );
}

import { Redirect, Slot } from 'expo-router';
import { AppShell } from '@/components/app-shell';
import { useSession } from '@/components/session';
import { LoadingState } from '@/components/ui/states';

export default function SignedInLayout() {
  const { session, ready } = useSession();
  if (!ready) return <LoadingState label="Opening Bungwise…" />;
  if (!session) return <Redirect href="/sign-in" />;
  return (
    <AppShell>
      <Slot />
    </AppShell>
  );
}

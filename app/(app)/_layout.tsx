import { Redirect, Slot, usePathname } from 'expo-router';
import { AppShell } from '@/components/app-shell';
import { useSession } from '@/components/session';
import { LoadingState } from '@/components/ui/states';

export default function SignedInLayout() {
  const { session, ready } = useSession();
  const pathname = usePathname();
  if (!ready) return <LoadingState label="Opening Bungwise…" />;
  if (!session) return <Redirect href="/sign-in" />;
  // A temporary password: only the change is open (the server answers 403 to everything else), without the app's chrome.
  if (session.user.mustChangePassword) return pathname === '/password' ? <Slot /> : <Redirect href="/password" />;
  return (
    <AppShell>
      <Slot />
    </AppShell>
  );
}

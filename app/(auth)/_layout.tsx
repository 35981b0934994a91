import { Redirect, Slot, usePathname } from 'expo-router';
import { useSession } from '@/components/session';

export default function AuthLayout() {
  const { session, ready } = useSession();
  const pathname = usePathname();
  // A reset link opens even where someone is signed in: it is about the account in the mail, not this session.
  if (ready && session && pathname !== '/reset-password') return <Redirect href="/" />;
  return <Slot />;
}

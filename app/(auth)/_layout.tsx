import { Redirect, Slot } from 'expo-router';
import { useSession } from '@/components/session';

export default function AuthLayout() {
  const { session, ready } = useSession();
  if (ready && session) return <Redirect href="/" />;
  return <Slot />;
}

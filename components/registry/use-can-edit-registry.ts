import { useSession } from '../session';

/** Engineers and administrators keep the registry (the server enforces the same on every write). */
export function useCanEditRegistry(): boolean {
  const { session } = useSession();
  return session?.user.role === 'engineer' || session?.user.role === 'admin';
}

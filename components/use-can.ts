import { can, type Action } from '@/shared/contract/roles';
import { useSession } from './session';

/** May the person signed in do this? Reads the one role table; the server enforces the same on every request. */
export function useCan(action: Action): boolean {
  const { session } = useSession();
  return can(session?.user.role, action);
}

import { useCan } from '../use-can';

/** Engineers and administrators keep the registry (the server enforces the same on every write). */
export function useCanEditRegistry(): boolean {
  return useCan('keep-registry');
}

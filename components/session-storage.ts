// The session survives reloads in the browser's localStorage. (A native build would use a secure store.)
import { SESSION_STORAGE_KEY as KEY } from '@/shared/browser-storage';

export function loadStored<T>(): T | null {
  try {
    const raw = globalThis.localStorage?.getItem(KEY);
    return raw ? (JSON.parse(raw) as T) : null;
  } catch {
    return null;
  }
}

export function saveStored(value: unknown): void {
  try {
    if (value === null) globalThis.localStorage?.removeItem(KEY);
    else globalThis.localStorage?.setItem(KEY, JSON.stringify(value));
  } catch {
    // Private mode or storage full: the session then lasts until the tab closes.
  }
}

// Whether the server can be reached, for TanStack Query's onlineManager: the browser's online and offline
// events, and besides them a request that found no server (dock Wi-Fi often stays "connected" with nothing
// behind it). Once a request fails so, the server's health is asked every few seconds until it answers.
import { onlineManager } from '@tanstack/react-query';

const PROBE_EVERY_MS = 4000;
const PROBE_TIMEOUT_MS = 4000;
let probing: ReturnType<typeof setInterval> | null = null;

async function probe(base: string): Promise<void> {
  const abort = new AbortController();
  const timer = setTimeout(() => abort.abort(), PROBE_TIMEOUT_MS);
  try {
    const res = await fetch(`${base}/api/health`, { cache: 'no-store', signal: abort.signal });
    if (res.ok) backOnline();
  } catch {
    // still unreachable
  } finally {
    clearTimeout(timer);
  }
}

function backOnline(): void {
  if (probing) clearInterval(probing);
  probing = null;
  onlineManager.setOnline(true);
}

/** A request found no server: count as offline (paused queries and queued checks wait) until it answers. */
export function reportUnreachable(base: string): void {
  onlineManager.setOnline(false);
  if (probing) return;
  probing = setInterval(() => void probe(base), PROBE_EVERY_MS);
  // In Node (the unit tests) the probe must not keep the process alive; browsers have no unref.
  (probing as { unref?: () => void }).unref?.();
}

export const isOnline = (): boolean => onlineManager.isOnline();

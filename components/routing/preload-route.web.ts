// Runs before Expo Router starts (see index.ts). With async routes each route file is its own chunk, and
// the router asks for them one after another as each layout renders: root layout, then the signed-in
// layout, then the screen, a round trip each. Asking the route context for all of the current address's
// files at once fetches them side by side; the router's own requests then find them loaded (Metro's
// loader keeps one promise per chunk).
//
// Then, once the page has loaded and the browser is idle, every other route file is fetched too, one at a
// time: on plain HTTP (an intranet address, where no service worker may run) a clerk whose Wi-Fi drops can
// still open every screen of the app already in memory.
import { ctx } from 'expo-router/_ctx';
import { routeFilesFor } from '@/shared/route-files';

/** A failed chunk is the router's to report when it asks for it; nothing to do here. */
const load = (key: string): Promise<unknown> => Promise.resolve(ctx(key)).catch(() => undefined);

/** How long after the load event the remaining routes start to come in (the first screen is drawing). */
const REST_AFTER_MS = 3_000;

// In a microtask: when this module runs, Expo's chunk loader is not installed yet (the `expo` package does
// that as Expo Router's entry imports it, in the same script); React renders later still.
if (typeof window !== 'undefined') queueMicrotask(preload);

function preload() {
  const first = routeFilesFor(window.location.pathname, ctx.keys());
  for (const key of first) void load(key);

  const rest = ctx.keys().filter((k: string) => !first.includes(k));
  const idle = (run: () => void) => (typeof window.requestIdleCallback === 'function' ? window.requestIdleCallback(run, { timeout: 2_000 }) : setTimeout(run, 50));
  const next = () => {
    const key = rest.shift();
    if (key) void load(key).then(() => idle(next));
  };
  const start = () => setTimeout(() => idle(next), REST_AFTER_MS);
  if (document.readyState === 'complete') start();
  else window.addEventListener('load', start, { once: true });
}

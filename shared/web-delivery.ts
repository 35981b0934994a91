// How the web build is delivered: what the export step writes and the server serves. One home for the
// names and rules both sides (and the service-worker registration in the app) depend on.

/** The service worker the export step generates, at the root so that its scope is the whole app. */
export const SERVICE_WORKER_FILE = 'sw.js';
/** The web app manifest the export step writes beside index.html. */
export const MANIFEST_FILE = 'manifest.webmanifest';
/** Route file to chunk URL (`scripts/web/route-chunks.ts`), read by the server for its preload headers. */
export const ROUTE_CHUNKS_FILE = 'route-chunks.json';
/** Where the export step puts the app's icons, each named with a hash of its bytes. */
export const ICONS_DIR = 'icons';

/**
 * A file whose name carries a hash of its content (`entry-<32 hex>.js`, `name.<32 hex>.woff2`,
 * `icon-192.<12 hex>.png`) never changes under that name, so browsers may keep it for a year. Expo writes
 * everything under `/_expo/static/` that way.
 */
export function isHashedFile(urlPath: string): boolean {
  const name = urlPath.replace(/\.(br|gz)$/, '');
  // Metro's scale variants put the density after the hash (`close-icon.<hash>@2x.png`); the hash covers all of them.
  return name.startsWith('/_expo/static/') || /[.-][0-9a-f]{8,}(@\d+(\.\d+)?x)?\.[a-z0-9]+$/i.test(name);
}

/** Extensions worth compressing ahead of time (woff2, png and the like are compressed already). */
export const COMPRESSIBLE_EXTENSIONS = ['.html', '.js', '.mjs', '.css', '.json', '.webmanifest', '.svg', '.ico', '.ttf', '.otf', '.wasm', '.map', '.txt'];

/** Below this size compression saves less than a round trip's header overhead (the API uses the same). */
export const COMPRESS_THRESHOLD_BYTES = 1024;

/**
 * A request for a missing file with one of these extensions answers 404 instead of the app's index.html:
 * a script, font or WebAssembly loader given HTML fails with a confusing error.
 */
export const FILE_REQUEST = /\.(m?js|css|map|json|wasm|woff2?|ttf|otf|png|jpe?g|gif|webp|svg|ico|webmanifest|txt)$/i;

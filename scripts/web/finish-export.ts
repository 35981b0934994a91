// The second half of the web export (run by scripts/lib/builds.mjs after `expo export`): the app's icons and
// web app manifest and their links in index.html, the route-chunk map the server's preload headers come
// from, the service worker that keeps the app shell for offline starts (Workbox generateSW), and
// brotli/gzip twins of every compressible file.
//   node dist/server/scripts/web/finish-export.js <export folder>
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { generateSW } from 'workbox-build';
import { colors } from '../../components/theme';
import { ICONS_DIR, MANIFEST_FILE, ROUTE_CHUNKS_FILE, SERVICE_WORKER_FILE, isHashedFile } from '../../shared/web-delivery';
import { precompress } from './precompress';
import { readRouteChunks } from './route-chunks';

const root = path.resolve(__dirname, '..', '..', '..', '..');

interface WebConfig {
  name: string;
  shortName: string;
  description?: string;
  display: string;
  startUrl: string;
  scope: string;
}

/** Copies assets/icons/* into the export, each name carrying a hash of its bytes (so it can be kept a year). */
function copyIcons(webDir: string): Map<string, string> {
  const from = path.join(root, 'assets', 'icons');
  const to = path.join(webDir, ICONS_DIR);
  fs.mkdirSync(to, { recursive: true });
  const urls = new Map<string, string>();
  for (const name of fs
    .readdirSync(from)
    .filter((n) => n.endsWith('.png'))
    .sort()) {
    const bytes = fs.readFileSync(path.join(from, name));
    const hashed = `${path.basename(name, '.png')}.${createHash('sha256').update(bytes).digest('hex').slice(0, 12)}.png`;
    fs.writeFileSync(path.join(to, hashed), bytes);
    urls.set(name, `/${ICONS_DIR}/${hashed}`);
  }
  return urls;
}

function writeManifest(webDir: string, web: WebConfig, icons: Map<string, string>): void {
  const icon = (name: string, size: number, purpose: string) => {
    const src = icons.get(name);
    if (!src) throw new Error(`assets/icons/${name} is missing: run \`npm run icons\``);
    return { src, sizes: `${size}x${size}`, type: 'image/png', purpose };
  };
  const manifest = {
    name: web.name,
    short_name: web.shortName,
    description: web.description,
    start_url: web.startUrl,
    scope: web.scope,
    display: web.display,
    // The theme is the home of the colours (components/theme.ts); app.json repeats them for Expo's
    // index.html and a unit test keeps the two equal.
    theme_color: colors.primary,
    background_color: colors.paper,
    icons: [icon('icon-192.png', 192, 'any'), icon('icon-512.png', 512, 'any'), icon('maskable-512.png', 512, 'maskable')],
  };
  fs.writeFileSync(path.join(webDir, MANIFEST_FILE), `${JSON.stringify(manifest, null, 2)}\n`);
}

function patchIndexHtml(webDir: string, icons: Map<string, string>): void {
  const file = path.join(webDir, 'index.html');
  const html = fs.readFileSync(file, 'utf8');
  const links = [
    `<link rel="manifest" href="/${MANIFEST_FILE}" />`,
    `<link rel="apple-touch-icon" href="${icons.get('apple-touch-icon-180.png')}" />`,
    `<link rel="icon" type="image/png" sizes="32x32" href="${icons.get('favicon-32.png')}" />`,
    // No font preloads: on a slow link the three woff2 files took bandwidth from the scripts the first screen
    // waits for. The fonts load once the app runs (components/fonts.ts, `swap`: the system font until then).
    // The page colour before the first frame, so a cold start does not flash white.
    `<style>html,body{background:${colors.paper}}</style>`,
  ];
  fs.writeFileSync(file, html.replace('</head>', `${links.join('\n    ')}\n  </head>`));
}

/**
 * The service worker: precaches the app shell (index.html, the bundles, CSS, fonts, icons, any .wasm),
 * answers client-route navigations with index.html, and leaves /api/ alone (the data goes offline through
 * the query cache, not here). A new version waits until the page asks it to take over (skipWaiting on the
 * SKIP_WAITING message the update banner sends); clientsClaim lets the first install control the open page.
 */
async function writeServiceWorker(webDir: string): Promise<{ count: number; size: number }> {
  const { count, size, warnings } = await generateSW({
    globDirectory: webDir,
    globPatterns: ['**/*.{html,js,css,woff2,woff,ttf,otf,png,ico,svg,webmanifest,wasm}'],
    globIgnores: [SERVICE_WORKER_FILE, '**/*.br', '**/*.gz'],
    swDest: path.join(webDir, SERVICE_WORKER_FILE),
    navigateFallback: '/index.html',
    navigateFallbackDenylist: [/^\/api\//],
    // Hashed names are their own revision: the cached copy is fetched once and never again.
    manifestTransforms: [async (entries) => ({ manifest: entries.map((e) => (isHashedFile(`/${e.url}`) ? { ...e, revision: null } : e)), warnings: [] })],
    maximumFileSizeToCacheInBytes: 16 * 2 ** 20,
    inlineWorkboxRuntime: true,
    skipWaiting: false,
    clientsClaim: true,
    cleanupOutdatedCaches: true,
    mode: 'production',
    sourcemap: false,
  });
  for (const w of warnings) console.warn(`[export] ${w}`);
  return { count, size };
}

async function main(): Promise<void> {
  const webDir = path.resolve(process.argv[2] ?? path.join(root, 'dist', 'web'));
  const web = JSON.parse(fs.readFileSync(path.join(root, 'app.json'), 'utf8')).expo.web as WebConfig;
  const icons = copyIcons(webDir);
  writeManifest(webDir, web, icons);
  patchIndexHtml(webDir, icons);
  const chunks = readRouteChunks(webDir);
  if (Object.keys(chunks).length === 0) console.warn('[export] no route chunks found in the entry bundle: the server sends no preload headers (see scripts/web/route-chunks.ts)');
  fs.writeFileSync(path.join(webDir, ROUTE_CHUNKS_FILE), `${JSON.stringify(chunks, null, 2)}\n`);
  const sw = await writeServiceWorker(webDir);
  const packed = precompress(webDir);
  console.log(
    `[export] service worker precaches ${sw.count} files (${(sw.size / 2 ** 20).toFixed(2)} MB); ` +
      `${packed.files} files compressed ahead of time, ${(packed.bytes / 2 ** 20).toFixed(2)} MB to ${(packed.brotliBytes / 2 ** 20).toFixed(2)} MB (brotli)`,
  );
}

if (require.main === module) {
  main().catch((err) => {
    console.error(`[export] ${(err as Error).stack ?? err}`);
    process.exit(1);
  });
}

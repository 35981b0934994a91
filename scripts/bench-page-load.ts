// Page loads for `npm run bench`: a cold and a warm (second-visit) load of a signed-in /receive, and a cold
// load of a bare Expo Router page served the same way (express-static-gzip and the compression middleware
// of server/web/serve-web.ts), in Debian's Chromium under an emulated slow mobile link and a slow CPU.
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import zlib from 'node:zlib';
import express from 'express';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { errorMiddleware } from '../server/common/error-middleware';
import { compressAnswers, serveWeb } from '../server/web/serve-web';
import { SESSION_STORAGE_KEY } from '../shared/browser-storage';
import { precompress } from './web/precompress';

const root = path.resolve(__dirname, '..', '..', '..');

/**
 * Chrome DevTools' "Slow 4G" preset (formerly "Fast 3G"): 1.6 Mbit/s down and 750 kbit/s up at 90%, and
 * 150 ms RTT times 3.75 (DevTools' factors that make request-level throttling match a packet-level link).
 */
export const SLOW_4G = { offline: false, latency: 562.5, downloadThroughput: (1.6e6 / 8) * 0.9, uploadThroughput: (750e3 / 8) * 0.9 };
/** A mid-range phone against this machine's cores, as DevTools' mobile preset. */
export const CPU_SLOWDOWN = 4;
const RUNS = 3;

export interface PageLoad {
  /** From navigation start until the chosen element is in the page and a frame has been drawn. */
  shownMs: number;
  /** From navigation start until the load event ended. */
  loadMs: number;
  /** Bytes on the wire (after compression) for everything the page requested before the load event. */
  wireBytes: number;
  /** gzip -9 size of the JavaScript files the load requested (the same measure as the old whole-build figure). */
  jsGzipBytes: number;
}

export interface PageTarget {
  url: string;
  /** The export folder the page is served from (to size the scripts it loads). */
  dir: string;
  /** The test id whose appearance counts as shown. */
  testId: string;
  /** A sign-in answer to place where the app keeps its session, before the page's scripts run. */
  session?: unknown;
}

export async function gzipSizeOfJs(dir: string): Promise<number> {
  let total = 0;
  const walk = (d: string) => {
    for (const f of fs.readdirSync(d)) {
      const p = path.join(d, f);
      if (fs.statSync(p).isDirectory()) walk(p);
      else if (p.endsWith('.js')) total += zlib.gzipSync(fs.readFileSync(p), { level: 9 }).length;
    }
  };
  walk(dir);
  return total;
}

/** A bare Expo Router page of the same SDK, exported the same way: the floor for the bundle size. */
export function exportBarePage(): string {
  const dir = path.join(root, 'dist', 'bench-bare');
  fs.rmSync(dir, { recursive: true, force: true });
  fs.mkdirSync(path.join(dir, 'app'), { recursive: true });
  fs.writeFileSync(path.join(dir, 'package.json'), JSON.stringify({ name: 'bare', private: true, main: 'expo-router/entry' }));
  fs.writeFileSync(path.join(dir, 'app.json'), JSON.stringify({ expo: { name: 'bare', slug: 'bare', web: { bundler: 'metro', output: 'single' }, plugins: ['expo-router'] } }));
  fs.writeFileSync(path.join(dir, 'babel.config.js'), "module.exports = (api) => { api.cache(true); return { presets: ['babel-preset-expo'] }; };\n");
  fs.writeFileSync(path.join(dir, 'app', 'index.tsx'), 'import { Text } from \'react-native\';\nexport default function Index() { return <Text testID="bare-text">Hello</Text>; }\n');
  fs.symlinkSync(path.join(root, 'node_modules'), path.join(dir, 'node_modules'));
  const out = spawnSync(path.join(root, 'node_modules', '.bin', 'expo'), ['export', '--platform', 'web', '--output-dir', 'web'], {
    cwd: dir,
    env: { ...process.env, CI: '1', EXPO_NO_TELEMETRY: '1' },
    encoding: 'utf8',
  });
  if (out.status !== 0) throw new Error(`bare export failed: ${out.stderr.slice(-500)}`);
  // Compressed ahead of time like the app's export, so both travel the same way.
  precompress(path.join(dir, 'web'));
  return path.join(dir, 'web');
}

/** Serves an export folder on a free port exactly as the app's server serves dist/web. */
export async function serveExport(dir: string): Promise<{ url: string; close: () => Promise<void> }> {
  const app = express();
  app.use(compressAnswers());
  serveWeb(app, dir);
  app.use(errorMiddleware);
  const server = await new Promise<ReturnType<typeof app.listen>>((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
  });
  return { url: `http://127.0.0.1:${(server.address() as AddressInfo).port}`, close: () => new Promise((r) => server.close(() => r())) };
}

// Init scripts as text (run before the page's own, not through eval): this file has no DOM types.
async function prepare(context: BrowserContext, target: PageTarget): Promise<void> {
  if (target.session) {
    await context.addInitScript(`localStorage.setItem(${JSON.stringify(SESSION_STORAGE_KEY)}, ${JSON.stringify(JSON.stringify(target.session))});`);
  }
  // The moment the element is in the page, taken at the next frame (when it is drawn).
  await context.addInitScript(`(() => {
    const seen = new MutationObserver(() => {
      if (!document.querySelector('[data-testid="${target.testId}"]')) return;
      seen.disconnect();
      requestAnimationFrame(() => { window.__shownAt = performance.now(); });
    });
    seen.observe(document, { childList: true, subtree: true });
  })();`);
}

/** What the page-side functions below read, typed here since this file is compiled without the DOM's types. */
interface PageGlobals {
  __shownAt?: number;
  performance: { getEntriesByType(type: string): Array<{ loadEventEnd: number }> };
  navigator: { serviceWorker: { ready: Promise<unknown> } };
}

/** One throttled visit in a page of its own; the context keeps its caches and service worker between visits. */
async function visit(context: BrowserContext, target: PageTarget): Promise<PageLoad> {
  const page: Page = await context.newPage();
  const cdp = await context.newCDPSession(page);
  await cdp.send('Network.enable');
  await cdp.send('Network.emulateNetworkConditions', SLOW_4G);
  await cdp.send('Emulation.setCPUThrottlingRate', { rate: CPU_SLOWDOWN });
  let wireBytes = 0;
  cdp.on('Network.loadingFinished', (e: { encodedDataLength: number }) => {
    wireBytes += e.encodedDataLength;
  });
  const scripts = new Set<string>();
  page.on('request', (req) => {
    if (req.resourceType() === 'script') scripts.add(new URL(req.url()).pathname);
  });
  await page.goto(target.url, { waitUntil: 'load', timeout: 120_000 });
  // A function, not text, here: the app's CSP (script-src 'self') refuses the eval Playwright needs for text.
  await page.waitForFunction(
    () => {
      const g = globalThis as unknown as PageGlobals;
      return g.__shownAt !== undefined && g.performance.getEntriesByType('navigation')[0].loadEventEnd > 0;
    },
    undefined,
    { timeout: 120_000, polling: 100 },
  );
  const times = await page.evaluate(() => {
    const g = globalThis as unknown as PageGlobals;
    return { shownMs: g.__shownAt as number, loadMs: g.performance.getEntriesByType('navigation')[0].loadEventEnd };
  });
  let jsGzipBytes = 0;
  for (const p of scripts) {
    const file = path.join(target.dir, decodeURIComponent(p));
    if (fs.existsSync(file)) jsGzipBytes += zlib.gzipSync(fs.readFileSync(file), { level: 9 }).length;
  }
  await cdp.send('Emulation.setCPUThrottlingRate', { rate: 1 });
  await page.close();
  return { ...times, wireBytes, jsGzipBytes };
}

/** Waits until the page's service worker has activated (the shell is precached) and controls the origin. */
async function shellKept(context: BrowserContext, url: string): Promise<void> {
  const page = await context.newPage();
  await page.goto(url);
  await page.evaluate(() => (globalThis as unknown as PageGlobals).navigator.serviceWorker.ready.then(() => true));
  await page.close();
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const medianLoad = (loads: PageLoad[]): PageLoad => ({
  shownMs: median(loads.map((l) => l.shownMs)),
  loadMs: median(loads.map((l) => l.loadMs)),
  wireBytes: median(loads.map((l) => l.wireBytes)),
  jsGzipBytes: median(loads.map((l) => l.jsGzipBytes)),
});

/**
 * Cold: a fresh browser context (no HTTP cache, no service worker) per run. Warm: a second visit in the
 * context of a cold run, once its service worker has kept the shell. The median of three runs of each.
 */
export async function measurePageLoads(app: PageTarget, bare: PageTarget, log: (s: string) => void): Promise<{ cold: PageLoad; warm: PageLoad; bare: PageLoad }> {
  const browser: Browser = await chromium.launch({
    executablePath: process.env.BUNGWISE_CHROMIUM ?? '/usr/bin/chromium',
    args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
  });
  const viewport = { width: 390, height: 844 };
  try {
    const cold: PageLoad[] = [];
    const warm: PageLoad[] = [];
    const bareLoads: PageLoad[] = [];
    for (let run = 1; run <= RUNS; run++) {
      log(`page loads, run ${run} of ${RUNS} (slow 4G, CPU / ${CPU_SLOWDOWN})...`);
      const b = await browser.newContext({ viewport });
      await prepare(b, bare);
      bareLoads.push(await visit(b, bare));
      await b.close();
      const context = await browser.newContext({ viewport });
      await prepare(context, app);
      cold.push(await visit(context, app));
      await shellKept(context, app.url);
      warm.push(await visit(context, app));
      await context.close();
    }
    return { cold: medianLoad(cold), warm: medianLoad(warm), bare: medianLoad(bareLoads) };
  } finally {
    await browser.close();
  }
}

import fs from 'node:fs';
import path from 'node:path';
import type { BrowserContext } from 'playwright-core';
import { ROUTE_CHUNKS_FILE } from '../../shared/web-delivery';
import { BrowserHarness, seen, signInAs, type Viewport, VIEWPORTS } from '../support/browser';

// Async routes: each screen is a chunk of its own. The first screen's chunks come with the page (a Link
// preload header and the app asking for them at start); every other screen's chunk comes while the app is
// idle, so on a plain-http intranet address, where no service worker may keep the app, a clerk whose
// Wi-Fi drops can still open every screen.

const harness = new BrowserHarness();
const host = 'dock.bungwise.test';
beforeAll(async () => {
  await harness.start();
  await harness.launch([`--host-resolver-rules=MAP ${host} 127.0.0.1`]);
}, 60_000);
afterAll(() => harness.stop());

const contexts: BrowserContext[] = [];
afterEach(async () => {
  await Promise.all(contexts.splice(0).map((c) => c.close().catch(() => undefined)));
  expect(harness.takeConsoleErrors()).toEqual([]);
});

const chunks = () => JSON.parse(fs.readFileSync(path.join(harness.webDir, ROUTE_CHUNKS_FILE), 'utf8')) as Record<string, string>;

describe.each(VIEWPORTS)('route chunks on a plain-http address at $name width ($width px)', (viewport: Viewport) => {
  it('the dock loads its own chunks first, every other screen comes while idle, and the registry opens with the network cut', async () => {
    harness.allowConsoleError(/Cross-Origin-Opener-Policy header has been ignored/);
    const origin = harness.baseUrl.replace('127.0.0.1', host);
    const { context, page } = await harness.page(viewport);
    contexts.push(context);
    await signInAs(page, origin, 'clerk@bungwise.example');
    await page.getByTestId('home-clerk').waitFor();
    expect(await page.evaluate(() => window.isSecureContext)).toBe(false);

    const map = chunks();
    const scripts: string[] = [];
    page.on('request', (r) => {
      if (r.resourceType() === 'script') scripts.push(new URL(r.url()).pathname);
    });
    await page.goto(`${origin}/receive`);
    await page.getByTestId('dock-lot').waitFor();
    const firstScreen = [...scripts];
    // Its layouts and screen were asked for; the registry's chunk not yet (it comes after the load, when idle).
    for (const key of ['./_layout.tsx', './(app)/_layout.tsx', './(app)/receive/index.tsx']) expect(firstScreen).toContain(map[key]);
    expect(firstScreen).not.toContain(map['./(app)/registry/drum-types/index.tsx']);

    // Every route file's chunk arrives without anyone opening its screen.
    const all = [...new Set(Object.values(map))];
    // The registry's list screens come in a chunk of their own (components/registry/lazy-lists.tsx), asked for
    // once a list route's file has run.
    await page.waitForFunction(
      (urls) => {
        const seenPaths = performance.getEntriesByType('resource').map((e) => new URL(e.name).pathname);
        return urls.every((u) => seenPaths.includes(u)) && seenPaths.some((p) => /\/list-screens-[0-9a-f]+\.js$/.test(p));
      },
      all,
      { timeout: 60_000, polling: 250 },
    );

    // The network goes; the clerk opens the registry from the navigation: its screen (and list chunk) are here.
    await context.setOffline(true);
    harness.allowConsoleError(/ERR_INTERNET_DISCONNECTED|Failed to load resource/);
    await page.getByTestId('nav-registry').click();
    await seen(page, 'registry-drum-types', /Drum types/);
    // Its list cannot load: it says it waits for the network instead of spinning.
    await seen(page, 'state-waiting-network', /Waiting for the network/);
    await harness.shot(page, 'offline-http-registry', viewport);
  });
});

// The app shell from the service worker: after one visit the app opens with no network, and a new deploy
// installs in the background and reaches the page when the person reloads. Works on its own copy of the
// export, since the deploy test changes files as a deploy would.
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';
import type { Page } from 'playwright-core';
import { BrowserHarness, signInAs, VIEWPORTS, WEB_DIR } from '../support/browser';

const copy = fs.mkdtempSync(path.join(os.tmpdir(), 'bungwise-offline-'));
fs.cpSync(WEB_DIR, copy, { recursive: true });
const harness = new BrowserHarness({ webDir: copy });

beforeAll(() => harness.start(), 60_000);
afterAll(async () => {
  await harness.stop();
  fs.rmSync(copy, { recursive: true, force: true });
});
afterEach(() => {
  expect(harness.takeConsoleErrors()).toEqual([]);
});

/** Waits until the service worker has precached the shell and controls the page. */
async function shellKept(page: Page): Promise<void> {
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
  });
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null);
}

/** The theme's three Source Sans 3 weights, loaded in the page. */
const fontsLoaded = (page: Page) =>
  page.waitForFunction(
    () => {
      let loaded = 0;
      document.fonts.forEach((f) => {
        if (f.family.includes('SourceSans3') && f.status === 'loaded') loaded += 1;
      });
      return loaded === 3;
    },
    undefined,
    { timeout: 10_000 },
  );

// With no network, the app's own requests to the API fail; the browser logs each one.
const OFFLINE_REQUEST = /ERR_INTERNET_DISCONNECTED/;

/** A deploy: a changed index.html, and the service worker that precaches it under its new revision. */
function deploy(build: number): void {
  const write = (name: string, text: string) => {
    const file = path.join(copy, name);
    fs.writeFileSync(file, text);
    fs.writeFileSync(`${file}.br`, zlib.brotliCompressSync(text));
    fs.writeFileSync(`${file}.gz`, zlib.gzipSync(text));
  };
  const html = fs
    .readFileSync(path.join(copy, 'index.html'), 'utf8')
    .replace(/<meta name="bungwise-build"[^>]*>/, '')
    .replace('</head>', `<meta name="bungwise-build" content="${build}"></head>`);
  const revision = createHash('md5').update(html).digest('hex');
  const sw = fs.readFileSync(path.join(copy, 'sw.js'), 'utf8').replace(/(url:"index\.html",revision:")[0-9a-f]+"/, `$1${revision}"`);
  expect(sw).toContain(revision);
  write('index.html', html);
  write('sw.js', sw);
}
const buildOf = (page: Page) =>
  page
    .locator('meta[name="bungwise-build"]')
    .getAttribute('content', { timeout: 1000 })
    .catch(() => null);

describe.each(VIEWPORTS)('the app shell offline at $name width ($width px)', (viewport) => {
  it('after one visit, the sign-in screen opens with no network, in the app typeface', async () => {
    const { context, page } = await harness.page(viewport);
    await page.goto(`${harness.baseUrl}/`);
    await page.getByTestId('sign-in-submit').waitFor();
    await shellKept(page);
    await context.setOffline(true);
    const again = harness.watch(await context.newPage(), viewport);
    const res = await again.goto(`${harness.baseUrl}/sign-in`);
    expect(res?.fromServiceWorker()).toBe(true);
    await again.getByTestId('sign-in-email').waitFor();
    await fontsLoaded(again);
    // The API is not kept by the service worker: with no network it does not answer.
    harness.allowConsoleError(OFFLINE_REQUEST);
    expect(
      await again.evaluate(() =>
        fetch('/api/health').then(
          () => 'answered',
          () => 'no network',
        ),
      ),
    ).toBe('no network');
    await harness.shot(again, 'offline-sign-in', viewport);
    await context.close();
  }, 60_000);

  it('a signed-in clerk opens the app with no network to their home', async () => {
    const { context, page } = await harness.page(viewport);
    await signInAs(page, harness.baseUrl, 'clerk@bungwise.example');
    await page.getByTestId('home-clerk').waitFor();
    await shellKept(page);
    await context.setOffline(true);
    const again = harness.watch(await context.newPage(), viewport);
    harness.allowConsoleError(OFFLINE_REQUEST); // the session check with the server
    const res = await again.goto(`${harness.baseUrl}/`);
    expect(res?.fromServiceWorker()).toBe(true);
    await again.getByTestId('home-clerk').waitFor();
    await fontsLoaded(again);
    await harness.shot(again, 'offline-home-clerk', viewport);
    await context.close();
  }, 60_000);

  it('a new deploy installs in the background, offers a reload, and the reload runs it', async () => {
    const { context, page } = await harness.page(viewport);
    await page.goto(`${harness.baseUrl}/`);
    await page.getByTestId('sign-in-submit').waitFor();
    await shellKept(page);
    const before = await buildOf(page);
    const build = Number(before ?? 0) + 1;
    deploy(build);
    // The next visit still starts from the kept shell; the browser fetches the new service worker beside it.
    const again = harness.watch(await context.newPage(), viewport);
    await again.goto(`${harness.baseUrl}/sign-in`);
    expect(await buildOf(again)).toBe(before);
    await again.getByTestId('update-ready').waitFor({ timeout: 20_000 });
    await harness.shot(again, 'update-ready', viewport);
    await Promise.all([again.waitForEvent('load'), again.getByTestId('update-reload').click()]);
    await again.getByTestId('sign-in-submit').waitFor();
    expect(await buildOf(again)).toBe(String(build));
    expect(await again.getByTestId('update-ready').count()).toBe(0);
    await context.close();
  }, 60_000);
});

import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { DEMO_REGISTRY_SUMMARY as demo } from '../../seeds/demo-registry';
import { barcodePng, onPage, pngPixels, toPng, writeY4m, type LabelSymbology } from '../support/barcodes';
import { BrowserHarness, fakeCameraArgs, seen, signInAs, VIEWPORTS, type Viewport } from '../support/browser';

// The dock's "Scan label": Chromium's fake camera plays a video of a barcode made by bwip-js; the app
// opens the camera, decodes the frames with its own WebAssembly decoder (this Chromium has no
// BarcodeDetector) and fills the lot number. A second origin that is not localhost has no camera at all
// (not a secure context), and the photo fallback reads a picture instead.

const harness = new BrowserHarness();
const work = fs.mkdtempSync(path.join(os.tmpdir(), 'bungwise-scan-'));
const GTIN = '09506000134352'; // GS1's example GTIN (check digit 2; see tests/unit/gs1-label.test.ts)
const SCANNER = 'dock-lot-scan-scanner';
// Each test restarts Chromium, loads the decoder and signs in: more than the default 30 s on a busy two-core machine.
const SLOW = 90_000;

beforeAll(() => harness.start(), 60_000);
afterAll(async () => {
  await harness.stop();
  fs.rmSync(work, { recursive: true, force: true });
});

const contexts: BrowserContext[] = [];
afterEach(async () => {
  await Promise.all(contexts.splice(0).map((c) => c.close().catch(() => undefined)));
  expect(harness.takeConsoleErrors()).toEqual([]);
});

/** A 1280×720 page with the code on it, as the camera or a photo sees the label. */
async function labelPage(bcid: LabelSymbology, text: string, dontlint = false) {
  return onPage(pngPixels(await barcodePng(bcid, text, { scale: 3, dontlint })), 1280, 720);
}

/** Chromium restarted with a fake camera that shows this label. */
async function cameraShowing(name: string, bcid: LabelSymbology, text: string, dontlint = false) {
  const file = path.join(work, `${name}.y4m`);
  writeY4m(file, await labelPage(bcid, text, dontlint));
  await harness.launch(fakeCameraArgs(file));
}

/** The dock screen signed in as the clerk, with every request the page makes recorded. */
async function dock(viewport: Viewport, origin = harness.baseUrl) {
  const { context, page } = await harness.page(viewport);
  contexts.push(context);
  if (origin === harness.baseUrl) await context.grantPermissions(['camera'], { origin });
  const requests: string[] = [];
  page.on('request', (r) => requests.push(r.url()));
  await signInAs(page, origin, 'clerk@bungwise.example');
  await page.getByTestId('home-clerk').waitFor();
  await page.goto(`${origin}/receive`);
  await page.getByTestId('dock-lot').waitFor();
  return { page, requests };
}

/** Nothing leaves the app's origin: the decoder's WebAssembly above all (its library's default is a CDN). */
function expectOnlyOwnOrigin(requests: string[], origin = harness.baseUrl) {
  const elsewhere = requests.filter((u) => !u.startsWith(`${origin}/`) && !u.startsWith('data:') && !u.startsWith('blob:'));
  expect(elsewhere).toEqual([]);
}

const lotValue = (page: Page) => page.getByTestId('dock-lot').inputValue();

async function pickFittingDrum(page: Page) {
  await page.getByTestId('dock-drum-search').fill(demo.fittingDrum);
  const option = page
    .getByTestId(/^dock-drum-option-/)
    .filter({ hasText: demo.fittingDrum })
    .first();
  await option.click();
  await page.getByTestId('dock-drum-selected').waitFor();
}

describe.each(VIEWPORTS)('scanning a drum label at $name width ($width px)', (viewport: Viewport) => {
  const lot = `LR-${viewport.name === 'phone' ? 'P' : 'W'}-26-4711`;

  it(
    'a GS1 DataMatrix through the camera fills the lot number and shows the dates; the decoder loads only then, from the app',
    async () => {
      await cameraShowing(`dm-${viewport.name}`, 'gs1datamatrix', `(01)${GTIN}(11)261114(17)270500(10)${lot}(21)D-0042`);
      const { page, requests } = await dock(viewport);
      // The first route's JavaScript holds no decoder: neither the scanner's chunk nor the WebAssembly is fetched yet.
      expect(requests.filter((u) => /label-scanner-|\.wasm/.test(u))).toEqual([]);
      await harness.shot(page, 'scan-dock-before', viewport);

      const wasm = page.waitForResponse((r) => /\/zxing_reader\.[0-9a-f]+\.wasm$/.test(r.url()));
      await page.getByTestId('dock-lot-scan').click();
      const wasmResponse = await wasm;
      expect(wasmResponse.status()).toBe(200);
      // WebAssembly.instantiateStreaming needs this type; without it the decoder falls back or fails.
      expect(wasmResponse.headers()['content-type']).toMatch(/^application\/wasm/);

      await seen(page, 'dock-lot-label-source', 'filled in from the label’s batch (10)');
      expect(await lotValue(page)).toBe(lot);
      // GS1 General Specifications §3.4.7: (17) 270500, day 00 = the last day of May 2027.
      await seen(page, 'dock-lot-label-expiry', '31 May 2027');
      await seen(page, 'dock-lot-label-production', '14 Nov 2026');
      await seen(page, 'dock-lot-label-gtin', GTIN);
      await seen(page, 'dock-lot-label-serial', 'D-0042');
      expect(await page.getByTestId(SCANNER).count()).toBe(0);
      await harness.shot(page, 'scan-dock-filled', viewport);
      expect(requests.some((u) => /\/label-scanner-[0-9a-f]+\.js$/.test(u))).toBe(true);
      expectOnlyOwnOrigin(requests);

      // The label's dates fill the form's date fields, which the lot rules read.
      expect(await page.getByTestId('dock-expiry').inputValue()).toBe('2027-05-31');
      expect(await page.getByTestId('dock-production').inputValue()).toBe('2026-11-14');

      // The scanned lot is recorded like a typed one.
      await pickFittingDrum(page);
      await page.getByTestId('dock-indicator-intact').click();
      await page.getByTestId('dock-submit').click();
      await page.getByTestId('verdict-word').waitFor();
      if (viewport.name === 'phone') await page.getByTestId('check-details-toggle').click();
      await seen(page, 'record-lot', lot);
    },
    SLOW,
  );

  it(
    'GS1-128 and a plain QR code through the camera',
    async () => {
      await cameraShowing(`128-${viewport.name}`, 'gs1-128', `(01)${GTIN}(10)${lot}-B(17)280200`);
      let { page, requests } = await dock(viewport);
      await page.getByTestId('dock-lot-scan').click();
      await seen(page, 'dock-lot-label-expiry', '29 Feb 2028'); // day 00 of a leap February
      expect(await lotValue(page)).toBe(`${lot}-B`);
      expectOnlyOwnOrigin(requests);

      await cameraShowing(`qr-${viewport.name}`, 'qrcode', `${lot}-Q`);
      ({ page, requests } = await dock(viewport));
      await page.getByTestId('dock-lot-scan').click();
      await seen(page, 'dock-lot-label-source', 'read from the label’s code');
      expect(await lotValue(page)).toBe(`${lot}-Q`);
      expect(await page.getByTestId('dock-lot-label-expiry').count()).toBe(0);
      expectOnlyOwnOrigin(requests);
    },
    SLOW,
  );

  it(
    'a label with a wrong check digit gets a sentence, the scanner stays open, and cancelling leaves typing',
    async () => {
      await cameraShowing(`bad-${viewport.name}`, 'gs1datamatrix', `(01)09506000134359(10)${lot}`, true);
      const { page, requests } = await dock(viewport);
      await page.getByTestId('dock-lot-scan').click();
      await page.getByTestId(`${SCANNER}-video`).waitFor();
      await seen(page, `${SCANNER}-problem`, /GTIN \(01\) 09506000134359 fails its check digit: .* would be 2\. Scan another code, or type the lot number\./);
      await seen(page, `${SCANNER}-engine`, 'app’s own barcode decoder');
      // Glove-sized controls: at least 48 px tall.
      for (const id of [`${SCANNER}-cancel`, `${SCANNER}-photo`]) expect((await page.getByTestId(id).boundingBox())!.height).toBeGreaterThanOrEqual(48);
      await harness.shot(page, 'scan-open-bad-code', viewport);

      await page.getByTestId(`${SCANNER}-cancel`).click();
      expect(await page.getByTestId(SCANNER).count()).toBe(0);
      expect(await lotValue(page)).toBe('');
      // Typed by hand, the lot number meets the same rule (shared/lot-number.ts) before anything is sent.
      await page.getByTestId('dock-lot').fill('LOT#1');
      await page.getByTestId('dock-submit').click();
      await seen(page, 'dock-lot-error', 'The lot number holds “#”');
      await page.getByTestId('dock-lot').fill(`${lot}-T`);
      expect(await page.getByTestId('dock-lot-label').count()).toBe(0);
      expectOnlyOwnOrigin(requests);
    },
    SLOW,
  );
});

describe.each(VIEWPORTS)('the photo fallback on a plain-http intranet address at $name width ($width px)', (viewport: Viewport) => {
  // A name other than localhost on plain http is not a secure context: no camera, as at the plant.
  const host = 'dock.bungwise.test';
  const origin = () => harness.baseUrl.replace('127.0.0.1', host);
  const lot = `LR-${viewport.name === 'phone' ? 'P' : 'W'}-26-4800`;

  beforeAll(() => harness.launch([`--host-resolver-rules=MAP ${host} 127.0.0.1`]));

  it(
    'says why there is no camera, and reads a photo of the label instead',
    async () => {
      // Chromium's own note that it ignores the Cross-Origin-Opener-Policy header on plain http: expected here.
      harness.allowConsoleError(/Cross-Origin-Opener-Policy header has been ignored/);
      const { page, requests } = await dock(viewport, origin());
      expect(await page.evaluate(() => window.isSecureContext)).toBe(false);
      await page.getByTestId('dock-lot-scan').click();
      await seen(page, `${SCANNER}-camera-problem`, /plain http address.*secure one \(https, or localhost on this device\).*Take a photo of the label instead/);
      expect(await page.getByTestId(`${SCANNER}-video`).count()).toBe(0);
      await harness.shot(page, 'scan-photo-fallback', viewport);

      // A photo with no code in it first, then the label.
      const blank = toPng({ width: 800, height: 600, data: new Uint8ClampedArray(800 * 600 * 4).fill(255) });
      await page.getByTestId(`${SCANNER}-photo-input`).setInputFiles({ name: 'wall.png', mimeType: 'image/png', buffer: blank });
      await seen(page, `${SCANNER}-problem`, 'No QR, Data Matrix or Code 128 code was found in the photo');
      const photo = toPng(await labelPage('gs1datamatrix', `(01)${GTIN}(17)270400(10)${lot}`));
      await page.getByTestId(`${SCANNER}-photo-input`).setInputFiles({ name: 'label.png', mimeType: 'image/png', buffer: photo });
      await seen(page, 'dock-lot-label-expiry', '30 Apr 2027');
      expect(await lotValue(page)).toBe(lot);
      await harness.shot(page, 'scan-photo-filled', viewport);
      expectOnlyOwnOrigin(requests, origin());
    },
    SLOW,
  );
});

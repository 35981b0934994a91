import type { BrowserContext, BrowserContextOptions, Page } from 'playwright-core';
import { palettes, type Palette } from '../../components/palettes';
import { DEMO_REGISTRY_SUMMARY as demo } from '../../seeds/demo-registry';
import type { ThemeName } from '../../shared/themes';
import { BrowserHarness, seen, signInAs, VIEWPORTS, type Viewport } from '../support/browser';

// Light, dark and high contrast: the device's settings choose the palette unless the person chose one,
// every screen looked at passes axe-core's colour-contrast rule in each, and the drawings follow.

const harness = new BrowserHarness();
const AXE = require.resolve('axe-core/axe.min.js');
const lots = { fits: '', noFit: '' };

beforeAll(async () => {
  await harness.start();
  const signIn = await fetch(`${harness.baseUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: 'clerk@bungwise.example', password: 'bungwise-demo' }),
  });
  const { token } = (await signIn.json()) as { token: string };
  const api = async <T>(path: string, body?: unknown): Promise<T> => {
    const res = await fetch(`${harness.baseUrl}/api${path}`, {
      method: body ? 'POST' : 'GET',
      headers: { Authorization: `Bearer ${token}`, ...(body ? { 'Content-Type': 'application/json' } : {}) },
      body: body ? JSON.stringify(body) : undefined,
    });
    if (!res.ok) throw new Error(`${path} answered ${res.status}: ${await res.text()}`);
    return (await res.json()) as T;
  };
  const drum = async (part: string) => (await api<{ items: Array<{ id: string }> }>(`/drum-types?q=${encodeURIComponent(part)}`)).items[0].id;
  lots.fits = (await api<{ id: string }>('/receiving-checks', { lotNumber: 'LR-TH-26-0101', drumCount: 2, drumTypeId: await drum(demo.fittingDrum) })).id;
  lots.noFit = (await api<{ id: string }>('/receiving-checks', { lotNumber: 'SE-TH-0102', drumCount: 1, drumTypeId: await drum(demo.foreignDrum) })).id;
}, 60_000);
afterAll(() => harness.stop());

const contexts: BrowserContext[] = [];
async function open(viewport: Viewport, options: BrowserContextOptions) {
  // axe-core is injected as an inline script, which the app's Content-Security-Policy (rightly) refuses.
  const opened = await harness.page(viewport, { ...options, bypassCSP: true });
  contexts.push(opened.context);
  return opened;
}

afterEach(async () => {
  await Promise.all(contexts.splice(0).map((c) => c.close().catch(() => undefined)));
  expect(harness.takeConsoleErrors()).toEqual([]);
});

/** '#1A2230' as the browser computes it: 'rgb(26, 34, 48)'. */
const rgb = (hex: string) => `rgb(${[1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16)).join(', ')})`;

/** The document's own colours, the root's custom properties, the theme attribute and the browser bar colour. */
async function documentColours(page: Page) {
  return page.evaluate(() => {
    const body = getComputedStyle(document.body);
    return {
      background: body.backgroundColor,
      text: body.color,
      ink: getComputedStyle(document.documentElement).getPropertyValue('--bw-ink').trim(),
      attribute: document.documentElement.getAttribute('data-theme'),
      bar: document.querySelector('meta[name="theme-color"]')?.getAttribute('content') ?? null,
    };
  });
}

async function expectPalette(page: Page, p: Palette) {
  const seenColours = await documentColours(page);
  expect(seenColours.background).toBe(rgb(p.paper));
  expect(seenColours.text).toBe(rgb(p.ink));
  expect(seenColours.ink.toUpperCase()).toBe(p.ink);
  return seenColours;
}

/** axe-core's colour-contrast rule alone over the whole page; every violation is listed in the failure. */
async function expectNoContrastViolations(page: Page, where: string) {
  await page.addScriptTag({ path: AXE });
  const found = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (ctx: Document, opts: object) => Promise<{ violations: Array<{ nodes: Array<{ target: string[]; failureSummary?: string }> }> }> } }).axe;
    const result = await axe.run(document, { runOnly: { type: 'rule', values: ['color-contrast'] }, resultTypes: ['violations'] });
    return result.violations.flatMap((v) => v.nodes.map((n) => `${n.target.join(' ')}: ${n.failureSummary ?? ''}`));
  });
  expect({ where, violations: found }).toEqual({ where, violations: [] });
}

async function go(page: Page, path: string, ready: string) {
  await page.goto(`${harness.baseUrl}${path}`);
  await page.getByTestId(ready).first().waitFor();
}

async function shotOf(page: Page, testID: string, name: string, viewport: Viewport) {
  await page.getByTestId(testID).first().scrollIntoViewIfNeeded();
  await harness.shot(page, name, viewport);
}

// Each theme as the device asks for it: light by default, dark by colour scheme, high contrast by
// `prefers-contrast: more`.
const DEVICE: Array<[ThemeName, BrowserContextOptions]> = [
  ['light', { colorScheme: 'light' }],
  ['dark', { colorScheme: 'dark' }],
  ['contrast', { colorScheme: 'light', contrast: 'more' }],
];

// Each case opens five pages and runs axe on each: on a loaded two-core machine that passes 30 s.
const SLOW = 120_000;

describe.each(VIEWPORTS)('themes at $name width ($width px)', (viewport: Viewport) => {
  it.each(DEVICE)(
    'follows the device to the %s palette: sign-in, dock, registry and lot pages pass colour contrast',
    async (theme, options) => {
      const p = palettes[theme];
      const { page } = await open(viewport, options);
      await go(page, '/sign-in', 'sign-in-email');
      const doc = await expectPalette(page, p);
      expect(doc.attribute).toBeNull(); // no choice made: the media queries decide
      expect(doc.bar).toBe(theme === 'light' ? p.primary : p.nav);
      await expectNoContrastViolations(page, `${theme} sign-in`);
      await harness.shot(page, `theme-${theme}-sign-in`, viewport);

      await signInAs(page, harness.baseUrl, 'clerk@bungwise.example');
      await page.getByTestId('home-clerk').waitFor();
      await go(page, '/receive', 'dock-lot');
      await expectPalette(page, p);
      await expectNoContrastViolations(page, `${theme} dock`);
      await harness.shot(page, `theme-${theme}-dock`, viewport);

      await go(page, '/registry/drum-types', 'registry-table');
      await page.locator('[data-testid^="registry-row-"]').first().waitFor();
      await expectNoContrastViolations(page, `${theme} registry list`);
      await harness.shot(page, `theme-${theme}-registry`, viewport);

      // The drawing takes its colours from the same properties: the slurry is surfaceSunk, the walls ink.
      await go(page, `/receive/${lots.fits}`, 'verdict-word');
      await seen(page, 'verdict-word', 'FITS');
      // On a phone the details (with the drawing) start folded away.
      if (viewport.name === 'phone') await page.getByTestId('check-details-toggle').click();
      await page.getByTestId('drum-section').first().waitFor();
      const drawing = await page
        .getByTestId('drum-section')
        .locator('svg rect')
        .first()
        .evaluate((el) => getComputedStyle(el).fill);
      expect(drawing).toBe(rgb(p.surfaceSunk));
      const wall = await page
        .getByTestId('drum-section')
        .locator('svg rect')
        .nth(1)
        .evaluate((el) => getComputedStyle(el).stroke);
      expect(wall).toBe(rgb(p.ink));
      await expectNoContrastViolations(page, `${theme} lot that fits`);
      await shotOf(page, 'verdict-word', `theme-${theme}-lot-fits`, viewport);
      await shotOf(page, 'drum-section', `theme-${theme}-drawing-fits`, viewport);

      await go(page, `/receive/${lots.noFit}`, 'verdict-word');
      await seen(page, 'verdict-word', 'NO FIT');
      await expectNoContrastViolations(page, `${theme} lot that does not fit`);
      await shotOf(page, 'verdict-word', `theme-${theme}-lot-no-fit`, viewport);
    },
    SLOW,
  );

  it(
    'takes the high contrast palette when the device forces its colours',
    async () => {
      const { page } = await open(viewport, { forcedColors: 'active' });
      await go(page, '/sign-in', 'sign-in-email');
      const doc = await documentColours(page);
      expect(doc.ink.toUpperCase()).toBe(palettes.contrast.ink);
      expect(doc.bar).toBe(palettes.contrast.nav);
    },
    SLOW,
  );

  it(
    "keeps the person's choice over the device's: Light while the device is dark, after a reload, after sign-out, on another device",
    async () => {
      const { page } = await open(viewport, { colorScheme: 'dark' });
      await signInAs(page, harness.baseUrl, 'clerk@bungwise.example');
      await page.getByTestId('home-clerk').waitFor();
      await expectPalette(page, palettes.dark);

      await go(page, '/notices', 'appearance');
      await expect(page.getByTestId('appearance-theme-system').getAttribute('aria-checked')).resolves.toBe('true');
      await page.getByTestId('appearance-theme-light').click();
      await seen(page, 'appearance-status', 'Saved.');
      expect((await expectPalette(page, palettes.light)).attribute).toBe('light');
      await shotOf(page, 'appearance', 'theme-choice-light-on-dark-device', viewport);

      await page.reload();
      await page.getByTestId('appearance').waitFor();
      await expectPalette(page, palettes.light);
      await expect(page.getByTestId('appearance-theme-light').getAttribute('aria-checked')).resolves.toBe('true');

      await page.getByTestId('sign-out').click();
      await page.getByTestId('sign-in-email').waitFor();
      await expectPalette(page, palettes.light);

      // A new device (dark, nothing stored) takes the account's choice once the person signs in.
      const other = await open(viewport, { colorScheme: 'dark' });
      await go(other.page, '/sign-in', 'sign-in-email');
      await expectPalette(other.page, palettes.dark);
      await signInAs(other.page, harness.baseUrl, 'clerk@bungwise.example');
      await other.page.getByTestId('home-clerk').waitFor();
      await expectPalette(other.page, palettes.light);

      // High contrast as a choice, then back to following the device.
      await go(other.page, '/notices', 'appearance');
      await other.page.getByTestId('appearance-theme-contrast').click();
      await seen(other.page, 'appearance-status', 'Saved.');
      expect((await expectPalette(other.page, palettes.contrast)).attribute).toBe('contrast');
      await expectNoContrastViolations(other.page, 'notices and settings in high contrast');
      await shotOf(other.page, 'appearance', 'theme-choice-contrast', viewport);
      await other.page.getByTestId('appearance-theme-system').click();
      await seen(other.page, 'appearance-status', 'Saved.');
      expect((await expectPalette(other.page, palettes.dark)).attribute).toBeNull();
    },
    SLOW,
  );
});

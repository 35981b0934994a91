import fs from 'node:fs';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { chromium, type Browser, type BrowserContext, type BrowserContextOptions, type Page } from 'playwright-core';
import type { DataSource } from 'typeorm';
import { makeTestApp } from './app';
import { openTestDataSource, resetDatabase } from './db';
import { testStorage } from './services';

export const VIEWPORTS = [
  { name: 'phone', width: 390, height: 844 },
  { name: 'wide', width: 1280, height: 800 },
] as const;
export type Viewport = (typeof VIEWPORTS)[number];

export const WEB_DIR = process.env.BUNGWISE_WEB_DIR ?? path.resolve(__dirname, '..', '..', 'dist', 'web');
export const SHOTS_DIR = path.resolve(__dirname, '..', 'artifacts', 'screens');

export interface HarnessOptions {
  /** The address the server listens on; loopback unless a test needs the machine's own network address. */
  bind?: string;
  /** The host the browser loads the app from (`baseUrl`). */
  host?: string;
  /** Another copy of the export (a test that changes files, as a deploy would, works on its own copy). */
  webDir?: string;
}

/** The exported web build served by the real app on a free port, over a freshly reset database. */
export class BrowserHarness {
  readonly webDir: string;

  constructor(private readonly options: HarnessOptions = {}) {
    this.webDir = options.webDir ?? WEB_DIR;
  }

  ds!: DataSource;
  server!: Server;
  browser!: Browser;
  baseUrl = '';
  consoleErrors: string[] = [];
  private allowed: RegExp[] = [];
  private opened: BrowserContext[] = [];

  /** A test that provokes an error answer on purpose (a wrong password) allows the browser's log line for it. */
  allowConsoleError(pattern: RegExp): void {
    this.allowed.push(pattern);
  }

  /** The console errors since the last call, less the allowed ones; resets both. */
  takeConsoleErrors(): string[] {
    const errors = this.consoleErrors.splice(0).filter((e) => !this.allowed.some((p) => p.test(e)));
    this.allowed = [];
    return errors;
  }

  async start(): Promise<void> {
    if (!fs.existsSync(path.join(this.webDir, 'index.html'))) throw new Error('dist/web is missing: run the browser tests through `npm test`, which exports the web app.');
    this.ds = await openTestDataSource();
    await resetDatabase(this.ds);
    // Object storage (the local S3 stand-in `npm test` starts) for attachments and the files imports keep.
    const app = makeTestApp(this.ds, { webDir: this.webDir, signInLimits: { perAccount: 1000, perAddress: 1000 }, storage: testStorage() });
    const { bind = '127.0.0.1', host = '127.0.0.1' } = this.options;
    this.server = await new Promise<Server>((resolve) => {
      const s = app.listen(0, bind, () => resolve(s));
    });
    this.baseUrl = `http://${host.includes(':') ? `[${host}]` : host}:${(this.server.address() as AddressInfo).port}`;
    await this.launch();
    fs.mkdirSync(SHOTS_DIR, { recursive: true });
  }

  /** (Re)starts Chromium, with extra command-line switches when a test needs them (a fake camera: `fakeCameraArgs`). */
  async launch(extraArgs: string[] = []): Promise<void> {
    await this.browser?.close();
    this.browser = await chromium.launch({
      executablePath: process.env.BUNGWISE_CHROMIUM ?? '/usr/bin/chromium',
      args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run', ...extraArgs],
    });
  }

  async stop(): Promise<void> {
    await this.browser?.close();
    await new Promise((resolve) => this.server?.close(resolve));
    await this.ds?.destroy();
  }

  /**
   * A fresh context per viewport; every console error or page error is collected and fails the test. `options`
   * adds context settings such as the device's colour scheme (`colorScheme`, `contrast`, `forcedColors`).
   */
  async page(viewport: Viewport, options: BrowserContextOptions = {}): Promise<{ context: BrowserContext; page: Page }> {
    const context = await this.browser.newContext({ ...options, viewport: { width: viewport.width, height: viewport.height } });
    const page = this.watch(await context.newPage(), viewport);
    return { context, page };
  }

  /** `page`, with the context closed after the test by `closePages` (see `useHarness`), even when the test failed half-way. */
  async open(viewport: Viewport, options: BrowserContextOptions = {}): Promise<{ context: BrowserContext; page: Page }> {
    const opened = await this.page(viewport, options);
    this.opened.push(opened.context);
    return opened;
  }

  /** `open`, with the demo person of a role signed in (`signIn`). */
  async openAs(viewport: Viewport, role: string): Promise<{ context: BrowserContext; page: Page }> {
    const opened = await this.open(viewport);
    await this.signIn(opened.page, role);
    return opened;
  }

  /** Closes every context `open` gave, so a page left open cannot log errors into the next test. */
  async closePages(): Promise<void> {
    await Promise.all(this.opened.splice(0).map((c) => c.close().catch(() => undefined)));
  }

  /** Collects the page's console errors and page errors (for a further page opened in a context). */
  watch(page: Page, viewport: Viewport): Page {
    page.on('console', (msg) => {
      if (msg.type() === 'error') this.consoleErrors.push(`${viewport.name}: ${msg.text()}`);
    });
    page.on('pageerror', (err) => this.consoleErrors.push(`${viewport.name}: ${err.message}`));
    return page;
  }

  async shot(page: Page, name: string, viewport: Viewport): Promise<void> {
    await page.screenshot({ path: path.join(SHOTS_DIR, `${name}-${viewport.name}.png`), fullPage: true });
  }

  /** Screens scroll inside the app, so a full-page shot shows one screenful: scrolls the part to look at into view first. */
  async shotOf(page: Page, testID: string, name: string, viewport: Viewport): Promise<void> {
    await page.getByTestId(testID).first().scrollIntoViewIfNeeded();
    await this.shot(page, name, viewport);
  }

  /** Signs the demo person of a role in (`<role>@bungwise.example`) and waits for their home screen. */
  async signIn(page: Page, role: string): Promise<void> {
    await signInAs(page, this.baseUrl, `${role}@bungwise.example`);
    await page.getByTestId(`home-${role}`).waitFor();
  }
}

/**
 * The test file's hooks around its harness: `start` before the file's tests (the harness's own start unless the
 * file needs more), stop after them, and after each test the pages `open` gave are closed and any console error
 * in a page fails the test that caused it.
 */
export function useHarness(harness: BrowserHarness, start: () => Promise<void> = () => harness.start()): BrowserHarness {
  beforeAll(start, 60_000);
  afterAll(() => harness.stop());
  afterEach(async () => {
    await harness.closePages();
    expect(harness.takeConsoleErrors()).toEqual([]);
  });
  return harness;
}

/**
 * Chromium's fake camera playing a Y4M (or MJPEG) file in a loop, with the permission prompt accepted.
 * Switches of Chromium's own (media/capture/video/fake_video_capture_device_factory, content switches).
 */
export function fakeCameraArgs(videoFile: string): string[] {
  return ['--use-fake-device-for-media-stream', '--use-fake-ui-for-media-stream', `--use-file-for-fake-video-capture=${videoFile}`];
}

export async function signInAs(page: Page, baseUrl: string, email: string, password = 'bungwise-demo'): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByTestId('sign-in-email').fill(email);
  await page.getByTestId('sign-in-password').fill(password);
  await page.getByTestId('sign-in-submit').click();
}

/** The first element's text with that test id ('' when it has none). */
export const textOf = async (page: Page, testID: string) => (await page.getByTestId(testID).first().textContent()) ?? '';

/** Waits until the element's text matches: the page updates after the request a click started. */
export async function seen(page: Page, testID: string, pattern: RegExp | string, timeout = 10_000): Promise<void> {
  const re = typeof pattern === 'string' ? new RegExp(pattern.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')) : pattern;
  try {
    await page.getByTestId(testID).filter({ hasText: re }).first().waitFor({ timeout });
  } catch {
    throw new Error(`${testID} never showed ${re}; it shows "${await textOf(page, testID).catch(() => '(nothing)')}"`);
  }
}

/** Picks a record in a RecordPicker: opens it again if one is picked, searches, and takes the first match. */
export async function pickRecord(page: Page, testID: string, search: string) {
  const change = page.getByTestId(`${testID}-change`);
  if (await change.count()) await change.click();
  await page.getByTestId(`${testID}-search`).fill(search);
  const option = page
    .getByTestId(new RegExp(`^${testID}-option-`))
    .filter({ hasText: search })
    .first();
  await option.waitFor();
  await option.click();
  await page.getByTestId(`${testID}-selected`).waitFor();
}

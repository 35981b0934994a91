import type { Page } from 'playwright-core';
import { addDays, localDate } from '../../shared/dates';
import { DEMO_REGISTRY_SUMMARY as demo } from '../../seeds/demo-registry';
import { BrowserHarness, pickRecord, seen, useHarness, type Viewport, VIEWPORTS } from '../support/browser';

// The dock with no network, at a phone and a wide screen: after one visit the app opens offline, a lot is
// judged on the phone (marked provisional) and waits, the app is closed and opened again with the check
// still waiting, and when the network is back it is sent once and recorded once.

const harness = useHarness(new BrowserHarness());

// With no network, the app's own requests to the API fail, and the browser logs each one.
const OFFLINE_REQUEST = /ERR_INTERNET_DISCONNECTED|Failed to load resource/;

/** What the app keeps in IndexedDB (idb-keyval's store), as text. */
const keptText = (page: Page) =>
  page.evaluate(
    () =>
      new Promise<string>((resolve) => {
        const open = indexedDB.open('keyval-store');
        open.onsuccess = () => {
          const db = open.result;
          if (!db.objectStoreNames.contains('keyval')) return resolve('');
          const get = db.transaction('keyval').objectStore('keyval').get('bungwise-kept');
          get.onsuccess = () => resolve(String(get.result ?? ''));
          get.onerror = () => resolve('');
        };
        open.onerror = () => resolve('');
      }),
  );

async function waitKept(page: Page, text: string): Promise<void> {
  for (let i = 0; i < 60; i++) {
    if ((await keptText(page)).includes(text)) return;
    await page.waitForTimeout(250);
  }
  throw new Error(`the device never kept ${text}`);
}

const recorded = async (lot: string) => Number(((await harness.ds.query(`SELECT count(*) AS n FROM receiving_checks WHERE lot_number = $1`, [lot])) as Array<{ n: string }>)[0].n);

describe.each(VIEWPORTS)('the dock offline at $name width ($width px)', (viewport: Viewport) => {
  const tag = viewport.name === 'phone' ? 'P' : 'W';

  it('judges a lot on the phone, keeps it through a closed app, and sends it once when the network is back', async () => {
    const { context, page } = await harness.open(viewport);
    const zone = ((await harness.ds.query(`SELECT time_zone FROM site_settings LIMIT 1`)) as Array<{ time_zone: string }>)[0]?.time_zone ?? 'UTC';
    const today = localDate(new Date(), zone);
    const lot = `OFF-${tag}-${Date.now().toString(36).toUpperCase()}`;

    // One visit with the network: the shell and the registry snapshot are kept.
    await harness.signIn(page, 'clerk');
    await page.goto(`${harness.baseUrl}/receive`);
    await page.getByTestId('dock-lot').waitFor();
    await page.evaluate(async () => {
      await navigator.serviceWorker.ready;
    });
    await page.waitForFunction(() => navigator.serviceWorker.controller !== null);
    await waitKept(page, '"revision"');

    // No network: the app opens from the phone, says so, and judges the lot itself.
    await context.setOffline(true);
    harness.allowConsoleError(OFFLINE_REQUEST);
    await page.close();
    const offline = harness.watch(await context.newPage(), viewport);
    const res = await offline.goto(`${harness.baseUrl}/receive`);
    expect(res?.fromServiceWorker()).toBe(true);
    await offline.getByTestId('dock-lot').fill(lot);
    await offline.getByTestId('dock-count').fill('2');
    await pickRecord(offline, 'dock-slurry', demo.shelfLifeSlurry);
    await offline.getByTestId('dock-drum-selected').waitFor();
    await pickRecord(offline, 'dock-station', demo.fittingStation);
    await offline.getByTestId('dock-expiry').fill(addDays(today, 300));
    await offline.getByTestId('dock-indicator-intact').click();
    await offline.getByTestId('dock-submit').click();
    await offline.getByTestId('provisional-mark').waitFor();
    await seen(offline, 'provisional-mark', /Provisional: worked out on this phone/);
    await seen(offline, 'provisional-registry', /registry as of/);
    await seen(offline, 'lot-verdict-sentence', `Use dip tube ${demo.fittingTube} with head ${demo.fittingHead} at ${demo.fittingStation}.`);
    await seen(offline, `waiting-${lot}-state`, 'Waiting for the network');
    await seen(offline, 'network-strip', /No network.*1 dock check waiting to be sent/);
    await harness.shot(offline, 'offline-provisional-verdict', viewport);
    expect(await recorded(lot)).toBe(0);

    // Signing out would delete the waiting check: the first tap asks, and the clerk stays signed in.
    await offline.getByTestId('sign-out').click();
    await seen(offline, 'sign-out-guard', /1 dock check is still waiting to be sent\. Signing out deletes it/);
    await harness.shot(offline, 'offline-sign-out-guard', viewport);
    await offline.getByTestId('sign-out-keep').click();
    await offline.getByTestId('sign-out-guard').waitFor({ state: 'detached' });
    await seen(offline, 'current-role', 'Receiving clerk');

    // The app is closed and opened again, still offline: the check is still waiting.
    await waitKept(offline, lot);
    await offline.close();
    const again = harness.watch(await context.newPage(), viewport);
    await again.goto(`${harness.baseUrl}/receive`);
    await seen(again, `waiting-${lot}-state`, 'Waiting for the network');
    await harness.shot(again, 'offline-waiting-after-reopen', viewport);

    // The network is back: sent once, recorded once, with the server's verdict.
    await context.setOffline(false);
    await seen(again, `waiting-${lot}-state`, /^Sent and recorded: Use dip tube/, 30_000);
    expect(await recorded(lot)).toBe(1);
    await expectStripGone(again);
    await harness.shot(again, 'offline-sent', viewport);
    // A reload sends nothing again.
    await again.reload();
    await again.getByTestId('dock-lot').waitFor();
    await again.waitForTimeout(1500);
    expect(await recorded(lot)).toBe(1);
    const rows = (await harness.ds.query(`SELECT provisional->>'decision' AS decision, decision AS server FROM receiving_checks WHERE lot_number = $1`, [lot])) as Array<{
      decision: string;
      server: string;
    }>;
    expect(rows).toEqual([{ decision: 'accept', server: 'accept' }]);
  }, 180_000);
});

async function expectStripGone(page: Page) {
  await page.getByTestId('network-strip').waitFor({ state: 'detached', timeout: 15_000 });
}

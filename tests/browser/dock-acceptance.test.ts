import type { Page } from 'playwright-core';
import { addDays, localDate } from '../../shared/dates';
import { DEMO_REGISTRY_SUMMARY as demo } from '../../seeds/demo-registry';
import { BrowserHarness, pickRecord, seen, useHarness, type Viewport, VIEWPORTS } from '../support/browser';

// Lot acceptance at the dock, at a phone and a wide screen: an expired lot held, a frozen lot quarantined,
// a lot without its certificate held, then released by attaching it. Dates are relative to the site's
// today (the demo site keeps the server's zone), so the cases hold on any day.

const harness = useHarness(new BrowserHarness());

const PDF = Buffer.from('%PDF-1.4\n1 0 obj<<>>endobj\ntrailer<<>>\n%%EOF\n', 'latin1');

async function siteToday(): Promise<string> {
  const zone = ((await harness.ds.query(`SELECT time_zone FROM site_settings LIMIT 1`)) as Array<{ time_zone: string }>)[0]?.time_zone ?? 'UTC';
  return localDate(new Date(), zone);
}

/** What a person at the dock must get on the verdict screen: sentence first, nothing wider than the screen, the bar in reach, 48 px targets. */
async function expectDockVerdictScreen(page: Page, viewport: Viewport) {
  const size = page.viewportSize()!;
  const sentence = await page.getByTestId('lot-verdict-sentence').boundingBox();
  const banner = await page.getByTestId('lot-verdict').boundingBox();
  expect(sentence && banner).toBeTruthy();
  // The sentence is the first thing in the verdict and on screen without scrolling.
  expect(sentence!.y - banner!.y).toBeLessThan(40);
  expect(sentence!.y + sentence!.height).toBeLessThanOrEqual(size.height);
  const overflow = await page.evaluate(() =>
    Array.from(document.querySelectorAll('*'))
      .filter((el) => el.getBoundingClientRect().right > window.innerWidth + 1)
      .map((el) => el.getAttribute('data-testid') ?? el.tagName)
      .slice(0, 5),
  );
  expect(overflow).toEqual([]);
  const bar = await page.getByTestId('dock-screen-footer').boundingBox();
  expect(bar!.y).toBeGreaterThan(0);
  expect(bar!.y + bar!.height).toBeLessThanOrEqual(size.height);
  const small = await page.evaluate(() =>
    Array.from(document.querySelectorAll('[data-testid="dock-screen"] [role="button"], [data-testid="dock-screen"] a, [data-testid="dock-screen-footer"] [role="button"]'))
      .map((el) => ({ id: el.getAttribute('data-testid') ?? el.textContent?.slice(0, 30), r: el.getBoundingClientRect() }))
      .filter((x) => x.r.width > 0 && x.r.height > 0 && (x.r.height < 48 || x.r.width < 48))
      .map((x) => `${x.id} ${Math.round(x.r.width)}x${Math.round(x.r.height)}`),
  );
  expect(small).toEqual([]);
  void viewport;
}

async function recordLot(page: Page, lot: { number: string; slurry: string; drum: string; station: string; expiry?: string; production?: string; indicator: string }) {
  await page.goto(`${harness.baseUrl}/receive`);
  await page.getByTestId('dock-lot').fill(lot.number);
  await page.getByTestId('dock-count').fill('2');
  await pickRecord(page, 'dock-slurry', lot.slurry);
  await page.getByTestId('dock-drum-selected').waitFor();
  await pickRecord(page, 'dock-station', lot.station);
  if (lot.production) await page.getByTestId('dock-production').fill(lot.production);
  if (lot.expiry) await page.getByTestId('dock-expiry').fill(lot.expiry);
  await page.getByTestId(`dock-indicator-${lot.indicator}`).click();
  await page.getByTestId('dock-submit').click();
  await page.getByTestId('lot-verdict-sentence').waitFor();
}

describe.each(VIEWPORTS)('lot acceptance at the dock at $name width ($width px)', (viewport: Viewport) => {
  const tag = viewport.name === 'phone' ? 'P' : 'W';

  it('an expired lot is held, a frozen lot quarantined, each saying why and who releases it', async () => {
    const { page } = await harness.open(viewport);
    const today = await siteToday();
    await harness.signIn(page, 'clerk');

    // The form asks for the indicator: without it the field says so and nothing is recorded.
    await page.goto(`${harness.baseUrl}/receive`);
    await page.getByTestId('dock-lot').fill(`OX-${tag}-NOIND`);
    await page.getByTestId('dock-submit').click();
    await page.getByTestId('dock-error').waitFor();
    await seen(page, 'dock-screen', /Say what the temperature indicator shows/);

    await recordLot(page, { number: `OX-${tag}-EXP`, slurry: demo.shelfLifeSlurry, drum: demo.fittingDrum, station: demo.fittingStation, expiry: addDays(today, -1), indicator: 'intact' });
    await seen(page, 'lot-verdict-sentence', /^Hold: the lot expired on .*; an engineer must decide\.$/);
    await seen(page, 'lot-verdict-word', 'HOLD');
    await seen(page, 'dock-hold-status', /on hold/i);
    await seen(page, 'lot-blocker-shelf-life-who', /engineer or administrator/i);
    await expectDockVerdictScreen(page, viewport);
    await harness.shot(page, 'dock-accept-expired', viewport);

    await page.getByTestId('dock-new').click();
    await recordLot(page, { number: `OX-${tag}-FRZ`, slurry: demo.shelfLifeSlurry, drum: demo.fittingDrum, station: demo.fittingStation, expiry: addDays(today, 200), indicator: 'froze' });
    await seen(page, 'lot-verdict-sentence', 'Quarantine: the temperature indicator shows the lot froze; an engineer must decide.');
    await seen(page, 'lot-verdict-word', 'QUARANTINE');
    await seen(page, 'dock-hold-status', /in quarantine/i);
    await expectDockVerdictScreen(page, viewport);
    await harness.shot(page, 'dock-accept-froze', viewport);

    // The details are closed on a phone and open on a wide screen; the lot rules are in them.
    if (viewport.name === 'phone') {
      expect(await page.getByTestId('check-acceptance').count()).toBe(0);
      await page.getByTestId('check-details-toggle').click();
    }
    await seen(page, 'acceptance-temperature', /froze/);
    await seen(page, 'record-indicator', 'Shows frozen');

    // The history filters quarantined lots.
    await page.getByTestId('dock-history-link').click();
    await page.getByTestId('history-status-quarantined').click();
    await page.getByTestId(`history-row-OX-${tag}-FRZ`).waitFor();
    await page.getByTestId(`history-row-OX-${tag}-EXP`).waitFor({ state: 'detached' });
    await harness.shot(page, 'history-quarantined', viewport);
  }, 180_000);

  it('a lot without its certificate is held until it is attached from the bottom bar', async () => {
    const { page } = await harness.open(viewport);
    const today = await siteToday();
    await harness.signIn(page, 'clerk');
    await recordLot(page, { number: `W-${tag}-COA`, slurry: demo.certificateSlurry, drum: demo.twinBungDrum, station: demo.twoOpeningStation, production: addDays(today, -10), indicator: 'intact' });
    await seen(page, 'lot-verdict-sentence', 'Hold until the certificate of analysis is attached: this slurry needs it at the dock.');
    await seen(page, 'verdict-word', 'FITS');
    await seen(page, 'dock-hold-status', /Attaching the certificate of analysis lifts this hold/);
    await expectDockVerdictScreen(page, viewport);
    await harness.shot(page, 'dock-accept-certificate', viewport);

    const chooser = page.waitForEvent('filechooser');
    await page.getByTestId('certificate-attach').click();
    await (await chooser).setFiles({ name: 'coa.pdf', mimeType: 'application/pdf', buffer: PDF });
    await seen(page, 'lot-verdict-word', 'ACCEPT');
    await seen(page, 'lot-verdict-sentence', /^Use dip tube .* at Tungsten CMP feed B\.$/);
    await seen(page, 'dock-hold-status', /Released/);
    expect(await page.getByTestId('certificate-attach').count()).toBe(0);
    await harness.shot(page, 'dock-accept-certificate-attached', viewport);
  }, 180_000);
});

import type { Page } from 'playwright-core';
import { DEMO_REGISTRY_SUMMARY as demo } from '../../seeds/demo-registry';
import { BrowserHarness, pickRecord, seen, textOf, useHarness, type Viewport, VIEWPORTS } from '../support/browser';
import { resetDatabase } from '../support/db';

// The operations journeys: a clerk at the dock, a buyer planning a new source, a station's tube-set rotation,
// and the notices they raise. Lot numbers are invented and differ per viewport.

const harness = useHarness(new BrowserHarness());

/** Follows a navigation link and waits for the screen it leads to. */
async function follow(page: Page, link: string, ready: string) {
  await page.getByTestId(link).click();
  await page.getByTestId(ready).waitFor();
}

async function go(page: Page, path: string, ready: string) {
  await page.goto(`${harness.baseUrl}${path}`);
  await page.getByTestId(ready).waitFor();
}

/** A fitting lot recorded at the dock against the fitting station, through the form. */
async function recordFittingLot(page: Page, lot: string, drums: string) {
  await go(page, '/receive', 'dock-lot');
  await page.getByTestId('dock-lot').fill(lot);
  await page.getByTestId('dock-count').fill(drums);
  await page.getByTestId('dock-indicator-intact').click();
  await pickRecord(page, 'dock-drum', demo.fittingDrum);
  await pickRecord(page, 'dock-station', demo.fittingStation);
  await page.getByTestId('dock-submit').click();
  await page.getByTestId('verdict-word').waitFor();
}

/** On a phone the details under the verdict start closed. */
async function openDetails(page: Page, viewport: Viewport) {
  if (viewport.name === 'phone') await page.getByTestId('check-details-toggle').click();
}

describe.each(VIEWPORTS)('dock, sourcing and stations at $name width ($width px)', (viewport: Viewport) => {
  const tag = viewport.name === 'phone' ? 'P' : 'W';
  const fitLot = `LR-${tag}-26-3101`;
  const foreignLot = `SE-${tag}-0931`;
  const rotationLot = `LR-${tag}-26-3150`;
  const planName = `STI second source ${tag}`;

  // The harness resets once per file; the wide run starts again from the demo scenario so it does not
  // depend on what the phone run left at the station.
  beforeAll(async () => {
    if (viewport.name !== VIEWPORTS[0].name) await resetDatabase(harness.ds);
  }, 60_000);

  it('a clerk checks a fitting lot (FITS) and a measured foreign drum (NO FIT), holds it, and an engineer is told', async () => {
    const { context, page } = await harness.openAs(viewport, 'clerk');
    await follow(page, 'nav-receive', 'dock-lot');
    await page.getByTestId('handling-caution').waitFor();
    await harness.shot(page, 'dock-form', viewport);

    // Fitting lot: the drum type picked by search, checked against the station it is for.
    await page.getByTestId('dock-lot').fill(fitLot);
    await page.getByTestId('dock-count').fill('4');
    await page.getByTestId('dock-indicator-intact').click();
    await pickRecord(page, 'dock-drum', demo.fittingDrum);
    await pickRecord(page, 'dock-station', demo.fittingStation);
    await page.getByTestId('dock-submit').click();
    await seen(page, 'verdict-word', 'FITS');
    // The sentence first: what to use and where, in words.
    await seen(page, 'lot-verdict-sentence', `Use dip tube ${demo.fittingTube} with head ${demo.fittingHead} at ${demo.fittingStation}.`);
    await openDetails(page, viewport);
    await seen(page, 'check-use-tube', demo.fittingTube);
    await seen(page, 'check-use-head', demo.fittingHead);
    await seen(page, 'check-use-station', demo.fittingStation);
    // Demo data: the 836 mm tube in the 851 mm drum leaves a 15 mm gap, inside the 5 to 25 mm window.
    await seen(page, 'drum-section-tip', /Tip 15 mm above the bottom: inside/);
    await seen(page, 'record-lot', fitLot);
    await seen(page, 'record-checked', 'Noor Halvorsen');
    expect(await page.getByTestId('dock-hold').count()).toBe(0);
    await page.getByTestId('handling-caution').waitFor();
    await harness.shot(page, 'dock-fits', viewport);
    await harness.shotOf(page, 'drum-section', 'dock-fits-drawing', viewport);

    // Foreign lot: no label to go by, so the bung is measured and the thread identified.
    await page.getByTestId('dock-new').click();
    await page.getByTestId('dock-lot').fill(foreignLot);
    await page.getByTestId('dock-count').fill('2');
    await page.getByTestId('dock-indicator-not-fitted').click();
    await page.getByTestId('dock-drum-mode-describe').click();
    // A caliper reading alone cannot tell G 2 from 2 in NPS: the answer says so and what to measure.
    await page.getByTestId('dock-opening-0-diameter').fill('59.6');
    await page.getByTestId('dock-opening-0-identify').click();
    await seen(page, 'dock-opening-0-answer', /threads fit/);
    await seen(page, 'dock-opening-0-advice', /threads per inch/i);
    await harness.shot(page, 'dock-thread-ambiguous', viewport);
    await page.getByTestId('dock-opening-0-tpi').fill('11');
    await page.getByTestId('dock-opening-0-flank-55').click();
    await page.getByTestId('dock-opening-0-identify').click();
    // Pitch and flank rule out NPS; G 2 and the internal ISO 7-1 threads of the same size (Rc, Rp; R is cut
    // outside only, so a bung is never one) stay, with the
    // taper measurement that tells them apart, and the clerk picks the one the drum's label names.
    await seen(page, 'dock-opening-0-answer', /threads fit.*G 2, Rc 2, Rp 2.*taper/);
    await page.getByTestId('dock-opening-0-match-G-2').click();
    await expect(page.getByTestId('dock-opening-0-match-G-2').getAttribute('aria-checked')).resolves.toBe('true');
    await page.getByTestId('dock-depth').fill('818');
    await page.getByTestId('dock-submit').click();
    await seen(page, 'verdict-word', 'NO FIT');
    // Nothing fits: the check itself holds the lot, and says why across every tube, with no typed reason.
    await seen(page, 'lot-verdict-sentence', /^Hold: every G 2 tube on site is too long for this drum \(the shortest by \d+ mm\); an engineer must register a tube of 793 to 813 mm\.$/);
    await seen(page, 'dock-hold-status', /on hold/i);
    await seen(page, 'lot-blocker-fit-who', /engineer or administrator/i);
    expect(await page.getByTestId('dock-hold-panel').count()).toBe(0);
    await harness.shot(page, 'dock-held', viewport);
    await openDetails(page, viewport);
    await seen(page, 'drum-section-tip', /bottoms out/);
    await harness.shot(page, 'dock-no-fit', viewport);
    await harness.shotOf(page, 'drum-section', 'dock-no-fit-drawing', viewport);

    // History: both lots, filtered by verdict, each linking to its lot page.
    await page.getByTestId('dock-history-link').click();
    await page.getByTestId(`history-row-${fitLot}`).waitFor();
    await page.getByTestId(`history-row-${foreignLot}`).waitFor();
    await harness.shot(page, 'history-all', viewport);
    await page.getByTestId('history-verdict-no-fit').click();
    await page.getByTestId(`history-row-${fitLot}`).waitFor({ state: 'detached' });
    await page.getByTestId('history-status-on-hold').click();
    await page.getByTestId(`history-row-${foreignLot}`).click();
    await page.getByTestId('lot-hold-status').waitFor();
    await seen(page, 'lot-screen', `Lot ${foreignLot}`);
    await page.getByTestId('lot-history-empty').waitFor();
    await harness.shot(page, 'lot-held', viewport);
    await context.close();

    // The engineer sees the notice, opens the lot from it, and it is marked read.
    const eng = await harness.openAs(viewport, 'engineer');
    // A bell with the count in the phone's top bar; "1 new" beside Notices in the wide side bar.
    await seen(eng.page, 'notices-unread', /^1( new)?$/);
    await eng.page.getByTestId('notices-indicator').click();
    await eng.page.getByTestId('notices-list').waitFor();
    const notice = eng.page.locator('[data-testid^="notice-"][data-testid$="-title"]').filter({ hasText: foreignLot });
    await notice.waitFor();
    await harness.shot(eng.page, 'notices-unread', viewport);
    await eng.page.locator('[data-testid^="notice-"][data-testid$="-open"]').first().click();
    await eng.page.getByTestId('lot-hold-status').waitFor();
    await seen(eng.page, 'lot-screen', `Lot ${foreignLot}`);
    // Only an engineer releases a held lot, with a comment.
    await eng.page.getByTestId('lot-release-comment').fill('Tubes cut to 800 mm arrived from the workshop');
    await eng.page.getByTestId('lot-release').click();
    await seen(eng.page, 'lot-hold-status', /Released/);
    await eng.page.getByTestId('notices-indicator').click();
    await eng.page.getByTestId('notices-list').waitFor();
    await eng.page.getByTestId('notices-unread').waitFor({ state: 'detached' });
    expect(await eng.page.locator('[data-testid^="notice-"][data-testid$="-read"]').count()).toBe(0);
    await eng.context.close();
  }, 180_000);

  it('a buyer plans slurry from a new region: each station, what to order, and the warning to follow', async () => {
    const { context, page } = await harness.openAs(viewport, 'buyer');
    await follow(page, 'nav-sourcing', 'plan-form');

    // An empty plan is refused field by field, and a field's message goes as soon as it is filled.
    await page.getByTestId('plan-submit').click();
    await seen(page, 'plan-slurry-error', 'Name the slurry.');
    await page.getByTestId('plan-slurry').fill(planName);
    await page.getByTestId('plan-slurry-error').waitFor({ state: 'detached' });
    await seen(page, 'plan-start-error', 'Enter the first delivery date');
    await pickRecord(page, 'plan-supplier', 'Seoripul');
    await pickRecord(page, 'plan-drum', demo.foreignDrum);
    await page.getByTestId('plan-start').fill('2027-02-01');
    await page.getByTestId('plan-drums').fill('12');
    await seen(page, 'plan-sentence', new RegExp(`${planName} from .*\\(Korea\\) from 1 Feb 2027, 12 drums a month`));
    await harness.shot(page, 'sourcing-form', viewport);
    await page.getByTestId('plan-submit').click();

    await page.getByTestId('plan-screen').waitFor();
    await page.getByTestId('order-list').waitFor();
    await seen(page, 'order-list-totals', /tube sets|specification/);
    // Demo data: every approved G 2 tube is too long for the 818 mm Korean drum, so its own station cannot run it.
    await seen(page, 'plan-stations', 'NO FIT');
    await seen(page, `plan-station-${demo.fittingStation}`, 'NO FIT');
    await page.getByTestId('plan-warning-open').waitFor();
    await harness.shot(page, 'sourcing-impact', viewport);
    await harness.shotOf(page, 'plan-stations', 'sourcing-stations', viewport);

    // The warning: acknowledged, then resolved; the status filter follows it.
    await page.getByTestId('plan-warnings-link').click();
    const row = page.locator('[data-testid^="warning-row-"]').filter({ hasText: planName });
    await row.waitFor();
    await harness.shot(page, 'warnings-open', viewport);
    await row.locator('[data-testid$="-acknowledge"]').click();
    await row.locator('[data-testid$="-status"]').filter({ hasText: 'Acknowledged' }).waitFor();
    await page.getByTestId('warnings-filter-open').click();
    await row.waitFor({ state: 'detached' });
    await page.getByTestId('warnings-filter-acknowledged').click();
    await row.waitFor();
    await row.locator('[data-testid$="-resolve"]').click();
    await row.waitFor({ state: 'detached' });
    await page.getByTestId('warnings-filter-resolved').click();
    await row.locator('[data-testid$="-status"]').filter({ hasText: 'Resolved' }).waitFor();
    await harness.shot(page, 'warnings-resolved', viewport);

    // The plan is listed, and the buyer was told about the gap.
    await page.getByTestId('warnings-plans-link').click();
    await page.getByTestId(`plan-row-${planName}`).waitFor();
    await harness.shot(page, 'sourcing-plans', viewport);
    await page.getByTestId('notices-indicator').click();
    await page.locator('[data-testid^="notice-"][data-testid$="-title"]').filter({ hasText: planName }).waitFor();
    await context.close();
  }, 180_000);

  it("a station's tube sets rotate: a dirty set is refused, rinsed, put into standby with a lot, changed out; the lot shows the set", async () => {
    const { context, page } = await harness.openAs(viewport, 'clerk');
    await recordFittingLot(page, rotationLot, '1');

    await follow(page, 'nav-stations', 'stations-list');
    await seen(page, `station-${demo.fittingStation}-set-${demo.dirtyTubeSet}`, /Cleaning/);
    await page.getByTestId('handling-caution').waitFor();
    await harness.shot(page, 'stations-list', viewport);
    await page.getByTestId(`station-link-${demo.fittingStation}`).click();
    await page.getByTestId('set-Set C').waitFor();
    await seen(page, 'set-Set C-rinse-status', /Not rinsed since its last drum/);

    // The demo's dirty Set C straight into a drum: refused, with the rinse rule's reason.
    await page.getByTestId('set-Set C-standby').click();
    await page.getByTestId(`standby-lot-${rotationLot}`).click();
    harness.allowConsoleError(/status of 409 \(Conflict\)/);
    await page.getByTestId('set-Set C-standby-panel-confirm').click();
    await seen(page, 'rotation-message', /Refused.*not been rinsed since its last drum/s);
    await harness.shot(page, 'stations-refused', viewport);

    // Rinsed with DI water: clean and ready, in the rinse log with who.
    await page.getByTestId('set-Set C-rinse-note').fill('DI water, three flushes');
    await page.getByTestId('set-Set C-rinse').click();
    await seen(page, 'rotation-message', /Set C rinsed with DI water/);
    await seen(page, 'set-Set C-state', /Clean and ready/);
    await seen(page, 'rinse-log', /Set C rinsed by Noor Halvorsen/);

    // The standby drum is taken by Set B: change out first; Set A comes out dirty and is refused too.
    await page.getByTestId('change-out').click();
    await seen(page, 'rotation-message', /Changed out: Set B is online/);
    await seen(page, 'set-Set A-state', /Cleaning/);
    await page.getByTestId('set-Set A-standby').click();
    await page.getByTestId('set-Set A-standby-panel-lot-number').fill(rotationLot);
    await page.getByTestId('set-Set A-standby-panel-confirm').click();
    await seen(page, 'rotation-message', /Refused.*not been rinsed since its last drum/s);

    // Set C into the standby drum of the lot checked at the dock, then online at the next change-out.
    await page.getByTestId('set-Set C-standby').click();
    await page.getByTestId(`standby-lot-${rotationLot}`).click();
    await page.getByTestId('set-Set C-standby-panel-serial').fill('D-7731');
    await page.getByTestId('set-Set C-standby-panel-confirm').click();
    await seen(page, 'rotation-message', /Set C is in the standby drum/);
    await seen(page, 'set-Set C-drum', rotationLot);
    await page.getByTestId('change-out').click();
    await seen(page, 'rotation-message', new RegExp(`Set C is online with lot ${rotationLot}`));
    await seen(page, 'set-Set C-state', /Online/);
    await seen(page, 'change-outs', /Set C went online in lot/);
    await harness.shot(page, 'stations-board', viewport);
    await harness.shotOf(page, 'set-Set C', 'stations-sets', viewport);
    await harness.shotOf(page, 'change-outs', 'stations-logs', viewport);

    // The lot's page lists the hardware that touched it.
    await page.getByTestId(`change-out-lot-${rotationLot}`).click();
    // The lot page may first show the check as cached at the dock; it refreshes with the change-out.
    await seen(page, 'lot-history', 'Tube set Set C');
    const history = await textOf(page, 'lot-history');
    expect(history).toContain(demo.fittingStation);
    expect(history).toContain('Tube set Set C');
    expect(history).toContain(demo.fittingHead);
    expect(history).toContain('D-7731');
    await harness.shotOf(page, 'lot-history', 'lot-history', viewport);
    await context.close();
  }, 180_000);
});

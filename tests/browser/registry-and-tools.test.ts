import type { Page } from 'playwright-core';
import { BrowserHarness, useHarness, type Viewport, VIEWPORTS } from '../support/browser';

const harness = useHarness(new BrowserHarness());

const ROW_PREFIX = 'registry-row-';

/** The test ids of the rows (or phone cards) on screen, in order, without the prefix. */
async function rowIds(page: Page): Promise<string[]> {
  return page.$$eval(`[data-testid^="${ROW_PREFIX}"]`, (els, prefix) => els.map((e) => e.getAttribute('data-testid')!.slice(prefix.length)), ROW_PREFIX);
}

/** Waits until the rows satisfy `ok` (the list refetches after a debounced search or a sort). */
async function waitForRows(page: Page, ok: (ids: string[]) => boolean, what: string): Promise<string[]> {
  const deadline = Date.now() + 10_000;
  let ids: string[] = [];
  while (Date.now() < deadline) {
    ids = await rowIds(page);
    if (ids.length && ok(ids)) return ids;
    await page.waitForTimeout(100);
  }
  throw new Error(`rows never became ${what}; last seen: ${ids.join(', ')}`);
}

async function open(page: Page, path: string, testID: string): Promise<void> {
  await page.goto(`${harness.baseUrl}${path}`);
  await page.getByTestId(testID).waitFor();
}

/** A fresh page with the role signed in, on the screen at `path` once `testID` shows. */
async function openAt(viewport: Viewport, role: string, path: string, testID: string) {
  const opened = await harness.openAs(viewport, role);
  await open(opened.page, path, testID);
  return opened;
}

/** Opens a row's detail page: the name link in the row on a wide screen, the whole card on a phone. */
async function openRow(page: Page, viewport: Viewport, id: string): Promise<void> {
  const row = page.getByTestId(`${ROW_PREFIX}${id}`);
  if (viewport.name === 'wide') await row.getByRole('link').first().click();
  else await row.click();
}

/** Sorts the list by a column: its header on a wide screen, the sort chooser on a phone. */
async function sortBy(page: Page, viewport: Viewport, key: string, order: 'asc' | 'desc'): Promise<void> {
  if (viewport.name === 'wide') {
    // The header cycles ascending / descending; its aria-sort says which is on.
    const id = `registry-table-sort-${key}`;
    const want = order === 'asc' ? 'ascending' : 'descending';
    const current = () => page.getByTestId(id).evaluate((el) => el.parentElement?.getAttribute('aria-sort'));
    for (let i = 0; i < 2 && (await current()) !== want; i++) {
      const before = await current();
      await page.getByTestId(id).click();
      await page.waitForFunction(([tid, prev]) => document.querySelector(`[data-testid="${tid}"]`)?.parentElement?.getAttribute('aria-sort') !== prev, [id, before] as const);
    }
    expect(await current()).toBe(want);
    return;
  }
  await page.getByTestId('registry-table-sort-menu').click();
  await page.getByTestId(`registry-table-sort-by-${key}`).click();
  await page.getByTestId(`registry-table-sort-order-${order}`).click();
  await page.getByTestId('registry-table-sort-menu').click();
}

const text = (page: Page, testID: string) => page.getByTestId(testID).innerText();

/**
 * A screenshot of the whole screen: pages scroll inside the app's own scroll view, so the window is made
 * tall enough to show all of it for the picture, then put back.
 */
async function shot(page: Page, name: string, viewport: Viewport): Promise<void> {
  const hidden = await page.evaluate(() => {
    let most = 0;
    for (const el of Array.from(document.querySelectorAll('div'))) {
      const overflow = getComputedStyle(el).overflowY;
      if ((overflow === 'auto' || overflow === 'scroll') && el.scrollHeight > el.clientHeight) most = Math.max(most, el.scrollHeight - el.clientHeight);
    }
    return most;
  });
  if (hidden > 0) await page.setViewportSize({ width: viewport.width, height: viewport.height + hidden });
  await page.waitForTimeout(150);
  await harness.shot(page, name, viewport);
  if (hidden > 0) await page.setViewportSize({ width: viewport.width, height: viewport.height });
}

describe.each(VIEWPORTS)('registry at $name width ($width px)', (viewport) => {
  it('searches, sorts, filters and pages the dip tubes and pairings', async () => {
    const { context, page } = await openAt(viewport, 'engineer', '/registry/dip-tubes', 'registry-table');
    // The demo registry has ten dip tubes: one full page.
    const all = await waitForRows(page, (ids) => ids.length === 10, 'ten dip tubes');
    expect(all).toContain('RFH-DT-N2-836');
    await shot(page, 'registry-dip-tubes', viewport);

    // Search narrows the list (debounced, answered by the server).
    await page.getByTestId('registry-search').fill('B56');
    const b56 = await waitForRows(page, (ids) => ids.length === 3, 'the three 56x4 buttress tubes');
    expect(b56.sort()).toEqual(['RFH-DT-B56-368', 'RFH-DT-B56-372', 'RFH-DT-B56-865']);

    // A search that matches nothing says so and offers the way back.
    await page.getByTestId('registry-search').fill('xyz');
    await page.getByTestId('state-empty').waitFor();
    await expect(text(page, 'state-empty')).resolves.toMatch(/No dip tubes match “xyz”/);
    await shot(page, 'registry-dip-tubes-empty', viewport);
    await page.getByRole('button', { name: 'Clear the search' }).click();
    await waitForRows(page, (ids) => ids.length === 10, 'all ten again');

    // Sorting by length changes the order: shortest first, then longest first.
    await sortBy(page, viewport, 'lengthMm', 'asc');
    await waitForRows(page, (ids) => ids[0] === 'RFH-DT-B56-368' && ids[1] === 'RFH-DT-B56-372', 'shortest first');
    await sortBy(page, viewport, 'lengthMm', 'desc');
    await waitForRows(page, (ids) => ids[0] === 'RFH-DT-B56-865' && ids[1] === 'RFH-DT-B70-862', 'longest first');

    // Filter by thread code: only the G 2 tubes.
    await page.getByTestId('filter-thread').click();
    await page.getByTestId('filter-thread-option-G-2').click();
    const g2 = await waitForRows(page, (ids) => ids.length === 2, 'the two G-2 tubes');
    expect(g2.sort()).toEqual(['AFC-TR-G2-825', 'AFC-TR-G2-830']);
    await shot(page, 'registry-dip-tubes-filtered', viewport);

    // Pairings: twelve in the demo, ten a page; page 2 shows the other two.
    await page.getByTestId('registry-nav-pairings').click();
    await page.getByTestId('registry-pairings').waitFor();
    const first = await waitForRows(page, (ids) => ids.length === 10 && ids[0]!.includes('+'), 'the first ten pairings');
    await expect(text(page, 'pager-status')).resolves.toMatch(/1–10 of 12 pairings/);
    await shot(page, 'registry-pairings', viewport);
    await page.getByTestId('pager-next').click();
    const second = await waitForRows(page, (ids) => ids.length === 2, 'the last two pairings');
    expect(second.filter((id) => first.includes(id))).toEqual([]);
    await expect(text(page, 'pager-status')).resolves.toMatch(/11–12 of 12 pairings · page 2 of 2/);

    // Status filter: the two drafts.
    await page.getByTestId('filter-pairingStatus').click();
    await page.getByTestId('filter-pairingStatus-option-draft').click();
    // Page 2 also shows two rows, N2-790 among them, until the filtered answer arrives: wait for the drafts' own pager line.
    await page
      .getByTestId('pager-status')
      .filter({ hasText: /^1–2 of 2 pairings/ })
      .waitFor();
    const drafts = await waitForRows(page, (ids) => ids.length === 2, 'the two drafts');
    expect(drafts.sort()).toEqual(['RFH-DT-B70-862+RFH-DH-C1919-U', 'RFH-DT-N2-790+RFH-DH-C1919-OX']);
    await context.close();
  }, 90_000);

  it('filters drum types by region and shows a drum type with its relations, checks and lengths in mm or in', async () => {
    const { context, page } = await openAt(viewport, 'engineer', '/registry/drum-types', 'registry-table');
    await waitForRows(page, (ids) => ids.length === 6, 'the six drum types');
    await expect(page.getByTestId('registry-new').getAttribute('href')).resolves.toBe('/registry/drum-types/new');
    await shot(page, 'registry-drum-types', viewport);

    await page.getByTestId('filter-region').click();
    await page.getByTestId('filter-region-option-JP').click();
    await waitForRows(page, (ids) => ids.length === 1 && ids[0] === 'KFC-P200-B5670', 'only the Japanese drum');
    await page.getByTestId('filter-clear').click();
    await waitForRows(page, (ids) => ids.length === 6, 'all six again');

    await openRow(page, viewport, 'CMA-D208-SL');
    await page.getByTestId('drum-facts').waitFor();
    expect(new URL(page.url()).pathname).toMatch(/^\/registry\/drum-types\/[0-9a-f-]{36}$/);
    // The openings, the pairings for its threads and the slurry that arrives in it.
    await expect(text(page, 'drum-openings')).resolves.toMatch(/NPS-2/);
    await page.getByTestId('drum-pairing-RFH-DT-N2-836+RFH-DH-C1919-OX').waitFor();
    await expect(text(page, 'drum-slurries')).resolves.toMatch(/Mesa OxPlane 30 fumed silica/);
    // The server's checks: 851 mm deep, site window 5 to 25 mm, so the target length is 836 mm; the 1A1 code agrees.
    await page.getByTestId('drum-packaging-findings').waitFor();
    await expect(text(page, 'drum-finding-code')).resolves.toMatch(/1A1: steel drum/);
    const editHref = await page.getByTestId('registry-edit').getAttribute('href');
    expect(editHref).toMatch(/^\/registry\/drum-types\/edit\/[0-9a-f-]{36}$/);

    // The length unit: 851 mm is 33.504 in (851 / 25.4); the preference is kept on the server.
    await page.getByTestId('unit-toggle-mm').click();
    await page.waitForFunction(() => document.querySelector('[data-testid="drum-inside-depth"]')?.textContent === '851.0 mm');
    await expect(text(page, 'drum-recommended-target')).resolves.toBe('836.0 mm');
    await shot(page, 'registry-drum-type-detail', viewport);
    await page.getByTestId('unit-toggle-in').click();
    await page.waitForFunction(() => document.querySelector('[data-testid="drum-inside-depth"]')?.textContent === '33.504 in');
    await expect(text(page, 'drum-recommended-target')).resolves.toBe('32.913 in');
    await shot(page, 'registry-drum-type-detail-inches', viewport);
    await page.getByTestId('unit-toggle-mm').click();
    await page.waitForFunction(() => document.querySelector('[data-testid="drum-inside-depth"]')?.textContent === '851.0 mm');

    // From the drum to its slurry, and from there back to the drum.
    await page.getByTestId('drum-slurry-Mesa OxPlane 30 fumed silica').getByRole('link').click();
    await page.getByTestId('slurry-facts').waitFor();
    await shot(page, 'registry-slurry-detail', viewport);
    await page.getByTestId('slurry-drum-link').click();
    await page.getByTestId('drum-facts').waitFor();
    await context.close();
  }, 90_000);

  it('shows which drum types a tube threads into and which stations use a connector', async () => {
    const { context, page } = await openAt(viewport, 'engineer', '/registry/dip-tubes', 'registry-table');
    await waitForRows(page, (ids) => ids.includes('RFH-DT-N2-836'), 'listed');
    await openRow(page, viewport, 'RFH-DT-N2-836');
    await page.getByTestId('tube-fits').waitFor();
    // The three NPS-2 drums have a 2 in NPS bung.
    await page.getByTestId('tube-fits-CMA-D208-SL').waitFor();
    await page.getByTestId('tube-fits-CMA-D208-PT').waitFor();
    await expect(text(page, 'tube-length')).resolves.toBe('836.0 mm');
    await expect(text(page, 'tube-pairings')).resolves.toMatch(/RFH-DH-C1919-OX/);
    await shot(page, 'registry-dip-tube-detail', viewport);

    await page.getByTestId('tube-pairing-RFH-DH-C1919-OX').getByRole('link', { name: 'Dispense head' }).click();
    await page.getByTestId('connector-stations').waitFor();
    await page.getByTestId('connector-station-Oxide CMP feed A').waitFor();
    await shot(page, 'registry-connector-detail', viewport);

    await page.getByTestId('registry-nav-suppliers').click();
    await waitForRows(page, (ids) => ids.length === 7, 'the seven suppliers');
    await shot(page, 'registry-suppliers', viewport);
    await openRow(page, viewport, 'Ridgeback Fluid Hardware');
    await page.getByTestId('supplier-relations').waitFor();
    await expect(text(page, 'supplier-dip-tubes')).resolves.toMatch(/8 dip tubes registered/);
    // The supplier's tubes: the list opens narrowed to it.
    await page.getByTestId('supplier-dip-tubes').getByRole('link').click();
    await page.getByTestId('filter-supplier-clear').waitFor();
    await waitForRows(page, (ids) => ids.length === 8 && ids.every((id) => id.startsWith('RFH-')), 'the eight Ridgeback tubes');
    await context.close();
  }, 90_000);

  it('offers no New or Edit to a receiving clerk', async () => {
    const { context, page } = await openAt(viewport, 'clerk', '/registry/slurries', 'registry-table');
    await waitForRows(page, (ids) => ids.length === 5, 'the five slurries');
    expect(await page.getByTestId('registry-new').count()).toBe(0);
    await shot(page, 'registry-slurries-clerk', viewport);
    await openRow(page, viewport, 'Seoripul STI-Select 3');
    await page.getByTestId('slurry-facts').waitFor();
    expect(await page.getByTestId('registry-edit').count()).toBe(0);
    await context.close();
  }, 60_000);
});

describe.each(VIEWPORTS)('tools at $name width ($width px)', (viewport) => {
  it('identifies 2 in NPS and calls a 60 mm diameter-only reading ambiguous', async () => {
    const { context, page } = await openAt(viewport, 'clerk', '/tools/thread', 'thread-form');
    // ASME B1.20.1: 2 in pipe, OD 2.375 in, 11.5 threads per inch; straight (NPS) when there is no taper.
    await page.getByTestId('thread-diameter').fill('2.375');
    await page.getByTestId('thread-unit-in').click();
    await page.getByTestId('thread-count').fill('11.5');
    await page.getByTestId('thread-taper-parallel').click();
    await page.getByTestId('thread-submit').click();
    await page.getByTestId('thread-identified').waitFor();
    const candidates = await page.$$eval('[data-testid^="thread-candidate-"]', (els) => els.map((e) => e.getAttribute('data-testid')));
    expect(candidates).toEqual(['thread-candidate-NPS-2']);
    await shot(page, 'tools-thread-identified', viewport);

    // A caliper reading alone near 60 mm fits G 2, 2 in NPS and 2 in NPT.
    await page.getByTestId('thread-diameter').fill('60');
    await page.getByTestId('thread-unit-mm').click();
    await page.getByTestId('thread-count').fill('');
    await page.getByTestId('thread-taper-unknown').click();
    await page.getByTestId('thread-submit').click();
    await page.getByTestId('thread-ambiguous').waitFor();
    for (const code of ['G-2', 'NPS-2', 'NPT-2']) await page.getByTestId(`thread-candidate-${code}`).waitFor();
    await expect(text(page, 'thread-advice')).resolves.toMatch(/threads per inch/i);
    await shot(page, 'tools-thread-ambiguous', viewport);
    await context.close();
  }, 60_000);

  it('gives the 2.25 velocity ratio for 19.05 / 12.7 mm ports and plots it', async () => {
    const { context, page } = await openAt(viewport, 'engineer', '/tools/flow', 'flow-form');
    await page.getByTestId('flow-value').fill('20');
    await page.getByTestId('flow-unit-L/min').click();
    await page.getByTestId('flow-feed-bore').fill('19.05');
    await page.getByTestId('flow-return-bore').fill('12.7');
    await page.getByTestId('flow-submit').click();
    // (19.05 / 12.7)^2 = 1.5^2 = 2.25 [derived]
    await page.getByTestId('flow-result').waitFor();
    await expect(text(page, 'flow-ratio')).resolves.toBe('2.25');
    await expect(text(page, 'flow-return-regime')).resolves.toMatch(/Laminar|Transitional|Turbulent/);
    // The plot is drawn: two lines (return and feed) and the entered point.
    await page.waitForFunction(() => document.querySelectorAll('[data-testid="flow-plot"] svg polyline').length === 2);
    expect(await page.locator('[data-testid="flow-plot"] svg circle').count()).toBeGreaterThanOrEqual(1);
    await expect(page.getByTestId('flow-plot').innerText()).resolves.toMatch(/Flow \(L\/min\)[\s\S]*Velocity \(m\/s\)|Velocity \(m\/s\)[\s\S]*Flow \(L\/min\)/);
    await page.getByTestId('flow-plot').scrollIntoViewIfNeeded();
    await shot(page, 'tools-flow', viewport);
    await context.close();
  }, 60_000);

  it('explains 1A1 and says plainly when a code is not a packaging code', async () => {
    const { context, page } = await openAt(viewport, 'buyer', '/tools/packaging-code', 'packaging-form');
    // UN Model Regulations 6.1.2 / 49 CFR 178.502: 1 drum, A steel, 1 non-removable head [pub]
    await page.getByTestId('packaging-code').fill('1A1');
    await page.getByTestId('packaging-submit').click();
    await page.getByTestId('packaging-result').waitFor();
    await expect(text(page, 'packaging-explanation')).resolves.toMatch(/1A1: steel drum, tight head/);
    await shot(page, 'tools-packaging', viewport);

    // The server answers 400 for a code that is not one; the browser logs that request, on purpose here.
    harness.allowConsoleError(/status of 400/);
    await page.getByTestId('packaging-code').fill('9Z9');
    await page.getByTestId('packaging-code').press('Enter');
    await page.getByTestId('packaging-error').waitFor();
    await expect(text(page, 'packaging-error')).resolves.toMatch(/9Z9/);
    await shot(page, 'tools-packaging-error', viewport);

    await page.getByTestId('packaging-example-31HA1').click();
    await page.getByTestId('packaging-result').waitFor();
    await expect(text(page, 'packaging-explanation')).resolves.toMatch(/31HA1/);
    await context.close();
  }, 60_000);
});

describe('keyboard on a wide screen', () => {
  const wide = VIEWPORTS.find((v) => v.name === 'wide')!;

  it('sorts from a column header and opens a row with the keyboard alone', async () => {
    const { context, page } = await openAt(wide, 'engineer', '/registry/connectors', 'registry-table');
    const before = await waitForRows(page, (ids) => ids.length === 8, 'the eight connectors');
    await page.getByTestId('registry-table-sort-partNumber').focus();
    await page.keyboard.press('Enter');
    const after = await waitForRows(page, (ids) => ids[0] !== before[0], 'in the other order');
    expect(after).toEqual([...before].reverse());
    // Tab moves on through the other sortable headers to the first row's name, a link with a visible focus ring.
    const inFirstRow = () => page.evaluate((id) => !!document.activeElement?.closest(`[data-testid="${id}"]`) && document.activeElement?.tagName === 'A', `${ROW_PREFIX}${after[0]}`);
    for (let i = 0; i < 6 && !(await inFirstRow()); i++) await page.keyboard.press('Tab');
    expect(await inFirstRow()).toBe(true);
    expect(await page.evaluate(() => getComputedStyle(document.activeElement!).outlineStyle)).not.toBe('none');
    await shot(page, 'registry-keyboard-focus', wide);
    await page.keyboard.press('Enter');
    await page.getByTestId('connector-facts').waitFor();
    await shot(page, 'registry-keyboard-connector', wide);
    await context.close();
  }, 60_000);
});

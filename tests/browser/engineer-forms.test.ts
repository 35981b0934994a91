import type { Page } from 'playwright-core';
import { BrowserHarness, signInAs, useHarness, type Viewport, VIEWPORTS } from '../support/browser';

const harness = useHarness(new BrowserHarness());

// Invented part numbers, unique per run and viewport so the two viewports never collide.
const RUN = Date.now().toString(36).toUpperCase();
const part = (what: string, viewport: Viewport) => `BW-${what}-${viewport.name.toUpperCase()}-${RUN}`;
const UUID = '[0-9a-f-]{36}';

async function signIn(page: Page, email: string): Promise<void> {
  await signInAs(page, harness.baseUrl, email);
  await page.getByTestId('current-user').waitFor();
}

/** A fresh page with that person signed in. */
async function openAs(viewport: Viewport, email: string) {
  const opened = await harness.page(viewport);
  await signIn(opened.page, email);
  return opened;
}

/** A fresh page, signed in, on the screen at `path` once `ready` shows. */
async function openAt(viewport: Viewport, email: string, path: string, ready: string) {
  const opened = await openAs(viewport, email);
  await opened.page.goto(`${harness.baseUrl}${path}`);
  await opened.page.getByTestId(ready).waitFor();
  return opened;
}

/** A bearer token for the API, as another person working at the same time. */
async function tokenFor(page: Page, email: string): Promise<string> {
  const res = await page.request.post(`${harness.baseUrl}/api/auth/sign-in`, { data: { email, password: 'bungwise-demo' } });
  expect(res.status()).toBe(200);
  return (await res.json()).token as string;
}

async function apiGet(page: Page, token: string, path: string) {
  const res = await page.request.get(`${harness.baseUrl}/api${path}`, { headers: { Authorization: `Bearer ${token}` } });
  expect(res.status()).toBe(200);
  return res.json();
}

/** Searches a record picker and chooses the first match showing `text`. */
async function pick(page: Page, testID: string, search: string, text = search): Promise<void> {
  if ((await page.getByTestId(`${testID}-search`).count()) === 0) await page.getByTestId(`${testID}-change`).click();
  await page.getByTestId(`${testID}-search`).fill(search);
  await page.locator(`[data-testid^="${testID}-option-"]`).filter({ hasText: text }).first().click();
  await expect(page.getByTestId(`${testID}-selected`).textContent()).resolves.toContain(text);
}

/**
 * A screenshot of the whole page: the app scrolls inside its own container, so the window is made tall
 * enough to show all of it, then put back.
 */
async function shot(page: Page, name: string, viewport: Viewport): Promise<void> {
  const extra = await page.evaluate(() => Math.max(0, ...Array.from(document.querySelectorAll('div')).map((d) => d.scrollHeight - d.clientHeight)));
  await page.setViewportSize({ width: viewport.width, height: Math.min(viewport.height + extra, 8000) });
  await page.waitForTimeout(150);
  await harness.shot(page, name, viewport);
  await page.setViewportSize({ width: viewport.width, height: viewport.height });
}

/** Reads until the value is the wanted one (Jest has no polling expect); fails with the last value read. */
async function until<T>(read: () => Promise<T>, want: T, timeout = 5_000): Promise<void> {
  const end = Date.now() + timeout;
  let last = await read();
  while (last !== want && Date.now() < end) {
    await new Promise((r) => setTimeout(r, 50));
    last = await read();
  }
  expect(last).toBe(want);
}

async function waitForPath(page: Page, pattern: RegExp): Promise<RegExpMatchArray> {
  await page.waitForURL((url) => pattern.test(url.pathname), { timeout: 15_000 });
  return new URL(page.url()).pathname.match(pattern)!;
}

/** Fills the dip tube form with a valid NPS-2 tube (length typed in inches). */
async function fillDipTube(page: Page, partNumber: string): Promise<void> {
  await page.getByTestId('form-partNumber').fill(partNumber);
  await pick(page, 'form-supplierId', 'Ridgeback');
  await page.getByTestId('form-material').fill('PFA');
  await pick(page, 'form-threadCode', 'NPS-2', 'NPS-2');
  await pick(page, 'form-keyCode', 'OCHRE', 'LR-OCHRE');
  await page.getByTestId('form-channels-feed-return').click();
  // 32.9 in is 835.66 mm: the form shows what it will save and sends mm.
  await page.getByTestId('form-lengthMm-unit-in').click();
  await page.getByTestId('form-lengthMm').fill('32.9');
  await page.getByTestId('form-boreMm').fill('19');
  await page.getByTestId('form-odMm').fill('25.4');
}

describe.each(VIEWPORTS)('engineer forms at $name width ($width px)', (viewport) => {
  it('registers a dip tube and a pairing with a live fit preview; the author cannot approve; a second engineer approves', async () => {
    const tubePart = part('DT', viewport);
    const { context, page } = await openAs(viewport, 'engineer@bungwise.example');

    // 1. The dip tube, through the form.
    await page.goto(`${harness.baseUrl}/registry/dip-tubes/new`);
    await page.getByTestId('dip-tube-form').waitFor();
    await fillDipTube(page, tubePart);
    await expect(page.getByText('Saved as 835.66 mm').count()).resolves.toBe(1);
    await shot(page, 'forms-dip-tube-new', viewport);
    await page.getByTestId('form-submit').click();
    const [, tubeId] = await waitForPath(page, new RegExp(`^/registry/dip-tubes/(${UUID})$`));
    const token = await tokenFor(page, 'engineer@bungwise.example');
    const tube = await apiGet(page, token, `/dip-tubes/${tubeId}`);
    expect(tube).toMatchObject({ partNumber: tubePart, threadCode: 'NPS-2', keyCode: 'LR-OCHRE', channels: 'feed-return', material: 'PFA', boreMm: 19, odMm: 25.4 });
    expect(tube.lengthMm).toBeCloseTo(835.66, 2);

    // 2. A pairing for it; the preview answers as the parts and the context are picked.
    await page.goto(`${harness.baseUrl}/registry/pairings/new`);
    await page.getByTestId('pairing-form').waitFor();
    await page.getByTestId('fit-preview-empty').waitFor();
    await pick(page, 'form-dipTubeId', tubePart);
    await pick(page, 'form-connectorId', 'RFH-DH-C1919-OX');
    // Tube and head only: thread, reach and openings wait for a drum type.
    await page.getByTestId('fit-preview-verdict').waitFor();
    await expect(page.getByTestId('fit-preview-not-checked').textContent()).resolves.toMatch(/Thread.*no drum type chosen/);
    await pick(page, 'fit-drum', 'CMA-D208-SL');
    await page.getByTestId('fit-tapping-one-opening').click();
    await page.getByTestId('fit-flow').fill('20');
    await expect(page.getByTestId('fit-preview-rules-reach').textContent()).resolves.toMatch(/inside the 5 to 25 mm window/);
    await expect(page.getByTestId('fit-preview-rules-thread').textContent()).resolves.toMatch(/matches the drum's large bung/);
    await expect(page.getByTestId('fit-preview-rules-ports').textContent()).resolves.toMatch(/at 20 L\/min/);
    // A new pairing is a draft, so the verdict carries the approval caution.
    await expect(page.getByTestId('fit-preview-rules-approval').textContent()).resolves.toMatch(/not approved for use yet/);
    await expect(page.getByTestId('fit-preview-verdict-word').textContent()).resolves.toBe('CAUTION');
    await page.getByTestId('form-notes').fill('Trial on bay 2; tip gap measured at 15 mm.');
    await shot(page, 'pairing-new-preview', viewport);
    await page.getByTestId('form-submit').click();
    const [, pairingId] = await waitForPath(page, new RegExp(`^/registry/pairings/(${UUID})$`));

    // 3. The author sees the draft and cannot approve it.
    await expect(page.getByTestId('pairing-status').textContent()).resolves.toMatch(/Draft/);
    await expect(page.getByTestId('pairing-who-may-approve').textContent()).resolves.toMatch(/Any engineer other than Tomasz Ilunga/);
    await expect(page.getByTestId('pairing-approve').getAttribute('aria-disabled')).resolves.toBe('true');
    await expect(page.getByTestId('pairing-approve-reason').textContent()).resolves.toMatch(/cannot approve/);
    expect(await page.getByTestId('pairing-comment').count()).toBe(0);
    await shot(page, 'pairing-author-view', viewport);
    await context.close();

    // 4. A second engineer rejects without a reason (refused in the form), then approves with a comment.
    const second = await openAt(viewport, 'engineer2@bungwise.example', `/registry/pairings/${pairingId}`, 'pairing-comment');
    await second.page.getByTestId('pairing-reject').click();
    await expect(second.page.getByTestId('pairing-comment-error').textContent()).resolves.toMatch(/Say why you reject it/);
    await second.page.getByTestId('pairing-comment').fill('Tip gap checked on a sample drum: 15 mm.');
    await second.page.getByTestId('pairing-approve').click();
    await expect(second.page.getByTestId('pairing-action-done').textContent()).resolves.toMatch(/Approved/);
    await expect(second.page.getByTestId('pairing-status').textContent()).resolves.toMatch(/Approved/);
    await expect(second.page.getByTestId('pairing-approver').textContent()).resolves.toMatch(/Mirela Sandoval/);
    // The history keeps the drafting and the approval, in order.
    await expect(second.page.getByTestId('pairing-history-0').textContent()).resolves.toMatch(/Drafted by Tomasz Ilunga/);
    await expect(second.page.getByTestId('pairing-history-1').textContent()).resolves.toMatch(/Approved by Mirela Sandoval.*Tip gap checked on a sample drum/);
    await second.page.getByTestId('pairing-retire').waitFor();
    await shot(second.page, 'pairing-approved', viewport);
    await second.context.close();

    // 5. A clerk reads the same page without any review controls.
    const clerk = await openAt(viewport, 'clerk@bungwise.example', `/registry/pairings/${pairingId}`, 'pairing-read-only');
    expect(await clerk.page.getByTestId('pairing-retire').count()).toBe(0);
    expect(await clerk.page.getByTestId('pairing-edit').count()).toBe(0);
    await expect(clerk.page.getByTestId('pairing-history-1').textContent()).resolves.toMatch(/Approved by Mirela Sandoval/);
    await clerk.context.close();
  }, 90_000);

  it('names each problem on blur and on save, and puts the server’s answer on its field', async () => {
    const { context, page } = await openAt(viewport, 'engineer@bungwise.example', '/registry/dip-tubes/new', 'dip-tube-form');

    // On blur: a negative length is refused with the value that was typed.
    await page.getByTestId('form-lengthMm').fill('-5');
    await page.getByTestId('form-lengthMm').blur();
    await expect(page.getByTestId('form-lengthMm-error').textContent()).resolves.toBe('Length must be more than 0 (you entered -5 mm).');
    // On save: every missing field is named, and nothing is sent.
    await page.getByTestId('form-submit').click();
    await expect(page.getByTestId('form-partNumber-error').textContent()).resolves.toBe('Part number is required.');
    await expect(page.getByTestId('form-supplierId-error').textContent()).resolves.toMatch(/Supplier is required/);
    await expect(page.getByTestId('form-error').textContent()).resolves.toMatch(/Fix these \d+ fields first: Part number, Supplier/);
    expect(new URL(page.url()).pathname).toBe('/registry/dip-tubes/new');
    await shot(page, 'forms-validation', viewport);

    // A rule between fields: the bore must be smaller than the outside diameter.
    await fillDipTube(page, 'RFH-DT-N2-836');
    await page.getByTestId('form-boreMm').fill('30');
    await page.getByTestId('form-boreMm').blur();
    await expect(page.getByTestId('form-boreMm-error').textContent()).resolves.toBe('Bore must be smaller than the outside diameter.');
    await page.getByTestId('form-boreMm').fill('19');

    // The server's answer lands on its field: that part number is taken by a seeded tube.
    harness.allowConsoleError(/status of 409 \(Conflict\)/);
    await page.getByTestId('form-submit').click();
    await expect(page.getByTestId('form-partNumber-error').textContent()).resolves.toBe('Part number is already in use.');
    // Typing in the field clears the server's message for it.
    await page.getByTestId('form-partNumber').fill(part('DT2', viewport));
    expect(await page.getByTestId('form-partNumber-error').count()).toBe(0);
    await context.close();
  }, 60_000);

  it('can be filled from the keyboard: Tab between fields, Enter picks a match or a chip, Space a unit', async () => {
    const { context, page } = await openAs(viewport, 'engineer@bungwise.example');
    await page.goto(`${harness.baseUrl}/registry/dip-tubes/new`);
    await page.getByTestId('form-partNumber').focus();
    const active = () => page.evaluate(() => document.activeElement?.getAttribute('data-testid'));
    /** Tab moves the keyboard on to that field. */
    const tabTo = async (testID: string) => {
      await page.keyboard.press('Tab');
      expect(await active()).toBe(testID);
    };
    /** Types into the field's picker, takes its one match with Enter, and the keyboard is then on the picker's Change button. */
    const pickWithEnter = async (field: string, typed: string, picked: string) => {
      await page.keyboard.type(typed);
      await until(() => page.locator(`[data-testid^="form-${field}-option-"]`).count(), 1);
      await page.keyboard.press('Enter');
      await expect(page.getByTestId(`form-${field}-selected`).textContent()).resolves.toBe(picked);
      await until(active, `form-${field}-change`);
    };
    await page.keyboard.type(part('DTK', viewport));
    await tabTo('form-supplierId-search');
    // The keyboard stays on the picker (its Change button), then moves on in reading order.
    await pickWithEnter('supplierId', 'Ridge', 'Ridgeback Fluid Hardware');
    await tabTo('form-material');
    await page.keyboard.type('PVDF');
    await tabTo('form-threadCode-search');
    await pickWithEnter('threadCode', 'G-2', 'G-2');
    await tabTo('form-keyCode-change');
    await tabTo('form-channels-feed');
    await page.keyboard.press('Enter');
    await expect(page.getByTestId('form-channels-feed').getAttribute('aria-checked')).resolves.toBe('true');
    // A chip group is one tab stop: the arrow keys move inside it, Tab leaves it.
    await page.keyboard.press('ArrowRight');
    await expect(page.getByTestId('form-channels-feed-return').getAttribute('aria-checked')).resolves.toBe('true');
    await page.keyboard.press('ArrowLeft');
    await expect(page.getByTestId('form-channels-feed').getAttribute('aria-checked')).resolves.toBe('true');
    await tabTo('form-lengthMm');
    await page.keyboard.type('33');
    // The unit selector follows its input; Space picks inches and the typed length is kept as a length.
    await tabTo('form-lengthMm-unit-mm');
    await tabTo('form-lengthMm-unit-in');
    await page.keyboard.press('Space');
    await expect(page.getByTestId('form-lengthMm-unit-in').getAttribute('aria-checked')).resolves.toBe('true');
    await expect(page.getByTestId('form-lengthMm').inputValue()).resolves.toBe('1.2992');
    await context.close();
  }, 60_000);

  it('says when someone else saved first and re-applies the change on top of their version', async () => {
    const { context, page } = await openAs(viewport, 'engineer@bungwise.example');
    const token = await tokenFor(page, 'engineer@bungwise.example');
    const other = await tokenFor(page, 'engineer2@bungwise.example');
    const supplier = (await apiGet(page, token, '/suppliers?q=Ridgeback')).items[0];
    const created = await page.request.post(`${harness.baseUrl}/api/dip-tubes`, {
      headers: { Authorization: `Bearer ${token}` },
      data: { partNumber: part('DTC', viewport), supplierId: supplier.id, threadCode: 'NPS-2', lengthMm: 836, boreMm: 19, odMm: 25.4, material: 'PFA', keyCode: 'LR-OCHRE', channels: 'feed' },
    });
    expect(created.status()).toBe(201);
    const tube = await created.json();

    await page.goto(`${harness.baseUrl}/registry/dip-tubes/edit/${tube.id}`);
    await expect(page.getByTestId('form-partNumber').inputValue()).resolves.toBe(tube.partNumber);
    // Meanwhile the second engineer changes the material.
    const theirs = await page.request.patch(`${harness.baseUrl}/api/dip-tubes/${tube.id}`, { headers: { Authorization: `Bearer ${other}` }, data: { version: tube.version, material: 'PVDF' } });
    expect(theirs.status()).toBe(200);

    await page.getByTestId('form-lengthMm').fill('845');
    harness.allowConsoleError(/status of 409 \(Conflict\)/);
    await page.getByTestId('form-submit').click();
    await page.getByTestId('form-conflict').waitFor();
    await expect(page.getByTestId('form-conflict').textContent()).resolves.toMatch(/Someone else saved this first/);
    await expect(page.getByTestId('form-conflict-material').textContent()).resolves.toMatch(/Theirs: PVDF.*Yours: PFA/);
    await shot(page, 'forms-conflict', viewport);

    await page.getByTestId('form-conflict-reapply').click();
    await expect(page.getByTestId('form-notice').textContent()).resolves.toMatch(/Their version \(version 2\) is loaded with your changes on top/);
    await expect(page.getByTestId('form-material').inputValue()).resolves.toBe('PVDF');
    await expect(page.getByTestId('form-lengthMm').inputValue()).resolves.toBe('845');
    await page.getByTestId('form-submit').click();
    await waitForPath(page, new RegExp(`^/registry/dip-tubes/${tube.id}$`));
    const saved = await apiGet(page, token, `/dip-tubes/${tube.id}`);
    expect(saved).toMatchObject({ material: 'PVDF', lengthMm: 845, version: 3 });
    await context.close();
  }, 60_000);

  it('registers a slurry and a station, edits a pairing’s notes, and shows a clerk the forms read-only', async () => {
    const { context, page } = await openAs(viewport, 'engineer@bungwise.example');
    const token = await tokenFor(page, 'engineer@bungwise.example');

    await page.goto(`${harness.baseUrl}/registry/slurries/new`);
    await page.getByTestId('slurry-form').waitFor();
    const slurryName = `Test silica ${viewport.name} ${RUN}`;
    await page.getByTestId('form-name').fill(slurryName);
    await pick(page, 'form-supplierId', 'Cobalt Mesa');
    await pick(page, 'form-drumTypeId', 'CMA-D208-SL');
    await page.getByTestId('form-foams-no').click();
    await page.getByTestId('form-shearSensitive-yes').click();
    await page.getByTestId('form-solidsWtPct').fill('120');
    await page.getByTestId('form-solidsWtPct').blur();
    await expect(page.getByTestId('form-solidsWtPct-error').textContent()).resolves.toBe('Solids must be at most 100 %.');
    await page.getByTestId('form-solidsWtPct').fill('12,5');
    await shot(page, 'forms-slurry-new', viewport);
    await page.getByTestId('form-submit').click();
    const [, slurryId] = await waitForPath(page, new RegExp(`^/registry/slurries/(${UUID})$`));
    expect(await apiGet(page, token, `/slurries/${slurryId}`)).toMatchObject({ name: slurryName, region: 'NA', foams: false, shearSensitive: true, solidsWtPct: 12.5 });

    await page.goto(`${harness.baseUrl}/stations/new`);
    await page.getByTestId('station-form').waitFor();
    const stationName = `Test feed ${viewport.name} ${RUN}`;
    await page.getByTestId('form-name').fill(stationName);
    await page.getByTestId('form-bay').fill('Bay 9');
    await page.getByTestId('form-flowLpm').fill('18');
    await page.getByTestId('form-tapping-one-opening').click();
    await page.getByTestId('form-agitation-pump').click();
    await pick(page, 'form-connectorId', 'RFH-DH-C1919-OX');
    await shot(page, 'forms-station-new', viewport);
    await page.getByTestId('form-submit').click();
    await waitForPath(page, /^\/stations$/);
    const station = (await apiGet(page, token, `/stations?q=${encodeURIComponent(stationName)}`)).items[0];
    expect(station).toMatchObject({ name: stationName, bay: 'Bay 9', tapping: 'one-opening', agitation: 'pump', connectorPartNumber: 'RFH-DH-C1919-OX', flowLpm: 18 });

    // Editing a pairing changes only its notes; tube and head are shown, not offered.
    const draft = (await apiGet(page, token, '/pairings?status=draft')).items[0];
    await page.goto(`${harness.baseUrl}/registry/pairings/edit/${draft.id}`);
    await page.getByTestId('form-notes').waitFor();
    expect(await page.getByTestId('form-dipTubeId-search').count()).toBe(0);
    await expect(page.getByTestId('form-dipTubeId-selected').textContent()).resolves.toContain(draft.dipTubePartNumber);
    await page.getByTestId('fit-preview-verdict').waitFor();
    await page.getByTestId('form-notes').fill(`Checked again on ${viewport.name}.`);
    await page.getByTestId('form-submit').click();
    await waitForPath(page, new RegExp(`^/registry/pairings/${draft.id}$`));
    await expect(page.getByTestId('pairing-notes').textContent()).resolves.toBe(`Checked again on ${viewport.name}.`);
    await context.close();

    const clerk = await openAt(viewport, 'clerk@bungwise.example', '/registry/dip-tubes/new', 'form-read-only');
    expect(await clerk.page.getByTestId('form-submit').count()).toBe(0);
    await clerk.context.close();
  }, 90_000);

  it('registers a drum type with two openings and hides a connector’s return port when it has none', async () => {
    const { context, page } = await openAt(viewport, 'engineer@bungwise.example', '/registry/drum-types/new', 'drum-type-form');
    const drumPart = part('DRUM', viewport);
    await page.getByTestId('form-partNumber').fill(drumPart);
    await page.getByTestId('form-name').fill('55 gal test drum, 2 in + 3/4 in NPS');
    await pick(page, 'form-supplierId', 'Cobalt Mesa');
    // The supplier's region is filled in.
    await expect(page.getByTestId('form-region-NA').getAttribute('aria-checked')).resolves.toBe('true');
    await page.getByTestId('form-material-steel').click();
    await page.getByTestId('form-head-tight').click();
    await page.getByTestId('form-unPackagingCode').fill('1H1');
    // The UN code says plastic; the record says steel.
    await page.getByTestId('form-unPackagingCode-material').waitFor();
    await page.getByTestId('form-unPackagingCode').fill('1A1');
    expect(await page.getByTestId('form-unPackagingCode-material').count()).toBe(0);
    await page.getByTestId('form-nominalCapacityL').fill('208');
    await page.getByTestId('form-outsideHeightMm').fill('880');
    await page.getByTestId('form-insideDepthMm').fill('900');
    await page.getByTestId('form-insideDepthMm').blur();
    await expect(page.getByTestId('form-insideDepthMm-error').textContent()).resolves.toBe('Inside depth must be less than the outside height.');
    await page.getByTestId('form-insideDepthMm').fill('851');
    await page.getByTestId('form-outsideDiameterMm').fill('585');
    await page.getByTestId('form-openings-0-label').fill('large bung');
    await pick(page, 'form-openings-0-threadCode', 'NPS-2', 'NPS-2');
    await page.getByTestId('form-openings-0-boreMm').fill('50');
    await pick(page, 'form-openings-0-keyCode', 'OCHRE', 'LR-OCHRE');
    await page.getByTestId('form-openings-0-position-large').click();
    await page.getByTestId('form-openings-add').click();
    await page.getByTestId('form-openings-1-label').fill('large bung');
    await page.getByTestId('form-openings-1-label').blur();
    await expect(page.getByTestId('form-openings-1-label-error').textContent()).resolves.toMatch(/Opening 2 label must be different/);
    await page.getByTestId('form-openings-1-label').fill('small bung');
    await pick(page, 'form-openings-1-threadCode', 'NPS-3/4', 'NPS-3/4');
    await page.getByTestId('form-openings-1-boreMm').fill('19');
    await page.getByTestId('form-openings-1-position-small').click();
    await shot(page, 'forms-drum-type-new', viewport);
    await page.getByTestId('form-submit').click();
    const [, drumId] = await waitForPath(page, new RegExp(`^/registry/drum-types/(${UUID})$`));
    const token = await tokenFor(page, 'engineer@bungwise.example');
    const drum = await apiGet(page, token, `/drum-types/${drumId}`);
    expect(drum).toMatchObject({ partNumber: drumPart, region: 'NA', material: 'steel', head: 'tight', unPackagingCode: '1A1', insideDepthMm: 851 });
    expect(drum.openings.map((o: { label: string; threadCode: string; keyCode: string | null }) => [o.label, o.threadCode, o.keyCode])).toEqual([
      ['large bung', 'NPS-2', 'LR-OCHRE'],
      ['small bung', 'NPS-3/4', null],
    ]);

    // A connector without a return path has no return port fields, and saves them empty.
    await page.goto(`${harness.baseUrl}/registry/connectors/new`);
    await page.getByTestId('connector-form').waitFor();
    await page.getByTestId('form-returnPath-open').click();
    await page.getByTestId('form-returnBoreMm').fill('12.7');
    await page.getByTestId('form-returnPath-none').click();
    expect(await page.getByTestId('form-returnBoreMm').count()).toBe(0);
    await page.getByTestId('form-no-return').waitFor();
    const headPart = part('DH', viewport);
    await page.getByTestId('form-partNumber').fill(headPart);
    await pick(page, 'form-supplierId', 'Ridgeback');
    await page.getByTestId('form-wettedMaterials').fill('PFA, PTFE, FFKM seals');
    await page.getByTestId('form-suitedTo-two-opening').click();
    await page.getByTestId('form-feedBoreMm').fill('19.05');
    await page.getByTestId('form-feedNominal').fill('3/4 in');
    await shot(page, 'forms-connector-new', viewport);
    await page.getByTestId('form-submit').click();
    const [, headId] = await waitForPath(page, new RegExp(`^/registry/connectors/(${UUID})$`));
    const head = await apiGet(page, token, `/connectors/${headId}`);
    expect(head).toMatchObject({ partNumber: headPart, returnPath: 'none', returnBoreMm: null, returnNominal: null, keyCode: null, feedBoreMm: 19.05 });
    await context.close();
  }, 90_000);
});

import fs from 'node:fs';
import type { Page } from 'playwright-core';
import { DEMO_REGISTRY_SUMMARY as demo } from '../../seeds/demo-registry';
import { BrowserHarness, seen, useHarness, type Viewport, VIEWPORTS } from '../support/browser';

// Spec-sheet imports (a file with a bad row, then a clean one), files kept with a lot at the dock, and the
// e-mail choices on the notices screen. Part and lot numbers differ per viewport: both runs share one database.

const harness = useHarness(new BrowserHarness());

/** Presses a button that opens the browser's file dialog and answers it with the given file. */
async function chooseFile(page: Page, buttonTestID: string, file: { name: string; mimeType: string; buffer: Buffer }) {
  const chooser = page.waitForEvent('filechooser');
  await page.getByTestId(buttonTestID).click();
  await (await chooser).setFiles(file);
}

/** Calls the API as a demo person, for the setup a test does not exercise through the screens. */
async function apiAs(email: string) {
  const signIn = await fetch(`${harness.baseUrl}/api/auth/sign-in`, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ email, password: 'bungwise-demo' }) });
  const { token } = (await signIn.json()) as { token: string };
  return async <T>(path: string, init: { method?: string; body?: unknown } = {}): Promise<T> => {
    const res = await fetch(`${harness.baseUrl}/api${path}`, {
      method: init.method ?? 'GET',
      headers: { Authorization: `Bearer ${token}`, ...(init.body ? { 'Content-Type': 'application/json' } : {}) },
      body: init.body ? JSON.stringify(init.body) : undefined,
    });
    if (!res.ok) throw new Error(`${init.method ?? 'GET'} ${path} answered ${res.status}: ${await res.text()}`);
    return (await res.json()) as T;
  };
}

// The smallest valid PNG (1 x 1 pixel): the server reads the type from these bytes, not from the name.
const PNG = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNkYPhfDwAChwGA60e6kgAAAABJRU5ErkJggg==', 'base64');

describe.each(VIEWPORTS)('imports, files and mail choices at $name width ($width px)', (viewport: Viewport) => {
  const tag = viewport.name === 'phone' ? 'P' : 'W';
  const lot = `LR-${tag}-26-4410`;

  it('an engineer checks a sheet with a bad row (refused, import off), then a clean one, imports it, and sees it in the history', async () => {
    const clerkApi = await apiAs('clerk@bungwise.example');
    const suppliers = await clerkApi<{ items: Array<{ name: string }> }>('/suppliers?region=NA');
    const supplier = suppliers.items[0].name;
    const header = 'Supplier,Part Number,Thread,Length (mm),Bore_mm,OD mm,Material,Key,Channels,Notes';
    // An unknown column (Notes) is left out and said so; it also makes the file big enough to watch it upload.
    const note = (n: number) => `"Sheet rev C, row ${n}. ${'Wetted parts PFA, pressure tested. '.repeat(60)}"`;
    const row = (n: number, length: string) => `${supplier},IMP-${tag}-00${n},NPS-2,${length},19,25.4,PFA,,feed,${note(n)}`;
    const bad = [header, row(1, '836'), row(2, 'long'), row(3, '845.5')].join('\n');
    const clean = [header, row(1, '836'), row(2, '840'), row(3, '845.5')].join('\n');

    const { context, page } = await harness.open(viewport);
    await harness.signIn(page, 'engineer');
    await page.goto(`${harness.baseUrl}/registry/import`);
    await page.getByTestId('import-step-kind').waitFor();
    await page.getByTestId('import-history').waitFor();
    await harness.shot(page, 'import-start', viewport);

    // Nothing to choose until the table is chosen: its columns decide how the file is read.
    expect(await page.getByTestId('import-choose').getAttribute('aria-disabled')).toBe('true');
    await page.getByTestId('import-kind-dip-tubes').click();
    await page.getByTestId('import-template').waitFor();

    // A sheet with a length that is not a number: the row is refused with its line and column, import stays off.
    await chooseFile(page, 'import-choose', { name: `tubes-${tag}-draft.csv`, mimeType: 'text/csv', buffer: Buffer.from(bad) });
    await seen(page, 'import-rejected-line-3', 'Length (mm)');
    await seen(page, 'import-rejected-line-3', '"long" is not a number');
    await seen(page, 'import-count-rejected', /1\s*rejected/);
    await seen(page, 'import-count-new', /2\s*new/);
    await seen(page, 'import-read-as', 'Notes');
    expect(await page.getByTestId('import-commit').getAttribute('aria-disabled')).toBe('true');
    await seen(page, 'import-commit-note', /1 row rejected/);
    await harness.shotOf(page, 'import-result', 'import-rejected', viewport);

    // The clean sheet, over an emulated slow link so the progress shows long enough to see. Chromium's emulation
    // delays the request as a whole, so the bar may already stand at 100% ("Checking…") when it is first seen.
    const cdp = await context.newCDPSession(page);
    await cdp.send('Network.enable');
    await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 50, downloadThroughput: -1, uploadThroughput: 1_500 });
    await chooseFile(page, 'import-choose', { name: `tubes-${tag}.csv`, mimeType: 'text/csv', buffer: Buffer.from(clean) });
    await page.getByTestId('import-progress').waitFor();
    await seen(page, 'import-progress-text', /Uploading tubes-.+\.csv: \d+%|Checking every row/);
    await harness.shotOf(page, 'import-progress', 'import-uploading', viewport);
    await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });

    await seen(page, 'import-count-new', /3\s*new/);
    await seen(page, 'import-count-rejected', /0\s*rejected/);
    await seen(page, 'import-planned-line-2', `IMP-${tag}-001`);
    expect(await page.getByTestId('import-rejected').count()).toBe(0);
    await seen(page, 'import-commit', 'Import 3 rows');
    expect(await page.getByTestId('import-commit').getAttribute('aria-disabled')).not.toBe('true');
    await harness.shotOf(page, 'import-result', 'import-dry-run', viewport);

    await page.getByTestId('import-commit').click();
    await seen(page, 'import-done-summary', /3 new, 0 changed and 0 unchanged dip tubes/);
    await seen(page, 'import-history-list', `tubes-${tag}.csv`);
    const committed = page
      .getByTestId(/^import-history-item-/)
      .filter({ hasText: `tubes-${tag}.csv` })
      .filter({ hasText: 'Imported' });
    await committed.first().waitFor();
    expect(await committed.first().textContent()).toMatch(/3 new · 0 changed · 0 unchanged · 0 rejected/);
    expect(await committed.first().textContent()).toMatch(/Tomasz Ilunga/);
    // The refused draft's dry run is in the history too, with its kept file.
    await seen(page, 'import-history-list', `tubes-${tag}-draft.csv`);
    // The file is kept as it was read, behind the sign-in (fetched with the token, saved through an object URL).
    const download = page.waitForEvent('download');
    await committed
      .first()
      .getByTestId(/-download$/)
      .click();
    const saved = await download;
    expect(saved.suggestedFilename()).toBe(`tubes-${tag}.csv`);
    expect(fs.readFileSync(await saved.path()).toString('utf8')).toContain(`IMP-${tag}-002`);
    await harness.shotOf(page, 'import-done', 'import-done', viewport);
    await harness.shotOf(page, 'import-history', 'import-history', viewport);

    // The rows are in the registry.
    const tubes = await clerkApi<{ items: Array<{ partNumber: string; lengthMm: number }> }>(`/dip-tubes?q=IMP-${tag}-00`);
    expect(tubes.items.map((t) => t.partNumber).sort()).toEqual([`IMP-${tag}-001`, `IMP-${tag}-002`, `IMP-${tag}-003`]);
    await context.close();
  }, 60_000);

  it('a clerk sees that imports are for engineers', async () => {
    const { context, page } = await harness.open(viewport);
    await harness.signIn(page, 'clerk');
    await page.goto(`${harness.baseUrl}/registry/import`);
    await seen(page, 'import-not-allowed', 'Engineers import spec sheets');
    await context.close();
  }, 30_000);

  it('a clerk at the lot page attaches a photo and sees it listed; a file that is not a PDF or photo is refused with the reason', async () => {
    const clerkApi = await apiAs('clerk@bungwise.example');
    const drums = await clerkApi<{ items: Array<{ id: string }> }>(`/drum-types?q=${encodeURIComponent(demo.fittingDrum)}`);
    const check = await clerkApi<{ id: string }>('/receiving-checks', { method: 'POST', body: { lotNumber: lot, drumCount: 2, drumTypeId: drums.items[0].id } });

    const { page } = await harness.open(viewport);
    await harness.signIn(page, 'clerk');
    await page.goto(`${harness.baseUrl}/receive/${check.id}`);
    // On a phone the files sit in the details under the verdict, closed at first.
    if (viewport.name === 'phone') await page.getByTestId('check-details-toggle').click();
    await page.getByTestId('files-panel').waitFor();
    await seen(page, 'files-empty', /No files yet/);
    await harness.shotOf(page, 'files-panel', 'files-empty', viewport);

    // A name beyond ASCII, as a phone names its photos: stored as sent, and saved under it again.
    const photoName = `drum-label-${tag}-Ümlaut-東京.png`;
    await chooseFile(page, 'files-photo', { name: photoName, mimeType: 'image/png', buffer: PNG });
    await seen(page, 'files-list', photoName);
    await seen(page, 'files-list', /PNG photo · \d+ B · added by Noor Halvorsen/);
    await seen(page, 'files-added', `Added ${photoName}`);
    await harness.shotOf(page, 'files-panel', 'files-listed', viewport);
    const download = page.waitForEvent('download');
    await page
      .getByTestId(/^files-item-.+-download$/)
      .first()
      .click();
    const saved = await download;
    expect(saved.suggestedFilename()).toBe(photoName);
    expect(fs.readFileSync(await saved.path()).equals(PNG)).toBe(true);

    // A text file dressed as a PDF: the server reads the bytes and says why it is refused.
    harness.allowConsoleError(/status of 415/);
    await chooseFile(page, 'files-add', { name: 'delivery-note.pdf', mimeType: 'application/pdf', buffer: Buffer.from('not really a PDF') });
    await seen(page, 'files-error', /attach a PDF or a JPEG, PNG, WebP or HEIC photo/);
    await harness.shotOf(page, 'files-panel', 'files-refused', viewport);
    const files = await clerkApi<{ items: Array<{ fileName: string }> }>(`/attachments?ownerKind=receiving-check&ownerId=${check.id}`);
    expect(files.items.map((f) => f.fileName)).toEqual([photoName]);
  }, 45_000);

  it('mail choices toggle, are saved on the account, and stay after a reload', async () => {
    const engineerApi = await apiAs('engineer@bungwise.example');
    const { page } = await harness.open(viewport);
    await harness.signIn(page, 'engineer');
    await page.goto(`${harness.baseUrl}/notices`);
    await page.getByTestId('mailprefs').waitFor();
    const box = page.getByTestId('mailprefs-pairing-review');
    expect(await box.getAttribute('aria-checked')).toBe('true');

    await box.click();
    await seen(page, 'mailprefs-status', 'Saved.');
    expect(await box.getAttribute('aria-checked')).toBe('false');
    expect((await engineerApi<{ user: { mailOff: string[] } }>('/me')).user.mailOff).toEqual(['pairing-review']);
    await harness.shotOf(page, 'mailprefs', 'mailprefs-off', viewport);

    await page.reload();
    await page.getByTestId('mailprefs').waitFor();
    expect(await page.getByTestId('mailprefs-pairing-review').getAttribute('aria-checked')).toBe('false');
    expect(await page.getByTestId('mailprefs-lot-held').getAttribute('aria-checked')).toBe('true');

    // Back on, so the other viewport starts from the same account.
    await page.getByTestId('mailprefs-pairing-review').click();
    await seen(page, 'mailprefs-status', 'Saved.');
    expect((await engineerApi<{ user: { mailOff: string[] } }>('/me')).user.mailOff).toEqual([]);
  }, 30_000);
});

import os from 'node:os';
import { BrowserHarness, seen, useHarness, VIEWPORTS } from '../support/browser';

// The clerk's phone at the dock loads the app over plain HTTP from the server's intranet address, not from
// localhost (which browsers treat as secure). Served bound to every interface and loaded from this
// machine's own network address, the app must start and sign in.
function networkAddress(): string {
  const found = Object.values(os.networkInterfaces())
    .flat()
    .find((i) => i && i.family === 'IPv4' && !i.internal);
  if (!found) {
    throw new Error('This machine has no non-loopback IPv4 address (os.networkInterfaces()), so the plain-HTTP intranet test cannot run here: it fails rather than pass untested.');
  }
  return found.address;
}

const harness = useHarness(new BrowserHarness({ bind: '0.0.0.0', host: networkAddress() }));

describe.each(VIEWPORTS)('the app over plain HTTP on an intranet address at $name width ($width px)', (viewport) => {
  it('loads, is not asked to upgrade to HTTPS, and signs the clerk in', async () => {
    expect(new URL(harness.baseUrl).hostname).not.toMatch(/^(127\.|localhost$)/);
    const { context, page } = await harness.page(viewport);
    const doc = await page.goto(`${harness.baseUrl}/`);
    expect(doc?.status()).toBe(200);
    // The page really is an insecure context, as at the dock.
    expect(await page.evaluate(() => window.isSecureContext)).toBe(false);
    // Told to upgrade, the browser asked for the scripts over HTTPS and the page stayed blank.
    await page.getByTestId('sign-in-submit').waitFor({ timeout: 10_000 });
    expect(doc?.headers()['content-security-policy']).not.toContain('upgrade-insecure-requests');
    await harness.shot(page, 'plain-http-sign-in', viewport);
    await harness.signIn(page, 'clerk');
    await seen(page, 'current-role', /clerk/i);
    await harness.shot(page, 'plain-http-home-clerk', viewport);
    await context.close();
  }, 30_000);
});

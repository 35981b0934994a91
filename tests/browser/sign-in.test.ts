import { BrowserHarness, signInAs, useHarness, VIEWPORTS } from '../support/browser';

const harness = useHarness(new BrowserHarness());

describe.each(VIEWPORTS)('sign-in at $name width ($width px)', (viewport) => {
  it('shows field-level messages for empty fields and one message for a wrong password', async () => {
    const { context, page } = await harness.page(viewport);
    await page.goto(`${harness.baseUrl}/`);
    // The guard sends a visitor without a session to the sign-in page.
    await page.getByTestId('sign-in-submit').waitFor();
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    await page.getByTestId('sign-in-submit').click();
    await expect(page.getByTestId('sign-in-email-error').textContent()).resolves.toMatch(/e-mail/);
    await expect(page.getByTestId('sign-in-password-error').textContent()).resolves.toMatch(/password/);
    await harness.shot(page, 'sign-in-empty', viewport);
    harness.allowConsoleError(/status of 401 \(Unauthorized\)/);
    await signInAs(page, harness.baseUrl, 'clerk@bungwise.example', 'wrong-password-1');
    await expect(page.getByTestId('sign-in-message').textContent()).resolves.toMatch(/do not match/);
    await context.close();
  }, 30_000);

  it.each(['clerk', 'engineer', 'buyer', 'admin'])(
    '%s lands on their home, keeps the session on reload, and signs out',
    async (role) => {
      const { context, page } = await harness.page(viewport);
      await signInAs(page, harness.baseUrl, `${role}@bungwise.example`);
      await page.getByTestId(`home-${role}`).waitFor();
      await expect(page.getByTestId('current-role').textContent()).resolves.toMatch(new RegExp(role === 'clerk' ? 'clerk' : role, 'i'));
      await harness.shot(page, `home-${role}`, viewport);
      // Only admins see People in the navigation (on a phone, behind More).
      if (await page.getByTestId('nav-more').count()) await page.getByTestId('nav-more').click();
      expect(await page.getByTestId('nav-users').count()).toBe(role === 'admin' ? 1 : 0);
      if (await page.getByTestId('nav-more-menu').count()) await page.getByTestId('nav-more').click();
      await page.reload();
      await page.getByTestId(`home-${role}`).waitFor();
      await page.getByTestId('sign-out').click();
      await page.getByTestId('sign-in-submit').waitFor();
      await context.close();
    },
    30_000,
  );
});

describe('a choice of chips from the keyboard', () => {
  it('reaches the chosen chip with Tab, moves and chooses with the arrow keys, and chooses with Space', async () => {
    const { context, page } = await harness.page(VIEWPORTS[1]);
    await harness.signIn(page, 'admin');
    await page.goto(`${harness.baseUrl}/admin/users`);
    await page.getByTestId('user-role').waitFor();
    const checked = async () => page.locator('[data-testid="user-role"] [role="radio"][aria-checked="true"]').getAttribute('aria-label');
    const focused = () => page.evaluate(() => document.activeElement?.getAttribute('data-testid'));
    const start = await checked();
    expect(start).toBe('Receiving clerk');
    // Only the chosen chip is a tab stop.
    const tabStops = await page.locator('[data-testid="user-role"] [role="radio"]').evaluateAll((els) => els.map((e) => e.getAttribute('tabindex')));
    expect(tabStops).toEqual(['0', '-1', '-1', '-1']);
    await page.getByTestId('user-role-clerk').focus();
    await page.keyboard.press('ArrowRight');
    expect(await checked()).toBe('Engineer');
    expect(await focused()).toBe('user-role-engineer');
    await page.keyboard.press('ArrowLeft');
    await page.keyboard.press('ArrowLeft');
    expect(await checked()).toBe('Administrator');
    expect(await focused()).toBe('user-role-admin');
    await page.getByTestId('user-role-buyer').focus();
    await page.keyboard.press(' ');
    expect(await checked()).toBe('Buyer');
    await context.close();
  }, 30_000);
});

import nodemailer from 'nodemailer';
import type { Page } from 'playwright-core';
import { MailSender } from '../../server/mail/sender';
import { BrowserHarness, seen, signInAs, useHarness, type Viewport, VIEWPORTS } from '../support/browser';
import { inbox, smtpUrl } from '../support/services';

// The password journeys, end to end at both widths: changing one's own, the forced change of a temporary
// password, an administrator's reset, and "forgot password" with the link read from the local mail stand-in.
// Each width uses its own people, so the two runs do not depend on each other.

let adminToken = '';
const harness = useHarness(new BrowserHarness(), async () => {
  await harness.start();
  // Links in mail point at this test's server.
  process.env.BUNGWISE_PUBLIC_URL = harness.baseUrl;
  adminToken = (await api('POST', '/auth/sign-in', { email: 'admin@bungwise.example', password: 'bungwise-demo' })).token;
});

async function api(method: string, path: string, body?: unknown, token = adminToken) {
  const res = await fetch(`${harness.baseUrl}/api${path}`, {
    method,
    headers: { 'Content-Type': 'application/json', ...(token ? { Authorization: `Bearer ${token}` } : {}) },
    body: body ? JSON.stringify(body) : undefined,
  });
  const json = await res.json();
  if (!res.ok) throw new Error(`${method} ${path} answered ${res.status}: ${JSON.stringify(json)}`);
  return json;
}

/** A person added by the admin: on a temporary password until they change it. */
const addPerson = (email: string, name: string, temporaryPassword: string) => api('POST', '/users', { email, name, role: 'clerk', temporaryPassword });

/** A fresh page on which a person signed in with a temporary password: the app has sent them to change it. */
async function openOnTemporary(viewport: Viewport, email: string, temporaryPassword: string) {
  const opened = await harness.open(viewport);
  await signInAs(opened.page, harness.baseUrl, email, temporaryPassword);
  await opened.page.getByTestId('password-screen').waitFor();
  return opened;
}

/** Every button and text field on the page is at least 48 px high (and buttons as wide): gloved fingers. */
async function expectBigTargets(page: Page) {
  const small = await page.locator('[role="button"]:visible, input:visible').evaluateAll((els) =>
    els
      .map((e) => ({ id: e.getAttribute('data-testid') ?? e.textContent, box: e.getBoundingClientRect(), input: e.tagName === 'INPUT' }))
      .filter(({ box, input }) => box.height < 48 || (!input && box.width < 48))
      .map(({ id, box }) => `${id} ${Math.round(box.width)}x${Math.round(box.height)}`),
  );
  expect(small).toEqual([]);
}

async function fillChange(page: Page, current: string, next: string, again = next) {
  await page.getByTestId('password-current').fill(current);
  await page.getByTestId('password-new').fill(next);
  await page.getByTestId('password-repeat').fill(again);
  await page.getByTestId('password-submit').click();
}

/** The reset link in the newest mail to that address, after one pass of the outbox sender. */
async function resetLinkMailedTo(email: string): Promise<string> {
  const sender = new MailSender(harness.ds, nodemailer.createTransport(smtpUrl()));
  const end = Date.now() + 10_000;
  for (;;) {
    await sender.flush();
    const mail = (await inbox()).filter((m) => m.to[0].address === email && /new password/.test(m.subject)).pop();
    const link = mail && /(http\S+\/reset-password#token=[A-Za-z0-9_-]+)/.exec(mail.text)?.[1];
    if (link) return link;
    if (Date.now() > end) throw new Error(`no reset mail reached ${email}`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

describe.each(VIEWPORTS)('passwords at $name width ($width px)', (viewport) => {
  const tag = viewport.name;

  it('changes one’s own password from the settings under Notices; other sessions end, this one goes on', async () => {
    const email = viewport.name === 'phone' ? 'buyer@bungwise.example' : 'engineer2@bungwise.example';
    const elsewhere = await harness.open(viewport);
    await signInAs(elsewhere.page, harness.baseUrl, email);
    await elsewhere.page.getByTestId('current-user').waitFor();

    const { page } = await harness.open(viewport);
    await signInAs(page, harness.baseUrl, email);
    await page.getByTestId('notices-indicator').click();
    await page.getByTestId('password-card').scrollIntoViewIfNeeded();
    await harness.shot(page, 'password-settings', viewport);
    await page.getByTestId('password-open').click();
    await page.getByTestId('password-submit').waitFor();
    await expectBigTargets(page);
    await harness.shot(page, 'password-change', viewport);

    // Plain-word messages beside the fields, checked before anything is sent.
    await fillChange(page, '', 'short', 'shorter');
    await seen(page, 'password-current-error', 'Enter your current password.');
    await seen(page, 'password-new-error', 'New password must be at least 12 characters.');
    await seen(page, 'password-repeat-error', 'The two new passwords are not the same');
    await harness.shot(page, 'password-change-problems', viewport);
    // The server's verdict on a wrong current password lands on its field.
    harness.allowConsoleError(/status of 400 \(Bad Request\)/);
    await fillChange(page, 'not-my-password', 'quarry-lantern-basin');
    await seen(page, 'password-current-error', 'Current password is not right; check it and try again.');

    await fillChange(page, 'bungwise-demo', 'quarry-lantern-basin');
    await seen(page, 'password-done', 'Password changed');
    await harness.shot(page, 'password-change-done', viewport);
    // This session goes on with its fresh token...
    await page.getByTestId('password-back').click();
    await page.getByTestId('notices-screen').waitFor();
    // ...the other one is signed out at its next request.
    harness.allowConsoleError(/status of 401 \(Unauthorized\)/);
    await elsewhere.page.reload();
    await elsewhere.page.getByTestId('sign-in-submit').waitFor();
    await signInAs(elsewhere.page, harness.baseUrl, email, 'quarry-lantern-basin');
    await elsewhere.page.getByTestId('current-user').waitFor();
  }, 60_000);

  it('sends an admin-created person to the password change right after sign-in, and nowhere else until done', async () => {
    const email = `new.${tag}@bungwise.example`;
    await addPerson(email, `Rosa Ferreira ${tag}`, 'tundra-willow-38');
    const { page } = await openOnTemporary(viewport, email, 'tundra-willow-38');
    expect(new URL(page.url()).pathname).toBe('/password');
    // No navigation while forced; another address comes back here.
    expect(await page.getByTestId('nav-home').count()).toBe(0);
    await expectBigTargets(page);
    await harness.shot(page, 'password-forced', viewport);
    await page.goto(`${harness.baseUrl}/receive`);
    await page.getByTestId('password-screen').waitFor();
    expect(new URL(page.url()).pathname).toBe('/password');
    await fillChange(page, 'tundra-willow-38', 'saffron-kettle-ridge');
    await page.getByTestId('home-clerk').waitFor();
    await page.reload();
    await page.getByTestId('home-clerk').waitFor();
  }, 60_000);

  it('an administrator resets a password on People, after a confirmation; the person signs in with it and must change it', async () => {
    const email = `reset.${tag}@bungwise.example`;
    const name = `Idris Kovacs ${tag}`;
    await addPerson(email, name, 'cobalt-meadow-55');
    const { page } = await harness.open(viewport);
    await harness.signIn(page, 'admin');
    await page.goto(`${harness.baseUrl}/admin/users`);
    await page.getByTestId(`user-reset-${email}`).click();
    await page.getByTestId(`user-reset-${email}-confirm`).scrollIntoViewIfNeeded();
    await expectBigTargets(page);
    await harness.shot(page, 'people-reset-confirm', viewport);
    // Cancel leaves everything as it was.
    await page.getByTestId(`user-reset-${email}-cancel`).click();
    await page.getByTestId(`user-reset-${email}`).click();
    await page.getByTestId(`user-reset-${email}-yes`).click();
    const temporary = ((await page.getByTestId(`user-reset-${email}-password`).textContent()) ?? '').trim();
    expect(temporary).toMatch(/^[a-z2-9]{4}-[a-z2-9]{4}-[a-z2-9]{4}$/);
    await page.getByTestId(`user-reset-${email}-done`).scrollIntoViewIfNeeded();
    await harness.shot(page, 'people-reset-shown', viewport);
    await page.getByTestId(`user-reset-${email}-hide`).click();
    // Hidden once "Done" is pressed: the element leaves the page (waited for, not read at once after the click).
    await page.getByTestId(`user-reset-${email}-password`).waitFor({ state: 'detached' });
    expect(await page.getByTestId(`user-reset-${email}-password`).count()).toBe(0);
    await seen(page, `user-row-${email}`, 'on a temporary password');

    const person = await openOnTemporary(viewport, email, temporary);
    await fillChange(person.page, temporary, 'juniper-socket-plain');
    await person.page.getByTestId('home-clerk').waitFor();
  }, 60_000);

  it('“Forgot password?” mails a link; following it sets a new password to sign in with', async () => {
    const email = `forgot.${tag}@bungwise.example`;
    await addPerson(email, `Mei Adeyemi ${tag}`, 'harbor-pewter-61');
    const { page } = await harness.open(viewport);
    await page.goto(`${harness.baseUrl}/sign-in`);
    await page.getByTestId('sign-in-forgot').click();
    await page.getByTestId('forgot-email').waitFor();
    await expectBigTargets(page);
    await harness.shot(page, 'forgot-password', viewport);
    await page.getByTestId('forgot-submit').click();
    await seen(page, 'forgot-email-error', 'Enter your work e-mail address.');
    await page.getByTestId('forgot-email').fill(email);
    await page.getByTestId('forgot-submit').click();
    await seen(page, 'forgot-done', 'If that address belongs to an active account');
    await harness.shot(page, 'forgot-password-sent', viewport);

    const link = await resetLinkMailedTo(email);
    expect(link.startsWith(`${harness.baseUrl}/reset-password#token=`)).toBe(true);
    await page.goto(link);
    await page.getByTestId('reset-submit').waitFor();
    // The token leaves the address bar once read.
    await page.waitForFunction(() => !window.location.hash);
    expect(new URL(page.url()).pathname).toBe('/reset-password');
    await expectBigTargets(page);
    await harness.shot(page, 'reset-password', viewport);
    await page.getByTestId('reset-new').fill('Password1234');
    await page.getByTestId('reset-repeat').fill('Password1234');
    await page.getByTestId('reset-submit').click();
    await seen(page, 'reset-new-error', 'New password is too common; choose another.');
    await page.getByTestId('reset-new').fill('beacon-thimble-orchard');
    await page.getByTestId('reset-repeat').fill('beacon-thimble-orchard');
    await page.getByTestId('reset-submit').click();
    await seen(page, 'reset-done', 'Sign in with the new password');
    await harness.shot(page, 'reset-password-done', viewport);
    await page.getByTestId('reset-sign-in').click();
    await signInAs(page, harness.baseUrl, email, 'beacon-thimble-orchard');
    await page.getByTestId('home-clerk').waitFor();

    // The same link again: spent.
    const again = await harness.open(viewport);
    harness.allowConsoleError(/status of 400 \(Bad Request\)/);
    await again.page.goto(link);
    await again.page.getByTestId('reset-new').fill('another-fine-phrase');
    await again.page.getByTestId('reset-repeat').fill('another-fine-phrase');
    await again.page.getByTestId('reset-submit').click();
    await seen(again.page, 'reset-message', 'has been used or has expired');
    await again.page.getByTestId('reset-ask-again').waitFor();
    await harness.shot(again.page, 'reset-password-spent', viewport);
  }, 60_000);
});

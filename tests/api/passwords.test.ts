// Changing a password, the forced change of a temporary one, and an administrator's reset: each ends the
// person's other sessions (the session epoch in the token against the user row).
import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { OPEN_DURING_PASSWORD_CHANGE } from '../../server/auth/password-gate';
import { POLICY } from '../../server/auth/policy';
import { passwordProblem } from '../../shared/passwords';
import { bearer, makeTestApp, openTestApp, tokenFor } from '../support/app';
import { apiRoutes } from '../support/routes';

let ds: DataSource;
let app: Express;
let admin: string;

// The limits count in PostgreSQL and every test app here shares them: each test starts with none counted.
beforeEach(async () => {
  if (ds?.isInitialized) await ds.query('DELETE FROM sign_in_counters');
});

beforeAll(async () => {
  ({ ds, app } = await openTestApp());
  admin = await tokenFor(app, 'admin@bungwise.example');
});

afterAll(() => ds.destroy());

const changePassword = (token: string, currentPassword: unknown, newPassword: unknown, on = app) => request(on).post('/api/me/password').set(bearer(token)).send({ currentPassword, newPassword });
const me = (token: string) => request(app).get('/api/me').set(bearer(token));
const fields = (res: request.Response) => (res.body.error?.details ?? []).map((d: { field: string }) => d.field).sort();

/** A person added by the admin with a temporary password (so flagged to change it). */
async function addPerson(email: string, temporaryPassword = 'granite-ledger-42'): Promise<string> {
  const res = await request(app).post('/api/users').set(bearer(admin)).send({ email, name: 'Temp Person', role: 'clerk', temporaryPassword });
  expect(res.status).toBe(201);
  expect(res.body.mustChangePassword).toBe(true);
  return res.body.id;
}

/** Every password an answer or a log line could leak, searched for in the whole audit log. */
async function auditMentions(secret: string): Promise<boolean> {
  const [{ n }] = await ds.query(`SELECT count(*)::int AS n FROM audit_log WHERE concat_ws(' ', summary, before::text, after::text) LIKE '%' || $1 || '%'`, [secret]);
  return n > 0;
}

describe('changing one’s own password', () => {
  it('refuses a wrong current password with a 400 naming the field, without ending the session', async () => {
    const buyer = await tokenFor(app, 'buyer@bungwise.example');
    const res = await changePassword(buyer, 'not-my-password', 'amber-sluice-lantern');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.details).toEqual([{ field: 'currentPassword', messages: ['is not right; check it and try again'] }]);
    expect((await me(buyer)).status).toBe(200);
    expect((await tokenFor(app, 'buyer@bungwise.example')).length).toBeGreaterThan(0);
  });

  it('applies the shared password rule to the new one, and refuses the current one again', async () => {
    const buyer = await tokenFor(app, 'buyer@bungwise.example');
    for (const bad of ['short-one', 'Password1234', 'x'.repeat(201)]) {
      const res = await changePassword(buyer, 'bungwise-demo', bad);
      expect(res.status).toBe(400);
      expect(res.body.error.details).toEqual([{ field: 'newPassword', messages: [passwordProblem(bad)] }]);
    }
    const same = await changePassword(buyer, 'bungwise-demo', 'bungwise-demo');
    expect(same.body.error.details).toEqual([{ field: 'newPassword', messages: ['must differ from your current password'] }]);
    // Both wrong at once: both fields named, so the form can show both.
    expect(fields(await changePassword(buyer, 'wrong-current', 'short'))).toEqual(['currentPassword', 'newPassword']);
    expect(fields(await changePassword(buyer, 42, null))).toEqual(['currentPassword', 'newPassword']);
    expect((await me(buyer)).status).toBe(200);
  });

  it('keeps the changing session (with a fresh token) and ends every other session of that person at once', async () => {
    const here = await tokenFor(app, 'engineer@bungwise.example');
    const phone = await tokenFor(app, 'engineer@bungwise.example');
    const other = await tokenFor(app, 'engineer2@bungwise.example');
    const res = await changePassword(here, 'bungwise-demo', 'copper-drum-valley-7');
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('no-store');
    expect(res.body.user).toMatchObject({ email: 'engineer@bungwise.example', mustChangePassword: false });
    expect(res.body.token).not.toBe(here);
    expect((await me(res.body.token)).status).toBe(200);
    expect((await request(app).get('/api/drum-types?pageSize=1').set(bearer(res.body.token))).status).toBe(200);
    // Both tokens signed before the change, the changing session's old one included, are refused.
    for (const old of [here, phone]) {
      const refused = await me(old);
      expect(refused.status).toBe(401);
      expect(refused.body.error.code).toBe('unauthorized');
    }
    // Someone else's session is untouched.
    expect((await me(other)).status).toBe(200);
    expect((await request(app).post('/api/auth/sign-in').send({ email: 'engineer@bungwise.example', password: 'bungwise-demo' })).status).toBe(401);
    expect((await tokenFor(app, 'engineer@bungwise.example', 'copper-drum-valley-7')).length).toBeGreaterThan(0);
    const log = await request(app).get(`/api/audit?entity=users&entityId=${res.body.user.id}&action=password-change`).set(bearer(admin));
    expect(log.body.items).toHaveLength(1);
    expect(log.body.items[0].userName).toBe('Tomasz Ilunga');
    expect(await auditMentions('copper-drum-valley-7')).toBe(false);
    expect(await auditMentions('bungwise-demo')).toBe(false);
  });

  it('counts wrong current passwords per account: past the limit even the right one is refused with 429', async () => {
    const limited = makeTestApp(ds, { passwordLimits: { wrongCurrentPerAccount: 2 } });
    const clerk = await tokenFor(limited, 'clerk@bungwise.example');
    // A new password that breaks the rule is a typo, not a guess: not counted.
    for (let i = 0; i < 3; i++) expect((await changePassword(clerk, 'bungwise-demo', 'short', limited)).status).toBe(400);
    const statuses: number[] = [];
    for (const guess of ['guess-one-aaaa', 'guess-two-bbbb', 'bungwise-demo']) statuses.push((await changePassword(clerk, guess, 'slate-gravel-orchard', limited)).status);
    expect(statuses).toEqual([400, 400, 429]);
    const refused = await changePassword(clerk, 'bungwise-demo', 'slate-gravel-orchard', limited);
    expect(refused.body.error.code).toBe('too_many_attempts');
    // The session itself goes on.
    expect((await request(limited).get('/api/me').set(bearer(clerk))).status).toBe(200);
  });
});

describe('a temporary password must be changed first', () => {
  it('answers 403 password_change_required on every route but sign-in, GET /api/me and the change itself, until it is changed', async () => {
    await addPerson('temp.one@bungwise.example');
    const signIn = await request(app).post('/api/auth/sign-in').send({ email: 'temp.one@bungwise.example', password: 'granite-ledger-42' });
    expect(signIn.status).toBe(200);
    expect(signIn.body.user.mustChangePassword).toBe(true);
    const token = signIn.body.token as string;
    expect((await me(token)).body.user.mustChangePassword).toBe(true);

    // Walk every route the app serves (read from the router, not from a list of ours).
    const problems: string[] = [];
    for (const route of apiRoutes(app)) {
      if (POLICY[route.key] === 'public' || OPEN_DURING_PASSWORD_CHANGE.includes(route.key)) continue;
      const method = route.method.toLowerCase() as 'get' | 'post' | 'patch' | 'delete';
      const url = `/api${route.path.replace(/:[a-z]+/gi, '00000000-0000-4000-8000-000000000000')}`;
      const res = await request(app)[method](url).set(bearer(token)).send({});
      if (res.status !== 403 || res.body.error?.code !== 'password_change_required') problems.push(`${route.key}: ${res.status} ${res.body.error?.code}`);
    }
    expect(problems).toEqual([]);
    expect(apiRoutes(app).length).toBeGreaterThan(60);

    const changed = await changePassword(token, 'granite-ledger-42', 'harbour-pump-meadow');
    expect(changed.status).toBe(200);
    expect(changed.body.user.mustChangePassword).toBe(false);
    const fresh = changed.body.token as string;
    expect((await request(app).get('/api/notifications').set(bearer(fresh))).status).toBe(200);
    expect((await request(app).get('/api/drum-types?pageSize=1').set(bearer(fresh))).status).toBe(200);
    expect((await me(fresh)).body.user.mustChangePassword).toBe(false);
  });
});

describe('an administrator resets a password', () => {
  it('makes a temporary password shown once, flags the person and ends all their sessions', async () => {
    const before = await tokenFor(app, 'buyer@bungwise.example');
    const buyerId = (await me(before)).body.user.id as string;
    const res = await request(app).post(`/api/users/${buyerId}/reset-password`).set(bearer(admin)).send({});
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('no-store');
    const temporary = res.body.temporaryPassword as string;
    expect(passwordProblem(temporary)).toBeNull();
    expect(res.body.user).toMatchObject({ id: buyerId, mustChangePassword: true });
    expect(res.body.user).not.toHaveProperty('temporaryPassword');
    expect((await me(before)).status).toBe(401);
    expect((await request(app).post('/api/auth/sign-in').send({ email: 'buyer@bungwise.example', password: 'bungwise-demo' })).status).toBe(401);

    const signIn = await request(app).post('/api/auth/sign-in').send({ email: 'buyer@bungwise.example', password: temporary });
    expect(signIn.body.user.mustChangePassword).toBe(true);
    const gated = await request(app).get('/api/warnings').set(bearer(signIn.body.token));
    expect(gated.status).toBe(403);
    expect(gated.body.error.code).toBe('password_change_required');
    expect((await changePassword(signIn.body.token, temporary, 'orchid-valve-sunrise')).status).toBe(200);

    // The temporary password is never stored or logged in the clear; the list of people does not show it.
    expect(await auditMentions(temporary)).toBe(false);
    const log = await request(app).get(`/api/audit?entity=users&entityId=${buyerId}&action=password-reset`).set(bearer(admin));
    expect(log.body.items).toHaveLength(1);
    expect(log.body.items[0].userName).toBe('Ewa Okonkwo');
    expect(JSON.stringify((await request(app).get('/api/users').set(bearer(admin))).body)).not.toContain(temporary);
    // Two resets make two different passwords.
    const again = await request(app).post(`/api/users/${buyerId}/reset-password`).set(bearer(admin));
    expect(again.body.temporaryPassword).not.toBe(temporary);
  });

  it('refuses the admin’s own account, a malformed id and an unknown one, naming the field', async () => {
    const own = (await me(admin)).body.user.id;
    const self = await request(app).post(`/api/users/${own}/reset-password`).set(bearer(admin));
    expect(self.status).toBe(400);
    expect(self.body.error.details[0].field).toBe('id');
    expect((await me(admin)).status).toBe(200);
    const bad = await request(app).post('/api/users/not-an-id/reset-password').set(bearer(admin));
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0].field).toBe('id');
    expect((await request(app).post('/api/users/00000000-0000-4000-8000-000000000000/reset-password').set(bearer(admin))).status).toBe(404);
    const clerk = await tokenFor(app, 'clerk@bungwise.example');
    expect((await request(app).post(`/api/users/${own}/reset-password`).set(bearer(clerk))).status).toBe(403);
  });
});

// "Forgot password": a single-use link through the outbox, valid for 30 minutes, with an answer that never says
// whether the address exists; following it sets a new password and ends every session of that person.
import { createHash } from 'node:crypto';
import type { Express } from 'express';
import nodemailer from 'nodemailer';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { ChangeFeed } from '../../server/db/change-feed';
import { OutboxMessage } from '../../server/entities';
import { MailSender, SENT_ACCOUNT_MAIL } from '../../server/mail/sender';
import { FORGOT_ANSWER, RESET_LINK_MINUTES } from '../../shared/passwords';
import { bearer, makeTestApp, tokenFor } from '../support/app';
import { openTestDataSource, resetDatabase } from '../support/db';
import { clearInbox, inbox, smtpUrl } from '../support/services';

let ds: DataSource;
let app: Express; // limits high enough for the tests that are not about them

// The limits count in PostgreSQL and every test app here shares them: each test starts with none counted.
beforeEach(async () => {
  if (ds?.isInitialized) await ds.query('DELETE FROM sign_in_counters');
});

beforeAll(async () => {
  ds = await openTestDataSource();
  await resetDatabase(ds);
  app = makeTestApp(ds, { passwordLimits: { forgotPerEmail: 100, forgotPerAddress: 1000 } });
});

afterAll(async () => {
  await ds.destroy();
});

const forgot = (email: string, on = app) => request(on).post('/api/auth/forgot-password').send({ email });
const reset = (token: string, newPassword: string) => request(app).post('/api/auth/reset-password').send({ token, newPassword });
const signIn = (email: string, password: string) => request(app).post('/api/auth/sign-in').send({ email, password });

/** The token in the newest reset mail queued for that address (read from the outbox before it is sent). */
async function linkTokenFor(email: string): Promise<string> {
  const [mail] = await ds.getRepository(OutboxMessage).find({ where: { toEmail: email, kind: 'password-reset' }, order: { createdAt: 'DESC' }, take: 1 });
  const token = /\/reset-password#token=([A-Za-z0-9_-]+)/.exec(mail?.textBody ?? '')?.[1];
  if (!token) throw new Error(`no reset link queued for ${email}`);
  return token;
}

const resetMails = async (email: string) => ds.getRepository(OutboxMessage).count({ where: { toEmail: email, kind: 'password-reset' } });

describe('asking for a reset link', () => {
  it('queues one mail with a single-use link for an active account, keeping only the hash of its token', async () => {
    const res = await forgot('Clerk@Bungwise.Example');
    expect(res.status).toBe(202);
    expect(res.body).toEqual({ message: FORGOT_ANSWER });
    const token = await linkTokenFor('clerk@bungwise.example');
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    const rows = await ds.query(
      `SELECT r.token_hash, r.used_at, extract(epoch FROM r.expires_at - r.created_at) AS seconds FROM password_resets r JOIN users u ON u.id = r.user_id WHERE u.email = 'clerk@bungwise.example'`,
    );
    expect(rows).toHaveLength(1);
    expect(rows[0].token_hash).toBe(createHash('sha256').update(token).digest('hex'));
    expect(rows[0].used_at).toBeNull();
    expect(Number(rows[0].seconds)).toBeCloseTo(RESET_LINK_MINUTES * 60, -1);
    // The token itself is in no table but the queued mail.
    const [{ n }] = await ds.query(`SELECT count(*)::int AS n FROM password_resets WHERE token_hash LIKE '%' || $1 || '%'`, [token]);
    expect(n).toBe(0);
  });

  it('answers an unknown address and a deactivated account exactly as a known one, and mails neither', async () => {
    const known = await forgot('buyer@bungwise.example');
    const unknown = await forgot('nobody.here@bungwise.example');
    await ds.query(`UPDATE users SET active = false WHERE email = 'engineer2@bungwise.example'`);
    const inactive = await forgot('engineer2@bungwise.example');
    await ds.query(`UPDATE users SET active = true WHERE email = 'engineer2@bungwise.example'`);
    for (const res of [unknown, inactive]) {
      expect(res.status).toBe(known.status);
      expect(res.body).toEqual(known.body);
      expect(res.headers['content-length']).toBe(known.headers['content-length']);
    }
    expect(await resetMails('nobody.here@bungwise.example')).toBe(0);
    expect(await resetMails('engineer2@bungwise.example')).toBe(0);
    expect(await resetMails('buyer@bungwise.example')).toBe(1);
  });

  it('takes about as long for an unknown address as for a known one', async () => {
    const time = async (email: string) => {
      const start = process.hrtime.bigint();
      expect((await forgot(email)).status).toBe(202);
      return Number(process.hrtime.bigint() - start) / 1e6;
    };
    const known: number[] = [];
    const unknown: number[] = [];
    for (let i = 0; i < 4; i++) {
      known.push(await time('engineer@bungwise.example'));
      unknown.push(await time(`nobody${i}@bungwise.example`));
    }
    const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
    // Every answer waits for the same floor (250 ms), which covers the known address's look-up and writes.
    expect(Math.min(...known, ...unknown)).toBeGreaterThanOrEqual(245);
    expect(Math.abs(median(known) - median(unknown))).toBeLessThan(60);
  });

  it('limits requests per target address (known or not) and per client address with 429', async () => {
    const limited = makeTestApp(ds, { passwordLimits: { forgotPerEmail: 2, forgotPerAddress: 5, forgotAnswerMs: 0 } });
    for (const email of ['clerk@bungwise.example', 'nobody.x@bungwise.example']) {
      const statuses: number[] = [];
      for (let i = 0; i < 3; i++) statuses.push((await forgot(email, limited)).status);
      expect(statuses).toEqual([202, 202, 429]);
    }
    // Five requests from this address so far: the next one, for any address, is refused.
    const sixth = await forgot('someone.else@bungwise.example', limited);
    expect(sixth.status).toBe(429);
    expect(sixth.body.error.code).toBe('too_many_attempts');
  });

  it('refuses a malformed address naming the field, and queues nothing', async () => {
    const before = await ds.getRepository(OutboxMessage).count();
    const res = await request(app).post('/api/auth/forgot-password').send({ email: 'not an address', extra: 1 });
    expect(res.status).toBe(400);
    expect(res.body.error.details.map((d: { field: string }) => d.field).sort()).toEqual(['email', 'extra']);
    expect(await ds.getRepository(OutboxMessage).count()).toBe(before);
  });
});

describe('following the link', () => {
  it('sets the new password once, ends every session, and the link then stops working', async () => {
    const session = await tokenFor(app, 'buyer@bungwise.example');
    await forgot('buyer@bungwise.example');
    const token = await linkTokenFor('buyer@bungwise.example');
    const weak = await reset(token, 'short');
    expect(weak.status).toBe(400);
    expect(weak.body.error.details[0].field).toBe('newPassword');
    // A refused password does not spend the link.
    const done = await reset(token, 'lantern-quarry-basin');
    expect(done.status).toBe(200);
    expect((await request(app).get('/api/me').set(bearer(session))).status).toBe(401);
    expect((await signIn('buyer@bungwise.example', 'bungwise-demo')).status).toBe(401);
    const fresh = await signIn('buyer@bungwise.example', 'lantern-quarry-basin');
    expect(fresh.status).toBe(200);
    expect(fresh.body.user.mustChangePassword).toBe(false);
    const again = await reset(token, 'another-good-phrase');
    expect(again.status).toBe(400);
    expect(again.body.error).toMatchObject({ code: 'reset_link_invalid', details: [{ field: 'token' }] });
    expect((await signIn('buyer@bungwise.example', 'lantern-quarry-basin')).status).toBe(200);
    const [{ n }] = await ds.query(`SELECT count(*)::int AS n FROM audit_log WHERE action = 'password-reset' AND summary LIKE '%e-mailed link%'`);
    expect(n).toBe(1);
    const [{ leaks }] = await ds.query(
      `SELECT count(*)::int AS leaks FROM audit_log WHERE concat_ws(' ', summary, after::text) LIKE '%lantern-quarry-basin%' OR concat_ws(' ', summary, after::text) LIKE '%' || $1 || '%'`,
      [token],
    );
    expect(leaks).toBe(0);
  });

  it('refuses a link past its 30 minutes (the stored expiry moved, not the clock) and an unknown token', async () => {
    await forgot('engineer2@bungwise.example');
    const token = await linkTokenFor('engineer2@bungwise.example');
    const hash = createHash('sha256').update(token).digest('hex');
    // As if the 30 minutes had passed: the expiry a second ago.
    await ds.query(`UPDATE password_resets SET expires_at = now() - interval '1 second' WHERE token_hash = $1`, [hash]);
    const late = await reset(token, 'meadow-gasket-timber');
    expect(late.status).toBe(400);
    expect(late.body.error.code).toBe('reset_link_invalid');
    // The same link with a minute left works: the refusal above was the expiry's.
    await ds.query(`UPDATE password_resets SET expires_at = now() + interval '1 minute' WHERE token_hash = $1`, [hash]);
    expect((await reset(token, 'meadow-gasket-timber')).status).toBe(200);
    const unknown = await reset('A'.repeat(43), 'meadow-gasket-timber');
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.code).toBe('reset_link_invalid');
  });

  it('clears a forced change, and an older link stops working once the password is changed another way', async () => {
    const admin = await tokenFor(app, 'admin@bungwise.example');
    const clerkId = (await ds.query(`SELECT id FROM users WHERE email = 'clerk@bungwise.example'`))[0].id;
    await forgot('clerk@bungwise.example');
    const older = await linkTokenFor('clerk@bungwise.example');
    const temp = (await request(app).post(`/api/users/${clerkId}/reset-password`).set(bearer(admin))).body.temporaryPassword;
    expect((await signIn('clerk@bungwise.example', temp)).body.user.mustChangePassword).toBe(true);
    expect((await reset(older, 'gravel-orbit-canal')).body.error.code).toBe('reset_link_invalid');
    await forgot('clerk@bungwise.example');
    expect((await reset(await linkTokenFor('clerk@bungwise.example'), 'gravel-orbit-canal')).status).toBe(200);
    expect((await signIn('clerk@bungwise.example', 'gravel-orbit-canal')).body.user.mustChangePassword).toBe(false);
  });

  it('reaches the mailbox through the relay, and the sent mail keeps no link', async () => {
    await clearInbox();
    await forgot('engineer@bungwise.example');
    const token = await linkTokenFor('engineer@bungwise.example');
    await ds.query(`DELETE FROM outbox WHERE status = 'pending' AND NOT (kind = 'password-reset' AND to_email = 'engineer@bungwise.example' AND text_body LIKE '%' || $1 || '%')`, [token]);
    expect(await new MailSender(ds, nodemailer.createTransport(smtpUrl())).flush()).toBe(1);
    const mail = (await inbox()).find((m) => m.to[0].address === 'engineer@bungwise.example')!;
    expect(mail.subject).toBe('[Bungwise] Choose a new password');
    expect(mail.text).toContain(`/reset-password#token=${token}`);
    expect(mail.html).toContain(`/reset-password#token=${token}`);
    expect(mail.text).toContain(`${RESET_LINK_MINUTES} minutes`);
    const [{ n }] = await ds.query(`SELECT count(*)::int AS n FROM outbox WHERE text_body LIKE '%' || $1 || '%' OR html_body LIKE '%' || $1 || '%'`, [token]);
    expect(n).toBe(0);
    const sent = await ds.getRepository(OutboxMessage).findOneByOrFail({ toEmail: 'engineer@bungwise.example', kind: 'password-reset', status: 'sent' });
    expect(sent.textBody).toBe(SENT_ACCOUNT_MAIL);
  });

  it('is sent even to someone who turned every notice mail off', async () => {
    const clerk = await tokenFor(app, 'clerk@bungwise.example', 'gravel-orbit-canal');
    await request(app)
      .patch('/api/me')
      .set(bearer(clerk))
      .send({ mailOff: ['lot-held', 'hardware-gap', 'pairing-review', 'pairing-decision'] });
    const before = await resetMails('clerk@bungwise.example');
    await forgot('clerk@bungwise.example');
    expect(await resetMails('clerk@bungwise.example')).toBe(before + 1);
  });
});

describe('with signed-in users kept in memory (the change feed)', () => {
  let feed: ChangeFeed;
  let kept: Express;
  beforeAll(async () => {
    feed = new ChangeFeed(process.env.DATABASE_URL!, 1000);
    kept = makeTestApp(ds, { changes: feed, passwordLimits: { forgotPerEmail: 100, forgotAnswerMs: 0 } });
    await feed.start();
    expect(feed.isListening).toBe(true);
  });
  afterAll(async () => {
    await feed.stop();
  });

  const meOn = (on: Express, token: string) => request(on).get('/api/me').set(bearer(token));

  it('a change made by another process drops the kept row when the users table announces it', async () => {
    const token = await tokenFor(kept, 'engineer2@bungwise.example', 'meadow-gasket-timber');
    expect((await meOn(kept, token)).status).toBe(200);
    expect((await meOn(kept, token)).status).toBe(200); // now kept
    const other = await tokenFor(app, 'engineer2@bungwise.example', 'meadow-gasket-timber');
    expect((await request(app).post('/api/me/password').set(bearer(other)).send({ currentPassword: 'meadow-gasket-timber', newPassword: 'sorrel-ridge-pump' })).status).toBe(200);
    const end = Date.now() + 5000;
    let status = 200;
    while (status === 200 && Date.now() < end) {
      status = (await meOn(kept, token)).status;
      if (status === 200) await new Promise((r) => setTimeout(r, 20));
    }
    expect(status).toBe(401);
  });

  it('a reset from a link through this process ends kept sessions at once, without waiting for the notice', async () => {
    await ds.query(`ALTER TABLE users DISABLE TRIGGER users_notify`);
    try {
      const token = await tokenFor(kept, 'engineer2@bungwise.example', 'sorrel-ridge-pump');
      await meOn(kept, token);
      expect((await meOn(kept, token)).status).toBe(200);
      await request(kept).post('/api/auth/forgot-password').send({ email: 'engineer2@bungwise.example' });
      const done = await request(kept)
        .post('/api/auth/reset-password')
        .send({ token: await linkTokenFor('engineer2@bungwise.example'), newPassword: 'thistle-canal-forge' });
      expect(done.status).toBe(200);
      expect((await meOn(kept, token)).status).toBe(401);
    } finally {
      await ds.query(`ALTER TABLE users ENABLE TRIGGER users_notify`);
    }
  });
});

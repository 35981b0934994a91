import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { DEFAULT_SIGN_IN_LIMITS } from '../../server/auth/sign-in-limits';
import { makeTestApp } from '../support/app';
import { openResetDatabase } from '../support/db';
import { ServerProcess } from '../support/server-process';

// Failed sign-ins are counted in PostgreSQL: they must hold across server processes that share nothing
// but the database (separate machines behind a load balancer), and a stranger must not be able to lock
// the owner out of their account.
let ds: DataSource;

beforeAll(async () => {
  ds = await openResetDatabase();
});

afterAll(() => ds.destroy());

beforeEach(async () => {
  await ds.query('DELETE FROM sign_in_counters');
});

const OWNER = 'clerk@bungwise.example';
// The app trusts X-Forwarded-For from loopback (its default `trust proxy`), as from a load balancer there.
const from = (app: Express | string, address: string, password: string, email = OWNER) => request(app).post('/api/auth/sign-in').set('X-Forwarded-For', address).send({ email, password });

describe('two server processes on one database', () => {
  const a = new ServerProcess();
  const b = new ServerProcess();

  beforeAll(() => Promise.all([a.start(), b.start()]), 60_000);
  afterAll(async () => {
    expect(await Promise.all([a.stop(), b.stop()])).toEqual([0, 0]);
  }, 20_000);

  it('refuse the ninth failed sign-in for an account whichever of them answers, and keep refusing on both', async () => {
    const { perAccount } = DEFAULT_SIGN_IN_LIMITS;
    expect(perAccount).toBe(8);
    const statuses: number[] = [];
    // Alternating: each process alone sees only half the failures.
    for (let i = 0; i <= perAccount; i++) {
      statuses.push(
        (
          await request(i % 2 ? b.base : a.base)
            .post('/api/auth/sign-in')
            .send({ email: OWNER, password: `wrong-password-${i}` })
        ).status,
      );
    }
    expect(statuses).toEqual([...Array(perAccount).fill(401), 429]);
    for (const base of [a.base, b.base]) {
      const refused = await request(base).post('/api/auth/sign-in').send({ email: OWNER, password: 'bungwise-demo' });
      expect(refused.status).toBe(429);
      expect(refused.body.error.code).toBe('too_many_attempts');
      expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);
    }
    // The stranger's failures came from one address; the owner on a clean address, through the other process, gets in.
    const owner = await from(b.base, '203.0.113.24', 'bungwise-demo');
    expect(owner.status).toBe(200);
  }, 30_000);
});

describe('a stranger failing from other addresses', () => {
  let app: Express;
  beforeAll(() => {
    app = makeTestApp(ds, { signInLimits: { perAccount: 3, perAddress: 1000, windowMs: 60_000 } });
  });

  it('does not lock the owner out of a clean address, and gets one try per fresh address once the account is tripped', async () => {
    const stranger = ['198.51.100.7', '198.51.100.8', '198.51.100.9'];
    const first: number[] = [];
    for (let i = 0; i < 4; i++) first.push((await from(app, stranger[0], `guess-${i}`)).status);
    expect(first).toEqual([401, 401, 401, 429]);
    // A second address: the account is tripped, so one guess, then refused.
    expect((await from(app, stranger[1], 'guess-a')).status).toBe(401);
    const again = await from(app, stranger[1], 'guess-b');
    expect(again.status).toBe(429);
    expect(Number(again.headers['retry-after'])).toBeLessThanOrEqual(60);
    // The stranger's addresses stay refused even with the right password.
    expect((await from(app, stranger[0], 'bungwise-demo')).status).toBe(429);
    // The owner, from an address with no failures, signs in; and again later from it.
    expect((await from(app, '203.0.113.5', 'bungwise-demo')).status).toBe(200);
    expect((await from(app, '203.0.113.5', 'bungwise-demo')).status).toBe(200);
    // Other accounts are not held by it.
    expect((await from(app, stranger[2], 'bungwise-demo', 'buyer@bungwise.example')).status).toBe(200);
  });

  it('lets parallel guesses from one address through no further than the limit', async () => {
    const statuses = await Promise.all(Array.from({ length: 10 }, (_, i) => from(app, '198.51.100.30', `parallel-${i}`).then((r) => r.status)));
    expect(statuses.filter((s) => s === 401)).toHaveLength(3);
    expect(statuses.filter((s) => s === 429)).toHaveLength(7);
  });

  it("forgets the owner's typos from an address once they sign in from it", async () => {
    expect((await from(app, '198.51.100.50', 'guess-x')).status).toBe(401);
    for (let i = 0; i < 2; i++) expect((await from(app, '203.0.113.40', `typo-${i}`)).status).toBe(401);
    expect((await from(app, '203.0.113.40', 'bungwise-demo')).status).toBe(200);
    // Three failures allowed again from the owner's address, as if the typos before had never been.
    const after: number[] = [];
    for (let i = 0; i < 4; i++) after.push((await from(app, '203.0.113.40', `typo-again-${i}`)).status);
    expect(after).toEqual([401, 401, 401, 429]);
  });
});

describe('the counters out of reach', () => {
  it('answer 503 with Retry-After, even for the right password, rather than letting attempts through uncounted', async () => {
    const app = makeTestApp(ds);
    await ds.query('ALTER TABLE sign_in_counters RENAME TO sign_in_counters_away');
    try {
      const res = await request(app).post('/api/auth/sign-in').send({ email: OWNER, password: 'bungwise-demo' });
      expect(res.status).toBe(503);
      expect(res.body.error.code).toBe('unavailable');
      expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
    } finally {
      await ds.query('ALTER TABLE sign_in_counters_away RENAME TO sign_in_counters');
    }
    expect((await request(app).post('/api/auth/sign-in').send({ email: OWNER, password: 'bungwise-demo' })).status).toBe(200);
  });
});

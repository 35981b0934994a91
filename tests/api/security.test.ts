import type { Express } from 'express';
import jwt from 'jsonwebtoken';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { POLICY } from '../../server/auth/policy';
import { signToken } from '../../server/auth/tokens';
import { bearer, makeTestApp, TEST_SECRET, tokenFor } from '../support/app';
import { openTestDataSource, resetDatabase } from '../support/db';
import { apiRoutes } from '../support/routes';
import { testStorage } from '../support/services';

let ds: DataSource;
let app: Express;
const tokens: Record<string, string> = {};
const ROLES = ['clerk', 'engineer', 'buyer', 'admin'] as const;
const realIds: Record<string, string> = {};

beforeAll(async () => {
  ds = await openTestDataSource();
  await resetDatabase(ds);
  app = makeTestApp(ds, { storage: testStorage() });
  for (const role of ROLES) tokens[role] = await tokenFor(app, `${role}@bungwise.example`);
  // A real id of each registry table, so that reads of one record answer 200.
  for (const r of ['suppliers', 'thread-specs', 'key-codes', 'drum-types', 'dip-tubes', 'connectors', 'pairings', 'slurries', 'stations', 'tube-sets']) {
    realIds[r] = (await request(app).get(`/api/${r}?pageSize=1`).set(bearer(tokens.admin))).body.items[0].id;
  }
  // An approved pairing: approving or rejecting it again is a conflict (409) for everyone allowed, so the
  // four-eyes refusal of a draft's own author (a 403 by design) does not depend on which pairing comes first.
  realIds.pairings = (await request(app).get('/api/pairings?status=approved&pageSize=1').set(bearer(tokens.admin))).body.items[0].id;
});

afterAll(async () => {
  await ds.destroy();
});

function concrete(path: string): string {
  if (path === '/tools/drum-types/:id/checks') return `/tools/drum-types/${realIds['drum-types']}/checks`;
  if (path === '/attachments') return `/attachments?ownerKind=drum-type&ownerId=${realIds['drum-types']}`;
  const first = path.split('/')[1];
  return path
    .replace(':id', realIds[first] ?? (first === 'stations' ? realIds.stations : '00000000-0000-4000-8000-000000000000'))
    .replace(':code', '1A1')
    .replace(':kind', 'dip-tubes')
    .replace(':resource', 'dip-tubes');
}

describe('the role matrix: every route, every role, no token', () => {
  const routes = () => apiRoutes(app);

  it('every route the app serves has an entry in the policy table, and every entry names a route', () => {
    const keys = routes().map((r) => r.key);
    expect(keys.length).toBeGreaterThan(60);
    expect(keys.filter((k) => !(k in POLICY))).toEqual([]);
    expect(Object.keys(POLICY).filter((k) => !keys.includes(k))).toEqual([]);
  });

  it('answers 401 without a token, 403 to a role the policy leaves out, and lets the others through', async () => {
    const problems: string[] = [];
    for (const route of routes()) {
      const access = POLICY[route.key];
      const url = `/api${concrete(route.path)}${route.method === 'DELETE' ? '?version=999' : ''}`;
      const call = (token?: string) => {
        const method = route.method.toLowerCase() as 'get' | 'post' | 'patch' | 'delete';
        let req = request(app)[method](url);
        if (token) req = req.set(bearer(token));
        return route.method === 'GET' || route.method === 'DELETE' ? req : req.send({});
      };
      const anonymous = await call();
      if (access === 'public') {
        if (anonymous.status === 401 || anonymous.status === 403) problems.push(`${route.key} anonymous got ${anonymous.status}`);
      } else if (anonymous.status !== 401) problems.push(`${route.key} anonymous got ${anonymous.status}, expected 401`);
      for (const role of ROLES) {
        const allowed = access === 'public' || access === 'signed-in' || (access as readonly string[]).includes(role);
        const res = await call(tokens[role]);
        if (!allowed && res.status !== 403) problems.push(`${route.key} as ${role} got ${res.status}, expected 403`);
        if (allowed && (res.status === 401 || res.status === 403) && !(route.key === 'POST /api/attachments')) problems.push(`${route.key} as ${role} got ${res.status}, expected to pass`);
        if (res.status >= 500) problems.push(`${route.key} as ${role} got ${res.status}`);
        // Reads that need no input answer 200 to every role allowed.
        if (
          allowed &&
          route.method === 'GET' &&
          res.status !== 200 &&
          !route.path.includes('/content') &&
          !route.path.includes('/url') &&
          !route.path.includes('/imports/:id') &&
          !route.path.includes('/receiving-checks/:id') &&
          !route.path.includes('/sourcing-plans/:id')
        ) {
          problems.push(`${route.key} as ${role} got ${res.status}, expected 200`);
        }
      }
    }
    expect(problems).toEqual([]);
  }, 120_000);
});

describe('tokens', () => {
  it('refuses a tampered, an expired, a wrongly signed and a deactivated user’s token', async () => {
    const token = tokens.buyer;
    const payload = jwt.decode(token) as { sub: string };
    const [h, p, sig] = token.split('.');
    const promoted = Buffer.from(JSON.stringify({ ...payload, role: 'admin' })).toString('base64url');
    expect(
      (
        await request(app)
          .get('/api/users')
          .set(bearer(`${h}.${promoted}.${sig}`))
      ).status,
    ).toBe(401);
    expect(
      (
        await request(app)
          .get('/api/me')
          .set(bearer(signToken({ sub: payload.sub, role: 'buyer' }, TEST_SECRET, -1)))
      ).status,
    ).toBe(401);
    expect(
      await request(app)
        .get('/api/me')
        .set(bearer(signToken({ sub: payload.sub, role: 'buyer' }, 'another-secret'))),
    ).toMatchObject({ status: 401 });
    const none = `${Buffer.from('{"alg":"none","typ":"JWT"}').toString('base64url')}.${p}.`;
    expect((await request(app).get('/api/me').set(bearer(none))).status).toBe(401);
    const users = await request(app).get('/api/users').set(bearer(tokens.admin));
    const buyerId = users.body.items.find((u: { email: string }) => u.email === 'buyer@bungwise.example').id;
    const version = (await ds.query('SELECT version FROM users WHERE id = $1', [buyerId]))[0].version;
    expect(version).toBeGreaterThan(0);
    await request(app).patch(`/api/users/${buyerId}`).set(bearer(tokens.admin)).send({ active: false });
    expect((await request(app).get('/api/me').set(bearer(token))).status).toBe(401);
    await request(app).patch(`/api/users/${buyerId}`).set(bearer(tokens.admin)).send({ active: true });
  });
});

describe('sign-in limits', () => {
  it('limits failures per address across accounts', async () => {
    const limited = makeTestApp(ds, { signInLimits: { perAccount: 100, perAddress: 3, windowMs: 60_000 } });
    const statuses: number[] = [];
    for (const who of ['a', 'b', 'c', 'd'])
      statuses.push(
        (
          await request(limited)
            .post('/api/auth/sign-in')
            .send({ email: `${who}@bungwise.example`, password: 'wrong-password' })
        ).status,
      );
    expect(statuses).toEqual([401, 401, 401, 429]);
  });

  it('refuses passwords shorter than 12 characters or on the common list', async () => {
    const short = await request(app).post('/api/users').set(bearer(tokens.admin)).send({ email: 'p1@bungwise.example', name: 'P', role: 'clerk', temporaryPassword: 'elevenchars' });
    expect(short.body.error.details[0]).toEqual({ field: 'temporaryPassword', messages: ['must be at least 12 characters'] });
    const common = await request(app).post('/api/users').set(bearer(tokens.admin)).send({ email: 'p2@bungwise.example', name: 'P', role: 'clerk', temporaryPassword: 'qwerty123456' });
    expect(common.body.error.details[0].messages[0]).toMatch(/common/);
  });
});

describe('headers', () => {
  it('sends helmet headers and no CORS grant to another origin; an allowed origin gets one', async () => {
    const res = await request(app).get('/api/health').set('Origin', 'http://elsewhere.example');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-frame-options']).toBe('SAMEORIGIN');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    // The label scanner's decoder is WebAssembly: compiling it needs 'wasm-unsafe-eval' (CSP Level 3), which allows no JS eval.
    expect(res.headers['content-security-policy']).toMatch(/script-src 'self' 'wasm-unsafe-eval'(;|$)/);
    // On the plant's plain-http address an upgrade would send every script request to https, where nothing answers.
    expect(res.headers['content-security-policy']).not.toContain('upgrade-insecure-requests');
    expect(res.headers['access-control-allow-origin']).toBeUndefined();
    const preflight = await request(app).options('/api/dip-tubes').set('Origin', 'http://elsewhere.example').set('Access-Control-Request-Method', 'POST');
    expect(preflight.headers['access-control-allow-origin']).toBeUndefined();
    const open = makeTestApp(ds, { allowedOrigins: ['https://fab-portal.example'] });
    const allowed = await request(open).get('/api/health').set('Origin', 'https://fab-portal.example');
    expect(allowed.headers['access-control-allow-origin']).toBe('https://fab-portal.example');
  });
});

describe('the audit log', () => {
  it('records registry changes and approvals with who, when, before and after; the API cannot edit it', async () => {
    const tube = (await request(app).get('/api/dip-tubes?pageSize=1').set(bearer(tokens.engineer))).body.items[0];
    const changed = await request(app).patch(`/api/dip-tubes/${tube.id}`).set(bearer(tokens.engineer)).send({ version: tube.version, material: 'PVDF' });
    expect(changed.status).toBe(200);
    const log = await request(app).get(`/api/audit?entity=dip-tubes&entityId=${tube.id}`).set(bearer(tokens.engineer));
    expect(log.status).toBe(200);
    expect(log.body.items[0]).toMatchObject({
      action: 'update',
      userName: 'Tomasz Ilunga',
      before: expect.objectContaining({ material: tube.material }),
      after: expect.objectContaining({ material: 'PVDF' }),
    });
    expect(typeof log.body.items[0].at).toBe('string');
    expect((await request(app).get('/api/audit').set(bearer(tokens.clerk))).status).toBe(403);
    const byAction = await request(app).get('/api/audit?action=update&entity=dip-tubes').set(bearer(tokens.admin));
    expect(byAction.body.items.every((e: { action: string }) => e.action === 'update')).toBe(true);
    for (const method of ['post', 'patch', 'delete'] as const) {
      expect([404, 405]).toContain((await request(app)[method](`/api/audit/${log.body.items[0].id}`).set(bearer(tokens.admin))).status);
    }
    await expect(ds.query('UPDATE audit_log SET summary = $1', ['rewritten'])).rejects.toThrow(/append-only/);
    await expect(ds.query('DELETE FROM audit_log')).rejects.toThrow(/append-only/);
  });
});

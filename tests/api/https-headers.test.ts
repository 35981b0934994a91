import request from 'supertest';
import type { DataSource } from 'typeorm';
import { trustProxyFromEnv } from '../../server/common/security-headers';
import { makeTestApp } from '../support/app';
import { openResetDatabase } from '../support/db';

// upgrade-insecure-requests (and the other HTTPS-only headers) only where the deployment is HTTPS: over
// plain HTTP on an intranet address it made the browser fetch the app's scripts over HTTPS, and the
// page stayed blank.
let ds: DataSource;

beforeAll(async () => {
  ds = await openResetDatabase();
});

afterAll(() => ds.destroy());

const headersOf = async (app: ReturnType<typeof makeTestApp>, set: Record<string, string> = {}) => (await request(app).get('/api/health').set(set)).headers;

describe('HTTPS-only headers', () => {
  it('are left out over plain HTTP, while the rest of the policy stays', async () => {
    const h = await headersOf(makeTestApp(ds));
    expect(h['content-security-policy']).toContain("default-src 'self'");
    expect(h['content-security-policy']).toContain("script-src 'self'");
    expect(h['content-security-policy']).not.toContain('upgrade-insecure-requests');
    expect(h['strict-transport-security']).toBeUndefined();
    expect(h['cross-origin-opener-policy']).toBeUndefined();
    expect(h['x-content-type-options']).toBe('nosniff');
  });

  it('are sent when the public URL is https', async () => {
    const h = await headersOf(makeTestApp(ds, { publicUrl: 'https://bungwise.fab3.example' }));
    expect(h['content-security-policy']).toContain('upgrade-insecure-requests');
    expect(h['strict-transport-security']).toMatch(/max-age=\d+/);
    expect(h['cross-origin-opener-policy']).toBe('same-origin');
  });

  it('are sent when a trusted proxy says the request came over TLS, and not when an untrusted one says so', async () => {
    const trusted = await headersOf(makeTestApp(ds), { 'X-Forwarded-Proto': 'https' });
    expect(trusted['content-security-policy']).toContain('upgrade-insecure-requests');
    const untrusted = await headersOf(makeTestApp(ds, { trustProxy: false }), { 'X-Forwarded-Proto': 'https' });
    expect(untrusted['content-security-policy']).not.toContain('upgrade-insecure-requests');
  });
});

describe('BUNGWISE_TRUST_PROXY', () => {
  it('reads hop counts, true/false and address lists, and trusts loopback when unset', () => {
    expect(trustProxyFromEnv(undefined)).toBe('loopback');
    expect(trustProxyFromEnv(' ')).toBe('loopback');
    expect(trustProxyFromEnv('1')).toBe(1);
    expect(trustProxyFromEnv('false')).toBe(false);
    expect(trustProxyFromEnv('10.20.0.0/16, loopback')).toBe('10.20.0.0/16, loopback');
  });

  it('decides which address a sign-in failure is counted against', async () => {
    // One hop trusted (the proxy in front, here on loopback): the address it saw, not what the client wrote before it.
    const app = makeTestApp(ds, { trustProxy: 1, signInLimits: { perAccount: 100, perAddress: 1, windowMs: 60_000 } });
    await ds.query('DELETE FROM sign_in_counters');
    const attempt = (xff: string) => request(app).post('/api/auth/sign-in').set('X-Forwarded-For', xff).send({ email: 'buyer@bungwise.example', password: 'wrong-password' });
    expect((await attempt('203.0.113.1, 198.51.100.61')).status).toBe(401);
    // Another forged first entry, the same real address: refused.
    expect((await attempt('203.0.113.2, 198.51.100.61')).status).toBe(429);
    expect((await attempt('203.0.113.2, 198.51.100.62')).status).toBe(401);
  });
});

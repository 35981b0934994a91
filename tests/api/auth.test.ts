import type { Express } from 'express';
import jwt from 'jsonwebtoken';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { signToken } from '../../server/auth/tokens';
import { bearer, makeTestApp, TEST_SECRET, tokenFor } from '../support/app';
import { openTestDataSource, resetDatabase } from '../support/db';

let ds: DataSource;
let app: Express;

beforeAll(async () => {
  ds = await openTestDataSource();
  await resetDatabase(ds);
  app = makeTestApp(ds, { signInLimits: { perAccount: 3, perAddress: 1000, windowMs: 60_000 } });
});

afterAll(async () => {
  await ds.destroy();
});

describe('sign-in', () => {
  it('answers a token and the user for the right password, whatever the e-mail case', async () => {
    const res = await request(app).post('/api/auth/sign-in').send({ email: 'Engineer@Bungwise.Example', password: 'bungwise-demo' });
    expect(res.status).toBe(200);
    expect(typeof res.body.token).toBe('string');
    expect(res.body.user).toMatchObject({ email: 'engineer@bungwise.example', role: 'engineer' });
    expect(Object.keys(res.body.user).sort()).toEqual(expect.arrayContaining(['id', 'email', 'name', 'role']));
    expect(res.body.user).not.toHaveProperty('passwordHash');
    const me = await request(app).get('/api/me').set(bearer(res.body.token));
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe('engineer@bungwise.example');
  });

  it('answers 401 with one message for a wrong password and for an unknown e-mail', async () => {
    const wrong = await request(app).post('/api/auth/sign-in').send({ email: 'buyer@bungwise.example', password: 'not-the-password' });
    const unknown = await request(app).post('/api/auth/sign-in').send({ email: 'nobody@bungwise.example', password: 'not-the-password' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body.error.code).toBe('unauthorized');
    expect(wrong.body.error.message).toBe(unknown.body.error.message);
    expect(wrong.body).not.toHaveProperty('token');
  });

  it('rate-limits repeated failures for one account with 429', async () => {
    const attempt = () => request(app).post('/api/auth/sign-in').send({ email: 'clerk@bungwise.example', password: 'wrong-password-x' });
    const statuses = [];
    for (let i = 0; i < 4; i++) statuses.push((await attempt()).status);
    expect(statuses).toEqual([401, 401, 401, 429]);
    const limited = await attempt();
    expect(limited.body.error.code).toBe('too_many_attempts');
  });

  it('answers 400 naming each bad field, in the one error shape', async () => {
    const res = await request(app).post('/api/auth/sign-in').send({ email: 'not-an-email', password: 42, extra: true });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    const fields = (res.body.error.details as Array<{ field: string }>).map((d) => d.field).sort();
    expect(fields).toEqual(['email', 'extra', 'password']);
    expect(res.body.error.message).toMatch(/email/);
  });

  it('answers 400 for malformed JSON, naming the body', async () => {
    const res = await request(app).post('/api/auth/sign-in').set('Content-Type', 'application/json').send('{"email": ');
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'malformed_json', details: [{ field: 'body' }] });
  });
});

describe('tokens and roles', () => {
  it('answers 401 without a token, with a tampered token and with an expired one', async () => {
    expect((await request(app).get('/api/me')).status).toBe(401);
    const token = await tokenFor(app, 'buyer@bungwise.example');
    const [h, p] = token.split('.');
    const forged = `${h}.${p}.${Buffer.from('forged-signature').toString('base64url')}`;
    expect((await request(app).get('/api/me').set(bearer(forged))).status).toBe(401);
    const payload = jwt.decode(token) as { sub: string };
    const expired = signToken({ sub: payload.sub, role: 'buyer' }, TEST_SECRET, -10);
    const res = await request(app).get('/api/me').set(bearer(expired));
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthorized');
  });

  it('answers 403 when the role may not use the route', async () => {
    const token = await tokenFor(app, 'engineer@bungwise.example');
    const res = await request(app).get('/api/users').set(bearer(token));
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
  });

  it('keeps health and sign-in open, and everything else closed', async () => {
    expect((await request(app).get('/api/health')).status).toBe(200);
    expect((await request(app).get('/api/no-such-route')).status).toBe(401);
  });
});

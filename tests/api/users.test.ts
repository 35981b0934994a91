import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { bearer, openTestApp, tokenFor } from '../support/app';

let ds: DataSource;
let app: Express;
let admin: string;

beforeAll(async () => {
  ({ ds, app } = await openTestApp());
  admin = await tokenFor(app, 'admin@bungwise.example');
});

afterAll(() => ds.destroy());

describe('people, managed by admins', () => {
  it('lists the demo people: one per role and a second engineer', async () => {
    const res = await request(app).get('/api/users').set(bearer(admin));
    expect(res.status).toBe(200);
    expect(res.body.items.map((u: { role: string }) => u.role).sort()).toEqual(['admin', 'buyer', 'clerk', 'engineer', 'engineer']);
  });

  it('creates a user with a temporary password who can then sign in', async () => {
    const res = await request(app).post('/api/users').set(bearer(admin)).send({ email: 'Dock.Two@Bungwise.Example', name: 'Ravi Lindqvist', role: 'clerk', temporaryPassword: 'slate-harbor-91' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ email: 'dock.two@bungwise.example', role: 'clerk', active: true });
    const token = await tokenFor(app, 'dock.two@bungwise.example', 'slate-harbor-91');
    expect(token).toBeTruthy();
  });

  it('refuses a duplicate e-mail (any case), a short or common password and an unknown role, naming the field', async () => {
    const dup = await request(app).post('/api/users').set(bearer(admin)).send({ email: 'CLERK@bungwise.example', name: 'X', role: 'clerk', temporaryPassword: 'long-enough-pass' });
    expect(dup.status).toBe(409);
    expect(dup.body.error.details[0].field).toBe('email');
    const short = await request(app).post('/api/users').set(bearer(admin)).send({ email: 'a@bungwise.example', name: 'A', role: 'clerk', temporaryPassword: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.error.details[0].field).toBe('temporaryPassword');
    const common = await request(app).post('/api/users').set(bearer(admin)).send({ email: 'b@bungwise.example', name: 'B', role: 'clerk', temporaryPassword: 'Password1234' });
    expect(common.status).toBe(400);
    expect(common.body.error.details[0].messages[0]).toMatch(/common/);
    const role = await request(app).post('/api/users').set(bearer(admin)).send({ email: 'c@bungwise.example', name: 'C', role: 'foreman', temporaryPassword: 'long-enough-pass' });
    expect(role.status).toBe(400);
    expect(role.body.error.details.map((d: { field: string }) => d.field)).toEqual(['role']);
  });

  it('changes a role, which takes effect on the next request', async () => {
    const buyer = await tokenFor(app, 'buyer@bungwise.example');
    const list = await request(app).get('/api/users').set(bearer(admin));
    const id = list.body.items.find((u: { email: string }) => u.email === 'buyer@bungwise.example').id;
    expect((await request(app).get('/api/users').set(bearer(buyer))).status).toBe(403);
    const res = await request(app).patch(`/api/users/${id}`).set(bearer(admin)).send({ role: 'admin' });
    expect(res.status).toBe(200);
    expect((await request(app).get('/api/users').set(bearer(buyer))).status).toBe(200);
    await request(app).patch(`/api/users/${id}`).set(bearer(admin)).send({ role: 'buyer' });
  });

  it('deactivates a user: their token stops working and they cannot sign in', async () => {
    const engineer = await tokenFor(app, 'engineer@bungwise.example');
    expect((await request(app).get('/api/me').set(bearer(engineer))).status).toBe(200);
    const list = await request(app).get('/api/users').set(bearer(admin));
    const id = list.body.items.find((u: { email: string }) => u.email === 'engineer@bungwise.example').id;
    const res = await request(app).patch(`/api/users/${id}`).set(bearer(admin)).send({ active: false });
    expect(res.status).toBe(200);
    expect(res.body.active).toBe(false);
    expect((await request(app).get('/api/me').set(bearer(engineer))).status).toBe(401);
    const again = await request(app).post('/api/auth/sign-in').send({ email: 'engineer@bungwise.example', password: 'bungwise-demo' });
    expect(again.status).toBe(401);
    await request(app).patch(`/api/users/${id}`).set(bearer(admin)).send({ active: true });
  });

  it('does not let an admin deactivate themselves', async () => {
    const me = await request(app).get('/api/me').set(bearer(admin));
    const res = await request(app).patch(`/api/users/${me.body.user.id}`).set(bearer(admin)).send({ active: false });
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].field).toBe('active');
  });

  it('answers 400 for a malformed id and 404 for an unknown one', async () => {
    expect((await request(app).patch('/api/users/not-a-uuid').set(bearer(admin)).send({ role: 'clerk' })).status).toBe(400);
    const missing = await request(app).patch('/api/users/00000000-0000-4000-8000-000000000000').set(bearer(admin)).send({ role: 'clerk' });
    expect(missing.status).toBe(404);
  });
});

describe("a person's own colour theme", () => {
  it("starts at 'system', is kept on the account by PATCH /me, and comes back at sign-in", async () => {
    const buyer = await tokenFor(app, 'buyer@bungwise.example');
    expect((await request(app).get('/api/me').set(bearer(buyer))).body.user.theme).toBe('system');
    const res = await request(app).patch('/api/me').set(bearer(buyer)).send({ theme: 'contrast' });
    expect(res.status).toBe(200);
    expect(res.body.user.theme).toBe('contrast');
    // Another preference leaves it alone.
    await request(app).patch('/api/me').set(bearer(buyer)).send({ lengthUnit: 'in' });
    expect((await request(app).get('/api/me').set(bearer(buyer))).body.user.theme).toBe('contrast');
    const again = await request(app).post('/api/auth/sign-in').send({ email: 'buyer@bungwise.example', password: 'bungwise-demo' });
    expect(again.body.user.theme).toBe('contrast');
    await request(app).patch('/api/me').set(bearer(buyer)).send({ theme: 'system', lengthUnit: 'mm' });
  });

  it('refuses a theme it does not know, naming the field, and changes nothing', async () => {
    const clerk = await tokenFor(app, 'clerk@bungwise.example');
    const bad = await request(app).patch('/api/me').set(bearer(clerk)).send({ theme: 'neon' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0]).toEqual({ field: 'theme', messages: ['must be one of system, light, dark, contrast'] });
    expect((await request(app).get('/api/me').set(bearer(clerk))).body.user.theme).toBe('system');
  });
});

import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { createApp, type AppOptions } from '../../server/app';
import { DEMO_PASSWORD } from '../../seeds/people';
import { openResetDatabase } from './db';

export const TEST_SECRET = process.env.JWT_SECRET ?? 'test-secret-not-for-production';

export function makeTestApp(ds: DataSource, options: Partial<AppOptions> = {}): Express {
  return createApp({ dataSource: ds, jwtSecret: TEST_SECRET, logRequests: false, ...options });
}

/** The app over the test database freshly reset to the demo scenario; the file closes `ds` after its tests. */
export async function openTestApp(options: Partial<AppOptions> = {}): Promise<{ ds: DataSource; app: Express }> {
  const ds = await openResetDatabase();
  return { ds, app: makeTestApp(ds, options) };
}

/** Signs a demo person in and returns the bearer token. */
export async function tokenFor(app: Express, email: string, password = DEMO_PASSWORD): Promise<string> {
  const res = await request(app).post('/api/auth/sign-in').send({ email, password });
  if (res.status !== 200) throw new Error(`sign-in for ${email} answered ${res.status}: ${JSON.stringify(res.body)}`);
  return res.body.token as string;
}

/** Signs in the demo person of each role (`<role>@bungwise.example`): a bearer token by role. */
export async function tokensFor(app: Express, roles: readonly string[]): Promise<Record<string, string>> {
  const tokens: Record<string, string> = {};
  for (const role of roles) tokens[role] = await tokenFor(app, `${role}@bungwise.example`);
  return tokens;
}

export const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

/** The id of the record whose `field` is exactly `value`, found through the list's search. */
export async function idOf(app: Express, token: string, resource: string, field: string, value: string): Promise<string> {
  const res = await request(app)
    .get(`/api/${resource}?q=${encodeURIComponent(value)}&pageSize=50`)
    .set(bearer(token));
  const row = res.body.items.find((r: Record<string, string>) => r[field] === value);
  if (!row) throw new Error(`${resource} ${value} not in the demo data`);
  return row.id;
}

/** The ids of several records of one resource, under the names a test gives them: `{ fittingDrum: 'CMA-D208-SL' }` gives `{ fittingDrum: '<its id>' }`. */
export async function idsOf<K extends string>(app: Express, token: string, resource: string, field: string, values: Record<K, string>): Promise<Record<K, string>> {
  const ids = {} as Record<K, string>;
  for (const [name, value] of Object.entries(values) as Array<[K, string]>) ids[name] = await idOf(app, token, resource, field, value);
  return ids;
}

/** Sets the site's time zone (the dock's dates are the site's), as an engineer would in the settings. */
export async function setSiteTimeZone(app: Express, engineerToken: string, timeZone: string): Promise<void> {
  const settings = await request(app).get('/api/settings').set(bearer(engineerToken));
  await request(app).patch('/api/settings').set(bearer(engineerToken)).send({ version: settings.body.version, timeZone }).expect(200);
}

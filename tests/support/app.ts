import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { createApp, type AppOptions } from '../../server/app';
import { DEMO_PASSWORD } from '../../seeds/people';

export const TEST_SECRET = process.env.JWT_SECRET ?? 'test-secret-not-for-production';

export function makeTestApp(ds: DataSource, options: Partial<AppOptions> = {}): Express {
  return createApp({ dataSource: ds, jwtSecret: TEST_SECRET, logRequests: false, ...options });
}

/** Signs a demo person in and returns the bearer token. */
export async function tokenFor(app: Express, email: string, password = DEMO_PASSWORD): Promise<string> {
  const res = await request(app).post('/api/auth/sign-in').send({ email, password });
  if (res.status !== 200) throw new Error(`sign-in for ${email} answered ${res.status}: ${JSON.stringify(res.body)}`);
  return res.body.token as string;
}

export const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

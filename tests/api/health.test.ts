import request from 'supertest';
import type { DataSource } from 'typeorm';
import { makeDataSource } from '../../server/db/data-source';
import { makeTestApp } from '../support/app';
import { TcpProxy } from '../support/tcp-proxy';

// The app reaches PostgreSQL through a proxy that the test cuts and restores: an outage and a recovery
// without stopping the shared cluster.
describe('health while the database goes away and comes back', () => {
  const target = new URL(process.env.DATABASE_URL ?? 'postgres://x@127.0.0.1:5432/x');
  const proxy = new TcpProxy(target.hostname, Number(target.port || 5432));
  let ds: DataSource;

  beforeAll(async () => {
    const port = await proxy.open();
    const viaProxy = new URL(target);
    viaProxy.port = String(port);
    ds = makeDataSource(viaProxy.toString(), { poolSize: 2 });
    await ds.initialize();
  });

  afterAll(async () => {
    await proxy.cut();
    await ds.destroy().catch(() => undefined);
  });

  it('answers 200 with db ok, then 503 with db down, then 200 again by itself', async () => {
    const app = makeTestApp(ds);
    const up = await request(app).get('/api/health');
    expect(up.status).toBe(200);
    expect(up.body).toEqual({ status: 'ok', db: 'ok' });

    await proxy.cut();
    const down = await request(app).get('/api/health');
    expect(down.status).toBe(503);
    expect(down.body.db).toBe('down');
    // A guarded route answers 503 too (the user lookup fails), not 500.
    const signIn = await request(app).post('/api/auth/sign-in').send({ email: 'clerk@bungwise.example', password: 'bungwise-demo' });
    expect(signIn.status).toBe(503);
    expect(signIn.body.error.code).toBe('unavailable');

    await proxy.open();
    let status = 0;
    for (let i = 0; i < 20 && status !== 200; i++) {
      status = (await request(app).get('/api/health')).status;
      if (status !== 200) await new Promise((r) => setTimeout(r, 250));
    }
    expect(status).toBe(200);
  });
});

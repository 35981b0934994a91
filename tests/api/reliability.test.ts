import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Express } from 'express';
import { Client } from 'pg';
import request from 'supertest';
import type { DataSource, EntitySubscriberInterface, EntityTarget, ObjectLiteral } from 'typeorm';
import { DEMO_REGISTRY_SUMMARY as demo } from '../../seeds/demo-registry';
import { makeDataSource } from '../../server/db/data-source';
import { ChangeOut, PairingReview } from '../../server/entities';
import { bearer, makeTestApp, tokenFor } from '../support/app';
import { openTestDataSource, resetDatabase } from '../support/db';
import { TcpProxy } from '../support/tcp-proxy';

let ds: DataSource;
let app: Express;
const t: Record<string, string> = {};

/** Makes the next insert of one entity fail inside its transaction, as a crash part-way would. */
class FailNextInsert implements EntitySubscriberInterface {
  armed = false;
  constructor(private readonly target: EntityTarget<ObjectLiteral>) {}
  listenTo() {
    return this.target as never;
  }
  beforeInsert() {
    if (this.armed) {
      this.armed = false;
      throw new Error('injected failure part-way through the commit');
    }
  }
}

const count = async (sql: string, params: unknown[] = []) => Number((await ds.query(sql, params))[0].n);

beforeAll(async () => {
  ds = await openTestDataSource();
  await resetDatabase(ds);
  app = makeTestApp(ds);
  for (const role of ['clerk', 'engineer', 'engineer2']) t[role] = await tokenFor(app, `${role}@bungwise.example`);
});

afterAll(async () => {
  await ds.destroy();
});

describe('commits interrupted part-way leave nothing partial', () => {
  it('an approval whose review record fails leaves the pairing a draft, with no notice and no audit entry', async () => {
    const failer = new FailNextInsert(PairingReview);
    ds.subscribers.push(failer);
    const drafts = await request(app).get('/api/pairings?status=draft').set(bearer(t.engineer2));
    const draft = drafts.body.items.find((p: { authorName: string }) => p.authorName !== 'Mirela Sandoval');
    const before = {
      notices: await count('SELECT count(*) AS n FROM notifications'),
      audit: await count('SELECT count(*) AS n FROM audit_log'),
      outbox: await count('SELECT count(*) AS n FROM outbox'),
    };
    failer.armed = true;
    const res = await request(app).post(`/api/pairings/${draft.id}/approve`).set(bearer(t.engineer2)).send({ comment: 'ok' });
    expect(res.status).toBe(500);
    const after = await request(app).get(`/api/pairings/${draft.id}`).set(bearer(t.engineer2));
    expect(after.body).toMatchObject({ status: 'draft', approverId: null, version: draft.version });
    expect(after.body.reviews.filter((r: { decision: string }) => r.decision === 'approved')).toHaveLength(0);
    expect(await count('SELECT count(*) AS n FROM notifications')).toBe(before.notices);
    expect(await count('SELECT count(*) AS n FROM audit_log')).toBe(before.audit);
    expect(await count('SELECT count(*) AS n FROM outbox')).toBe(before.outbox);
  });

  it('a change-out whose record fails leaves every tube set where it was', async () => {
    const failer = new FailNextInsert(ChangeOut);
    ds.subscribers.push(failer);
    const stations = await request(app)
      .get(`/api/stations?q=${encodeURIComponent(demo.fittingStation)}`)
      .set(bearer(t.clerk));
    const id = stations.body.items[0].id;
    const before = (await request(app).get(`/api/stations/${id}/board`).set(bearer(t.clerk))).body.tubeSets.map((s: { id: string; state: string; version: number }) => [s.id, s.state, s.version]);
    failer.armed = true;
    const res = await request(app).post(`/api/stations/${id}/change-out`).set(bearer(t.clerk));
    expect(res.status).toBe(500);
    const after = (await request(app).get(`/api/stations/${id}/board`).set(bearer(t.clerk))).body.tubeSets.map((s: { id: string; state: string; version: number }) => [s.id, s.state, s.version]);
    expect(after).toEqual(before);
  });
});

describe('the database going away under the server', () => {
  it('signed-in requests answer 503 while it is down and 200 again when it is back, with no restart', async () => {
    const target = new URL(process.env.DATABASE_URL!);
    const proxy = new TcpProxy(target.hostname, Number(target.port));
    const port = await proxy.open();
    const viaProxy = new URL(target);
    viaProxy.port = String(port);
    const pds = makeDataSource(viaProxy.toString(), { poolSize: 2 });
    await pds.initialize();
    const papp = makeTestApp(pds);
    try {
      const token = await tokenFor(papp, 'clerk@bungwise.example');
      expect((await request(papp).get('/api/dip-tubes').set(bearer(token))).status).toBe(200);
      await proxy.cut();
      const down = await request(papp).get('/api/dip-tubes').set(bearer(token));
      expect(down.status).toBe(503);
      expect(down.body.error.code).toBe('unavailable');
      const write = await request(papp)
        .post('/api/fit-checks')
        .set(bearer(token))
        .send({ drum: { insideDepthMm: 851, openings: [{ threadCode: 'NPS-2' }] } });
      expect(write.status).toBe(503);
      await proxy.open(port);
      let status = 0;
      for (let i = 0; i < 20 && status !== 200; i++) {
        status = (await request(papp).get('/api/dip-tubes').set(bearer(token))).status;
        if (status !== 200) await new Promise((r) => setTimeout(r, 250));
      }
      expect(status).toBe(200);
    } finally {
      await proxy.cut();
      await pds.destroy().catch(() => undefined);
    }
  });
});

describe('npm run db:backup and db:restore', () => {
  it('round-trips the database through pg_dump and pg_restore', async () => {
    const source = new URL(process.env.DATABASE_URL!);
    const scratchName = `${source.pathname.slice(1)}_restore`;
    const admin = new URL(source);
    admin.pathname = '/postgres';
    const client = new Client({ connectionString: admin.toString() });
    await client.connect();
    await client.query(`DROP DATABASE IF EXISTS "${scratchName}" WITH (FORCE)`);
    await client.query(`CREATE DATABASE "${scratchName}"`);
    const scratch = new URL(source);
    scratch.pathname = `/${scratchName}`;
    const file = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'bungwise-backup-')), 'round-trip.dump');
    const root = path.resolve(__dirname, '..', '..');
    const tool = (args: string[], url: string) => spawnSync('node', ['scripts/db-tool.mjs', ...args], { cwd: root, env: { ...process.env, DATABASE_URL: url }, encoding: 'utf8' });
    try {
      const backup = tool(['backup', file], source.toString());
      expect(backup.stderr).toBe('');
      expect(backup.status).toBe(0);
      expect(fs.statSync(file).size).toBeGreaterThan(10_000);
      expect(tool(['restore', file], scratch.toString()).status).toBe(0);
      const copy = new Client({ connectionString: scratch.toString() });
      await copy.connect();
      const tubes = async (c: Client | DataSource) =>
        Number(((c instanceof Client ? (await c.query('SELECT count(*) AS n FROM dip_tubes')).rows : await c.query('SELECT count(*) AS n FROM dip_tubes')) as Array<{ n: string }>)[0].n);
      expect(await tubes(copy)).toBe(await tubes(ds));
      // Damage the copy, restore again over it: back to the backup.
      await copy.query('DELETE FROM pairing_reviews; DELETE FROM pairings; DELETE FROM tube_sets; DELETE FROM change_outs');
      expect(Number((await copy.query('SELECT count(*) AS n FROM pairings')).rows[0].n)).toBe(0);
      await copy.end();
      expect(tool(['restore', file], scratch.toString()).status).toBe(0);
      const again = new Client({ connectionString: scratch.toString() });
      await again.connect();
      expect(Number((await again.query('SELECT count(*) AS n FROM pairings')).rows[0].n)).toBe(await count('SELECT count(*) AS n FROM pairings'));
      await again.end();
      const missing = tool(['restore', '/nonexistent.dump'], scratch.toString());
      expect(missing.status).toBe(1);
      expect(missing.stderr).toMatch(/Name the backup file/);
    } finally {
      await client.query(`DROP DATABASE IF EXISTS "${scratchName}" WITH (FORCE)`);
      await client.end();
    }
  }, 60_000);
});

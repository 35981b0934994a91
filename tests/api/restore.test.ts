import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { Client } from 'pg';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { openTestDataSource, resetDatabase } from '../support/db';
import { ServerProcess } from '../support/server-process';

// `npm run db:restore` under a running server used to succeed and leave the server answering 500s (its
// prepared statements were planned against the tables and types the restore replaced). It refuses now,
// in one sentence, while any server process is connected; a backup is fine while serving.
const root = path.resolve(__dirname, '..', '..');
const source = new URL(process.env.DATABASE_URL!);
const scratch = new URL(source);
scratch.pathname = `/${source.pathname.slice(1)}_serving`;
const admin = new URL(source);
admin.pathname = '/postgres';
const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'bungwise-restore-'));
const tool = (...args: string[]) => spawnSync('node', ['scripts/db-tool.mjs', ...args], { cwd: root, env: { ...process.env, DATABASE_URL: scratch.toString() }, encoding: 'utf8' });
const REFUSED = /^\[bungwise\] Bungwise is serving this database \(\d+ connections? from [^)]+\): stop every server process using it, then restore again\. Nothing was restored\.\n$/;

let ds: DataSource;
let pg: Client;

beforeAll(async () => {
  ds = await openTestDataSource();
  await resetDatabase(ds);
  pg = new Client({ connectionString: admin.toString() });
  await pg.connect();
  await pg.query(`DROP DATABASE IF EXISTS "${scratch.pathname.slice(1)}" WITH (FORCE)`);
  await pg.query(`CREATE DATABASE "${scratch.pathname.slice(1)}"`);
  // The scratch database: a copy of the demo scenario, restored while nothing serves it.
  const seed = path.join(dir, 'seed.dump');
  expect(spawnSync('node', ['scripts/db-tool.mjs', 'backup', seed], { cwd: root, env: process.env, encoding: 'utf8' }).status).toBe(0);
  expect(tool('restore', seed).status).toBe(0);
});

afterAll(async () => {
  await pg.query(`DROP DATABASE IF EXISTS "${scratch.pathname.slice(1)}" WITH (FORCE)`);
  await pg.end();
  await ds.destroy();
  fs.rmSync(dir, { recursive: true, force: true });
});

const signIn = (base: string, email: string, password = 'bungwise-demo') => request(base).post('/api/auth/sign-in').send({ email, password });

describe('npm run db:restore against a running server', () => {
  it('backs up while serving, refuses to restore in one sentence and changes nothing, and restores once the server is stopped', async () => {
    const server = await new ServerProcess().start({ DATABASE_URL: scratch.toString() });
    const file = path.join(dir, 'serving.dump');
    let stopped = false;
    try {
      const token = (await signIn(server.base, 'admin@bungwise.example')).body.token as string;
      expect((await request(server.base).get('/api/me').set('Authorization', `Bearer ${token}`)).status).toBe(200);
      const backup = tool('backup', file);
      expect(backup.status).toBe(0);
      // A person added after the backup: a restore would remove them.
      const added = await request(server.base)
        .post('/api/users')
        .set('Authorization', `Bearer ${token}`)
        .send({ email: 'late.shift@bungwise.example', name: 'Tomas Reyna', role: 'clerk', temporaryPassword: 'amber-ladder-42' });
      expect(added.status).toBe(201);

      const refused = tool('restore', file);
      expect(refused.status).toBe(1);
      expect(refused.stderr).toMatch(REFUSED);
      // The server goes on answering, over the data it had.
      expect((await request(server.base).get('/api/me').set('Authorization', `Bearer ${token}`)).status).toBe(200);
      expect((await signIn(server.base, 'late.shift@bungwise.example', 'amber-ladder-42')).status).toBe(200);

      expect(await server.stop()).toBe(0);
      stopped = true;
      const restored = tool('restore', file);
      expect(restored.stderr).toBe('');
      expect(restored.status).toBe(0);
    } finally {
      if (!stopped) await server.stop();
    }

    // Started again over the restored database: it answers, without the person added after the backup.
    const again = await new ServerProcess().start({ DATABASE_URL: scratch.toString(), BUNGWISE_KEEP: '0' });
    try {
      const token = (await signIn(again.base, 'admin@bungwise.example')).body.token as string;
      expect((await request(again.base).get('/api/me').set('Authorization', `Bearer ${token}`)).status).toBe(200);
      expect((await signIn(again.base, 'late.shift@bungwise.example', 'amber-ladder-42')).status).toBe(401);
      // Idle past the pools' 10 s idle timeout, and keeping nothing (BUNGWISE_KEEP=0): still seen as serving.
      await new Promise((r) => setTimeout(r, 11_000));
      expect(tool('restore', file).stderr).toMatch(REFUSED);
    } finally {
      expect(await again.stop()).toBe(0);
    }
  }, 120_000);
});

// What a server process keeps in memory (fit answers, signed-in users) must never outlive a change to the
// tables it came from: changes through this process, changes by another process (plain SQL here), and
// changes made while the process could not hear the database's notices.
import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { CHANGE_CHANNELS } from '../../migrations/1764637200000-change-notify';
import { STATION_TABLES } from '../../migrations/1764846000000-station-change-notify';
import { ChangeFeed } from '../../server/db/change-feed';
import { FitCheckService } from '../../server/fit/fit-check.service';
import { DEMO_REGISTRY_SUMMARY as demo } from '../../seeds/demo-registry';
import { bearer, makeTestApp, tokenFor } from '../support/app';
import { openTestDataSource, resetDatabase } from '../support/db';

let ds: DataSource;
let feed: ChangeFeed;
let app: Express; // keeps answers
let plain: Express; // computes every answer: the reference
let clerk: string;
let engineer: string;
let drumId: string;

type Answer = { verdict: string; candidates: Array<{ dipTubeId: string; dipTubePartNumber: string; pairingId: string | null }> };
const ask = (on: Express, body: object = { drumTypeId: drumId }) => request(on).post('/api/fit-checks').set(bearer(clerk)).send(body);

async function until<T>(what: string, probe: () => Promise<T>, done: (v: T) => boolean, ms = 5000): Promise<T> {
  const end = Date.now() + ms;
  for (;;) {
    const v = await probe();
    if (done(v)) return v;
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

const cleanups: Array<() => Promise<unknown>> = [];
const onCleanup = (fn: () => Promise<unknown>) => cleanups.push(fn);
afterEach(async () => {
  while (cleanups.length) await cleanups.pop()!();
});

/** Asks twice so the answer is kept, and returns it. */
async function warm(): Promise<Answer> {
  await until(
    'the shared feed to listen',
    async () => feed.isListening,
    (v) => v,
  );
  await ask(app);
  const res = await ask(app);
  expect(res.headers['cache-status']).toBe('bungwise; hit');
  return res.body;
}

beforeAll(async () => {
  ds = await openTestDataSource();
  await resetDatabase(ds);
  feed = new ChangeFeed(process.env.DATABASE_URL!, 1000);
  app = makeTestApp(ds, { changes: feed });
  plain = makeTestApp(ds);
  await feed.start();
  expect(feed.isListening).toBe(true);
  clerk = await tokenFor(app, 'clerk@bungwise.example');
  engineer = await tokenFor(app, 'engineer@bungwise.example');
  [{ id: drumId }] = await ds.query(`SELECT id FROM drum_types WHERE part_number = $1`, [demo.fittingDrum]);
});

afterAll(async () => {
  await feed.stop();
  await ds.destroy();
});

describe('kept fit answers', () => {
  it('keeps an answer about a drum type and serves the same answer again', async () => {
    const first = await ask(app, { drumTypeId: drumId, slurryId: undefined });
    expect(first.status).toBe(200);
    expect(first.headers['cache-status']).toMatch(/^bungwise; fwd=miss(; stored)?$/);
    const second = await ask(app);
    expect(second.headers['cache-status']).toBe('bungwise; hit');
    expect(second.body).toEqual(first.body);
    expect(second.body).toEqual((await ask(plain)).body);
  });

  it('keeps an answer naming a registered station, and drops it when another process changes the station', async () => {
    await until(
      'the shared feed to listen',
      async () => feed.isListening,
      (v) => v,
    );
    const [{ id: stationId, tapping }] = await ds.query(`SELECT id, tapping FROM stations WHERE name = $1`, [demo.fittingStation]);
    const atStation = { drumTypeId: drumId, stationId };
    const first = await ask(app, atStation);
    const second = await ask(app, atStation);
    expect([first.status, second.status]).toEqual([200, 200]);
    expect(second.headers['cache-status']).toBe('bungwise; hit');
    expect(second.body).toEqual(first.body);
    expect(second.body.station.tapping).toBe(tapping);
    // Plain SQL, as another process would: only the database's notice can tell this process.
    const other = tapping === 'two-opening' ? 'one-opening' : 'two-opening';
    await ds.query(`UPDATE stations SET tapping = $2, version = version + 1 WHERE id = $1`, [stationId, other]);
    onCleanup(() => ds.query(`UPDATE stations SET tapping = $2, version = version + 1 WHERE id = $1`, [stationId, tapping]));
    const after = await until(
      'the stations notice',
      () => ask(app, atStation),
      (r) => r.headers['cache-status'] !== 'bungwise; hit',
    );
    expect(after.body.station.tapping).toBe(other);
    expect(after.body).toEqual((await ask(plain, atStation)).body);
  });

  it("drops a kept answer naming a station when another process changes the station's tube sets", async () => {
    await until(
      'the shared feed to listen',
      async () => feed.isListening,
      (v) => v,
    );
    // A station with a ready set: the set an answer names (the next one into a drum).
    const [{ id: setId, station_id: stationId, state }] = await ds.query(`SELECT id, station_id, state FROM tube_sets ORDER BY label LIMIT 1`);
    await ds.query(`UPDATE tube_sets SET state = 'ready' WHERE id = $1`, [setId]);
    onCleanup(() => ds.query(`UPDATE tube_sets SET state = $2 WHERE id = $1`, [setId, state]));
    const atStation = { drumTypeId: drumId, stationId };
    await ask(app, atStation);
    const kept = await ask(app, atStation);
    expect(kept.headers['cache-status']).toBe('bungwise; hit');
    const set = kept.body.tubeSet as { id: string; lastUsedAt: string | null };
    expect(set).not.toBeNull();
    // Used after its last rinse: the rinse rule now refuses it.
    const [{ last_used_at: usedBefore }] = await ds.query(`SELECT last_used_at FROM tube_sets WHERE id = $1`, [set.id]);
    await ds.query(`UPDATE tube_sets SET last_used_at = coalesce(last_rinsed_at, now()) + interval '1 hour', version = version + 1 WHERE id = $1`, [set.id]);
    onCleanup(() => ds.query(`UPDATE tube_sets SET last_used_at = $2, version = version + 1 WHERE id = $1`, [set.id, usedBefore]));
    const after = await until(
      'the tube_sets notice',
      () => ask(app, atStation),
      (r) => r.headers['cache-status'] !== 'bungwise; hit',
    );
    expect(after.body.tubeSet.lastUsedAt).not.toBe(set.lastUsedAt);
    expect(after.body).toEqual((await ask(plain, atStation)).body);
  });

  it("keeps a sourcing plan's answers at each station: a second plan over the same stations computes none, and a station change is seen", async () => {
    await until(
      'the shared feed to listen',
      async () => feed.isListening,
      (v) => v,
    );
    const buyer = await tokenFor(app, 'buyer@bungwise.example');
    const [{ id: supplierId }] = await ds.query(`SELECT id FROM suppliers ORDER BY name LIMIT 1`);
    const stations: Array<{ id: string; tapping: string }> = await ds.query(`SELECT id, tapping FROM stations ORDER BY name LIMIT 2`);
    const plan = () =>
      request(app)
        .post('/api/sourcing-plans')
        .set(bearer(buyer))
        .send({ slurryName: 'Kept answers test', supplierId, drumTypeId: drumId, startDate: '2027-03-01', drumsPerMonth: 4, stationIds: stations.map((s) => s.id) });
    // The fit service's computation, counted: a kept answer does not reach it.
    const computed = jest.spyOn(FitCheckService.prototype as unknown as { run: () => Promise<unknown> }, 'run');
    onCleanup(async () => computed.mockRestore());
    const first = await plan();
    expect(first.status).toBe(201);
    const firstRuns = computed.mock.calls.length;
    expect(firstRuns).toBeGreaterThanOrEqual(stations.length);
    const second = await plan();
    expect(second.status).toBe(201);
    expect(computed.mock.calls.length).toBe(firstRuns);
    expect(second.body.impact.stations).toEqual(first.body.impact.stations);
    // Another process changes a station: the next plan computes that station's answer again.
    const other = stations[0].tapping === 'two-opening' ? 'one-opening' : 'two-opening';
    await ds.query(`UPDATE stations SET tapping = $2, version = version + 1 WHERE id = $1`, [stations[0].id, other]);
    onCleanup(() => ds.query(`UPDATE stations SET tapping = $2, version = version + 1 WHERE id = $1`, [stations[0].id, stations[0].tapping]));
    await until(
      'the stations notice',
      async () => {
        const before = computed.mock.calls.length;
        expect((await plan()).status).toBe(201);
        return computed.mock.calls.length - before;
      },
      (ran) => ran > 0,
    );
  });

  it('does not keep bad questions', async () => {
    for (let i = 0; i < 2; i++) {
      const res = await ask(app, { drumTypeId: '00000000-0000-4000-8000-000000000000' });
      expect(res.status).toBe(400);
      expect(res.body.error.details[0].field).toBe('drumTypeId');
      expect(res.headers['cache-status']).toBeUndefined();
    }
  });

  it('drops kept answers as soon as this process accepts a registry change, without waiting for the notice', async () => {
    const before = await warm();
    await ds.query(`ALTER TABLE dip_tubes DISABLE TRIGGER dip_tubes_notify`); // no notice: only this process's own hook can drop them
    onCleanup(() => ds.query(`ALTER TABLE dip_tubes ENABLE TRIGGER dip_tubes_notify`));
    const best = before.candidates[0];
    const [{ version }] = await ds.query(`SELECT version FROM dip_tubes WHERE id = $1`, [best.dipTubeId]);
    // A tube far too short for this drum: it can no longer be the best candidate.
    const changed = await request(app).patch(`/api/dip-tubes/${best.dipTubeId}`).set(bearer(engineer)).send({ version, lengthMm: 300 });
    expect(changed.status).toBe(200);
    const after = await ask(app);
    expect(after.headers['cache-status']).not.toBe('bungwise; hit');
    expect(after.body).toEqual((await ask(plain)).body);
    expect(after.body.candidates[0]?.dipTubeId).not.toBe(best.dipTubeId);
  });

  it('drops kept answers when another process changes the registry, once the database announces it', async () => {
    const before = await warm();
    const best = before.candidates[0];
    expect(best.pairingId).not.toBeNull();
    await ds.query(`UPDATE pairings SET status = 'retired' WHERE id = $1`, [best.pairingId]);
    const after = await until(
      'the change notice',
      () => ask(app),
      (r) => r.headers['cache-status'] !== 'bungwise; hit',
    );
    expect(after.body).toEqual((await ask(plain)).body);
    expect(after.body.candidates.map((c: { pairingId: string }) => c.pairingId)).not.toContain(best.pairingId);
  });

  it('keeps nothing while it cannot hear the notices, and sees changes made meanwhile', async () => {
    // A feed of its own that waits ten minutes before reconnecting, so the test decides when it is back.
    const slow = new ChangeFeed(process.env.DATABASE_URL!, 600_000);
    const slowApp = makeTestApp(ds, { changes: slow });
    await slow.start();
    onCleanup(() => slow.stop());
    await ask(slowApp);
    expect((await ask(slowApp)).headers['cache-status']).toBe('bungwise; hit');
    // Ends every listening connection, this suite's shared feed too (it reconnects within a second).
    await ds.query(`SELECT pg_terminate_backend(pid) FROM pg_stat_activity WHERE datname = current_database() AND query LIKE 'LISTEN bungwise_%'`);
    await until(
      'the listener to drop',
      async () => slow.isListening,
      (v) => !v,
    );
    const [{ id: tubeId, version }] = await ds.query(`SELECT t.id, t.version FROM dip_tubes t JOIN pairings p ON p.dip_tube_id = t.id WHERE p.status = 'approved' ORDER BY t.part_number LIMIT 1`);
    await ds.query(`UPDATE dip_tubes SET length_mm = 310, version = version + 1 WHERE id = $1 AND version = $2`, [tubeId, version]);
    for (let i = 0; i < 2; i++) {
      const down = await ask(slowApp);
      expect(down.headers['cache-status']).toBe('bungwise; fwd=bypass');
      expect(down.body).toEqual((await ask(plain)).body);
    }
    await slow.start();
    expect(slow.isListening).toBe(true);
    expect((await ask(slowApp)).headers['cache-status']).toBe('bungwise; fwd=miss; stored');
    expect((await ask(slowApp)).headers['cache-status']).toBe('bungwise; hit');
  });

  it.each([...CHANGE_CHANNELS.bungwise_registry, ...STATION_TABLES])('drops kept answers on any statement on %s', async (table) => {
    await until(
      'the shared feed to listen',
      async () => feed.isListening,
      (v) => v,
    );
    await warm();
    // A statement-level trigger fires even when no row matches: this checks the trigger, not the data.
    await ds.query(`UPDATE ${table} SET id = id WHERE false`);
    await until(
      `the notice from ${table}`,
      () => ask(app),
      (r) => r.headers['cache-status'] !== 'bungwise; hit',
    );
  });
});

describe('kept users', () => {
  it('refuses a token at once when the user is deactivated by another process', async () => {
    const token = await tokenFor(plain, 'buyer@bungwise.example');
    expect((await request(app).get('/api/notifications').set(bearer(token))).status).toBe(200);
    await ds.query(`UPDATE users SET active = false WHERE email = 'buyer@bungwise.example'`);
    try {
      const refused = await until(
        'the users notice',
        () => request(app).get('/api/notifications').set(bearer(token)),
        (r) => r.status !== 200,
      );
      expect(refused.status).toBe(401);
    } finally {
      await ds.query(`UPDATE users SET active = true WHERE email = 'buyer@bungwise.example'`);
    }
    await until(
      'the user to be allowed again',
      () => request(app).get('/api/notifications').set(bearer(token)),
      (r) => r.status === 200,
    );
  });

  it('takes a deactivation through this process at once, without waiting for the notice', async () => {
    await ds.query(`ALTER TABLE users DISABLE TRIGGER users_notify`);
    onCleanup(() => ds.query(`ALTER TABLE users ENABLE TRIGGER users_notify`));
    const admin = await tokenFor(app, 'admin@bungwise.example');
    const token = await tokenFor(plain, 'buyer@bungwise.example');
    expect((await request(app).get('/api/notifications').set(bearer(token))).status).toBe(200);
    const [{ id }] = await ds.query(`SELECT id FROM users WHERE email = 'buyer@bungwise.example'`);
    const off = await request(app).patch(`/api/users/${id}`).set(bearer(admin)).send({ active: false });
    expect(off.status).toBe(200);
    expect((await request(app).get('/api/notifications').set(bearer(token))).status).toBe(401);
    await ds.query(`UPDATE users SET active = true WHERE id = $1`, [id]);
  });
});

describe('a kept value read before a change', () => {
  it('is not kept when a change was announced while it was read', () => {
    const kept = feed.keep<{ n: number }>('bungwise_registry', { maxSize: 10, sizeOf: () => 1 });
    const ticket = kept.ticket();
    expect(ticket).not.toBeNull();
    kept.invalidate(); // a notice arrives while the value is being read
    expect(kept.set('k', ticket, { n: 1 })).toBe(false);
    expect(kept.get('k')).toBeUndefined();
    const fresh = kept.ticket();
    expect(kept.set('k', fresh, { n: 2 })).toBe(true);
    expect(kept.get('k')).toEqual({ n: 2 });
  });
});

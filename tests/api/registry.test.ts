import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { bearer, makeTestApp, tokenFor } from '../support/app';
import { openTestDataSource, resetDatabase } from '../support/db';

let ds: DataSource;
let app: Express;
let engineer: string;
let engineer2: string;
let clerk: string;
let supplierId: string;

beforeAll(async () => {
  ds = await openTestDataSource();
  await resetDatabase(ds);
  app = makeTestApp(ds);
  engineer = await tokenFor(app, 'engineer@bungwise.example');
  engineer2 = await tokenFor(app, 'engineer2@bungwise.example');
  clerk = await tokenFor(app, 'clerk@bungwise.example');
  const suppliers = await request(app).get('/api/suppliers?region=NA').set(bearer(clerk));
  supplierId = suppliers.body.items[0].id;
});

afterAll(async () => {
  await ds.destroy();
});

const RESOURCES = ['suppliers', 'thread-specs', 'key-codes', 'drum-types', 'dip-tubes', 'connectors', 'pairings', 'slurries', 'stations', 'tube-sets'];

describe('registry lists', () => {
  it.each(RESOURCES)('%s: every signed-in role reads a page in the list shape', async (resource) => {
    const res = await request(app).get(`/api/${resource}?pageSize=5`).set(bearer(clerk));
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ items: expect.any(Array), total: expect.any(Number), page: 1, pageSize: 5 });
    expect(res.body.items.length).toBeLessThanOrEqual(5);
    expect(res.body.total).toBeGreaterThan(0);
    expect(res.body.items[0]).toHaveProperty('version');
  });

  it('pages in SQL: two pages hold different records and the total counts them all', async () => {
    const first = await request(app).get('/api/dip-tubes?pageSize=3&page=1&sort=partNumber').set(bearer(clerk));
    const second = await request(app).get('/api/dip-tubes?pageSize=3&page=2&sort=partNumber').set(bearer(clerk));
    expect(first.body.total).toBeGreaterThanOrEqual(6);
    const ids = new Set([...first.body.items, ...second.body.items].map((t: { id: string }) => t.id));
    expect(ids.size).toBe(6);
    const parts = first.body.items.map((t: { partNumber: string }) => t.partNumber);
    expect([...parts].sort()).toEqual(parts);
  });

  it('searches with q, case-insensitively, and filters by thread, region and status', async () => {
    const all = await request(app).get('/api/dip-tubes?pageSize=100').set(bearer(clerk));
    const sample = all.body.items[0];
    const byQ = await request(app)
      .get(`/api/dip-tubes?q=${encodeURIComponent(sample.partNumber.toLowerCase())}`)
      .set(bearer(clerk));
    expect(byQ.body.items.map((t: { id: string }) => t.id)).toContain(sample.id);
    const byThread = await request(app)
      .get(`/api/dip-tubes?thread=${encodeURIComponent(sample.threadCode)}&pageSize=100`)
      .set(bearer(clerk));
    expect(byThread.body.items.length).toBeGreaterThan(0);
    expect(byThread.body.items.every((t: { threadCode: string }) => t.threadCode === sample.threadCode)).toBe(true);
    const eu = await request(app).get('/api/drum-types?region=EU').set(bearer(clerk));
    expect(eu.body.items.length).toBeGreaterThan(0);
    expect(eu.body.items.every((d: { region: string }) => d.region === 'EU')).toBe(true);
    const approved = await request(app).get('/api/pairings?status=approved&pageSize=100').set(bearer(clerk));
    expect(approved.body.items.every((p: { status: string }) => p.status === 'approved')).toBe(true);
    const drafts = await request(app).get('/api/pairings?status=draft&pageSize=100').set(bearer(clerk));
    expect(approved.body.total + drafts.body.total).toBeLessThan((await request(app).get('/api/pairings').set(bearer(clerk))).body.total + 1);
  });

  it('answers 400 naming the field for a bad sort, order or page size', async () => {
    const sort = await request(app).get('/api/dip-tubes?sort=password').set(bearer(clerk));
    expect(sort.status).toBe(400);
    expect(sort.body.error.details[0].field).toBe('sort');
    const order = await request(app).get('/api/dip-tubes?order=sideways').set(bearer(clerk));
    expect(order.body.error.details[0].field).toBe('order');
    const size = await request(app).get('/api/dip-tubes?pageSize=5000').set(bearer(clerk));
    expect(size.body.error.details[0].field).toBe('pageSize');
  });
});

describe('registry writes', () => {
  const tube = () => ({
    partNumber: `DT-TEST-${Math.random().toString(36).slice(2, 8)}`,
    supplierId,
    threadCode: 'NPS-2',
    lengthMm: 836,
    boreMm: 19,
    odMm: 25.4,
    material: 'PFA',
    keyCode: null,
    channels: 'feed',
  });

  it('a clerk cannot write: 403', async () => {
    const res = await request(app).post('/api/dip-tubes').set(bearer(clerk)).send(tube());
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
  });

  it('an engineer creates, reads, updates and deletes a dip tube', async () => {
    const created = await request(app).post('/api/dip-tubes').set(bearer(engineer)).send(tube());
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ threadCode: 'NPS-2', lengthMm: 836, version: 1 });
    const id = created.body.id;
    const read = await request(app).get(`/api/dip-tubes/${id}`).set(bearer(clerk));
    expect(read.status).toBe(200);
    // The detail lists the drum types with an opening of this thread.
    expect(read.body.fitsDrumTypes.length).toBeGreaterThan(0);
    const updated = await request(app).patch(`/api/dip-tubes/${id}`).set(bearer(engineer)).send({ version: 1, lengthMm: 840 });
    expect(updated.status).toBe(200);
    expect(updated.body).toMatchObject({ lengthMm: 840, version: 2 });
    const deleted = await request(app).delete(`/api/dip-tubes/${id}?version=2`).set(bearer(engineer));
    expect(deleted.status).toBe(204);
    expect((await request(app).get(`/api/dip-tubes/${id}`).set(bearer(clerk))).status).toBe(404);
  });

  it('two saves from the same version: the second gets 409 with the current record', async () => {
    const created = await request(app).post('/api/dip-tubes').set(bearer(engineer)).send(tube());
    const id = created.body.id;
    const a = await request(app).patch(`/api/dip-tubes/${id}`).set(bearer(engineer)).send({ version: 1, lengthMm: 830 });
    const b = await request(app).patch(`/api/dip-tubes/${id}`).set(bearer(engineer2)).send({ version: 1, lengthMm: 845 });
    expect(a.status).toBe(200);
    expect(b.status).toBe(409);
    expect(b.body.error.details.current).toMatchObject({ id, lengthMm: 830, version: 2 });
    const missingVersion = await request(app).patch(`/api/dip-tubes/${id}`).set(bearer(engineer)).send({ lengthMm: 845 });
    expect(missingVersion.status).toBe(400);
    expect(missingVersion.body.error.details[0].field).toBe('version');
  });

  it('refuses an unknown thread code, suggesting the nearest known codes', async () => {
    const res = await request(app)
      .post('/api/dip-tubes')
      .set(bearer(engineer))
      .send({ ...tube(), threadCode: 'NPS-2.5' });
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].field).toBe('threadCode');
    expect(res.body.error.details[0].messages[0]).toMatch(/nearest: .*NPS-2/);
  });

  it('refuses a negative depth, a depth below the height, a bore wider than the tube and an unknown region, naming each field', async () => {
    const drum = {
      supplierId,
      region: 'NA',
      name: 'Test drum',
      partNumber: 'TD-1',
      nominalCapacityL: 208,
      material: 'steel',
      head: 'tight',
      unPackagingCode: '1A1',
      outsideHeightMm: 880,
      insideDepthMm: -5,
      outsideDiameterMm: 585,
      openings: [{ label: 'large bung', threadCode: 'NPS-2', boreMm: 50, keyCode: null, position: 'large' }],
    };
    const negative = await request(app).post('/api/drum-types').set(bearer(engineer)).send(drum);
    expect(negative.status).toBe(400);
    expect(negative.body.error.details.map((d: { field: string }) => d.field)).toEqual(['insideDepthMm']);
    const deeper = await request(app)
      .post('/api/drum-types')
      .set(bearer(engineer))
      .send({ ...drum, insideDepthMm: 900 });
    expect(deeper.status).toBe(400);
    expect(deeper.body.error.details[0].field).toBe('insideDepthMm');
    const badOpening = await request(app)
      .post('/api/drum-types')
      .set(bearer(engineer))
      .send({ ...drum, insideDepthMm: 851, openings: [{ label: 'x', threadCode: 'G-9', boreMm: 50, position: 'large' }] });
    expect(badOpening.status).toBe(400);
    expect(badOpening.body.error.details[0].field).toBe('openings.0.threadCode');
    const region = await request(app)
      .post('/api/drum-types')
      .set(bearer(engineer))
      .send({ ...drum, insideDepthMm: 851, region: 'Mars' });
    expect(region.body.error.details[0].field).toBe('region');
    const bore = await request(app)
      .post('/api/dip-tubes')
      .set(bearer(engineer))
      .send({ ...tube(), boreMm: 30 });
    expect(bore.status).toBe(400);
    expect(bore.body.error.details[0].field).toBe('boreMm');
    // Nothing was written by any of these.
    const list = await request(app).get('/api/drum-types?q=Test%20drum').set(bearer(clerk));
    expect(list.body.total).toBe(0);
  });

  it("refuses what breaks a record's rule across fields (shared/records), naming the field in the record's words, and writes nothing", async () => {
    const list = async (resource: string) => (await request(app).get(`/api/${resource}?pageSize=100`).set(bearer(clerk))).body.items;
    const drumTypeId = (await list('drum-types'))[0].id;
    const slurry = { name: 'Rule slurry', supplierId, region: 'NA', drumTypeId, foams: false, shearSensitive: false, solidsWtPct: 12 };
    const heads: Array<{ id: string; version: number; returnPath: string }> = await list('connectors');
    const open = heads.find((c) => c.returnPath !== 'none')!;
    const none = heads.find((c) => c.returnPath === 'none')!;
    const pairing = (await list('pairings'))[0];
    const set = (await list('tube-sets')).find((t: { state: string }) => t.state !== 'cleaning');
    const settings = (await request(app).get('/api/settings').set(bearer(clerk))).body;
    // [method, path, body, the field named, what it says]; an edit is judged with the stored values.
    const cases: Array<['post' | 'patch', string, object, string, string]> = [
      ['post', '/api/slurries', { ...slurry, shelfLifeDays: 30, minRemainingDays: 31 }, 'minRemainingDays', 'must be at most the shelf life'],
      ['post', '/api/slurries', { ...slurry, storageMinC: 5, storageMaxC: 5 }, 'storageMaxC', 'must be above the lowest storage temperature'],
      ['post', '/api/slurries', { ...slurry, viscosityModel: 'newtonian' }, 'viscosityMPaS', 'is required for a Newtonian viscosity'],
      ['post', '/api/slurries', { ...slurry, viscosityModel: 'power-law', consistencyPaSn: 0.05 }, 'flowIndex', 'is required for a power-law viscosity'],
      ['post', '/api/slurries', { ...slurry, minVelocityMs: 1.5, maxVelocityMs: 1.5 }, 'maxVelocityMs', 'must be above the lowest line velocity'],
      ['post', '/api/slurries', { ...slurry, phMin: 9, phMax: 4 }, 'phMax', 'must be at least the lowest pH'],
      ['post', '/api/slurries', { ...slurry, densityKgM3: 12000 }, 'densityKgM3', 'must be at most 5000 kg/m³'],
      ['post', '/api/slurries', { ...slurry, flowIndex: 0 }, 'flowIndex', 'must be more than 0'],
      ['post', '/api/slurries', { ...slurry, oxidiser: 'bleach' }, 'oxidiser', 'must be one of none, mild, strong'],
      ['patch', `/api/connectors/${open.id}`, { version: open.version, returnPath: 'none' }, 'returnBoreMm', 'must be empty when the head has no return path'],
      ['patch', `/api/connectors/${none.id}`, { version: none.version, returnPath: 'open' }, 'returnBoreMm', 'is required when the head has a return path'],
      ['patch', `/api/pairings/${pairing.id}`, { version: pairing.version, connectorId: open.id }, 'connectorId', 'cannot change; retire this pairing and create a new one'],
      ['patch', `/api/tube-sets/${set.id}`, { version: set.version, state: 'cleaning' }, 'state', 'changes through the rotation: rinse, standby and change-out'],
      ['patch', '/api/settings', { version: settings.version, tipClearanceMinMm: 20, tipClearanceMaxMm: 20 }, 'tipClearanceMaxMm', 'must be more than the minimum clearance'],
      ['patch', '/api/settings', { version: settings.version, timeZone: 'Mars/Olympus' }, 'timeZone', 'must be a time zone name, like Europe/Berlin or America/Phoenix'],
    ];
    for (const [method, path, body, field, says] of cases) {
      const res = await request(app)[method](path).set(bearer(engineer)).send(body);
      expect({ path, status: res.status, details: res.body.error?.details }).toEqual({ path, status: 400, details: [{ field, messages: [says] }] });
    }
    // Nothing was written: no slurry, and the versions are the ones read.
    expect((await request(app).get('/api/slurries?q=Rule%20slurry').set(bearer(clerk))).body.total).toBe(0);
    expect((await request(app).get(`/api/connectors/${open.id}`).set(bearer(clerk))).body).toMatchObject({ version: open.version, returnPath: open.returnPath });
    expect((await request(app).get(`/api/tube-sets/${set.id}`).set(bearer(clerk))).body).toMatchObject({ version: set.version, state: set.state });
    expect((await request(app).get('/api/settings').set(bearer(clerk))).body.version).toBe(settings.version);
  });

  it("stores a slurry's own properties, a drum's inside diameter and a station's transfer line, and clears them with null", async () => {
    const list = async (resource: string) => (await request(app).get(`/api/${resource}?pageSize=100`).set(bearer(clerk))).body.items;
    const drum = (await list('drum-types'))[0];
    const props = {
      densityKgM3: 1180,
      viscosityModel: 'power-law',
      consistencyPaSn: 0.04,
      flowIndex: 0.7,
      particleSizeNm: 140,
      minVelocityMs: 0.6,
      maxVelocityMs: 2.4,
      maxWallShearPerS: 8000,
      minTurnovers: 3,
      minRecircMinutes: 20,
      phMin: 9.5,
      phMax: 11,
      oxidiser: 'none',
      solventWtPct: 0,
    };
    const body = { name: 'Property slurry', supplierId, region: 'NA', drumTypeId: drum.id, foams: false, shearSensitive: true, solidsWtPct: 12, ...props };
    const made = await request(app).post('/api/slurries').set(bearer(engineer)).send(body);
    expect(made.status).toBe(201);
    expect((await request(app).get(`/api/slurries/${made.body.id}`).set(bearer(clerk))).body).toMatchObject({ ...props, viscosityMPaS: null });
    const cleared = await request(app)
      .patch(`/api/slurries/${made.body.id}`)
      .set(bearer(engineer))
      .send({ version: made.body.version, viscosityModel: null, consistencyPaSn: null, flowIndex: null, phMin: null });
    expect(cleared.status).toBe(200);
    expect(cleared.body).toMatchObject({ viscosityModel: null, consistencyPaSn: null, flowIndex: null, phMin: null, phMax: 11, densityKgM3: 1180 });

    const inside = drum.outsideDiameterMm - 10;
    const widened = await request(app).patch(`/api/drum-types/${drum.id}`).set(bearer(engineer)).send({ version: drum.version, insideDiameterMm: inside });
    expect({ status: widened.status, insideDiameterMm: widened.body.insideDiameterMm }).toEqual({ status: 200, insideDiameterMm: inside });
    const tooWide = await request(app).patch(`/api/drum-types/${drum.id}`).set(bearer(engineer)).send({ version: widened.body.version, insideDiameterMm: drum.outsideDiameterMm });
    expect({ status: tooWide.status, details: tooWide.body.error?.details }).toEqual({ status: 400, details: [{ field: 'insideDiameterMm', messages: ['must be less than the outside diameter'] }] });

    const station = (await list('stations'))[0];
    const line = await request(app).patch(`/api/stations/${station.id}`).set(bearer(engineer)).send({ version: station.version, lineLengthM: 45, lineBoreMm: 22.1, lineRoughnessUm: 1.5 });
    expect(line.body).toMatchObject({ lineLengthM: 45, lineBoreMm: 22.1, lineRoughnessUm: 1.5 });
    const noLine = await request(app).patch(`/api/stations/${station.id}`).set(bearer(engineer)).send({ version: line.body.version, lineLengthM: 0 });
    expect({ status: noLine.status, details: noLine.body.error?.details }).toEqual({ status: 400, details: [{ field: 'lineLengthM', messages: ['must be more than 0 m'] }] });
  });

  it('creates a drum type with its openings in one transaction and replaces them on update', async () => {
    const created = await request(app)
      .post('/api/drum-types')
      .set(bearer(engineer))
      .send({
        supplierId,
        region: 'NA',
        name: 'Twin bung test drum',
        partNumber: 'TD-2',
        nominalCapacityL: 208,
        material: 'plastic',
        head: 'tight',
        unPackagingCode: '1H1',
        outsideHeightMm: 900,
        insideDepthMm: 860,
        outsideDiameterMm: 580,
        openings: [
          { label: 'large bung', threadCode: 'NPS-2', boreMm: 50, keyCode: null, position: 'large' },
          { label: 'small bung', threadCode: 'NPS-3/4', boreMm: 19, keyCode: null, position: 'small' },
        ],
      });
    expect(created.status).toBe(201);
    expect(created.body.openings.map((o: { threadCode: string }) => o.threadCode)).toEqual(['NPS-2', 'NPS-3/4']);
    const dupLabel = await request(app)
      .patch(`/api/drum-types/${created.body.id}`)
      .set(bearer(engineer))
      .send({
        version: 1,
        openings: [
          { label: 'a', threadCode: 'NPS-2', boreMm: 50, position: 'large' },
          { label: 'a', threadCode: 'NPS-2', boreMm: 50, position: 'small' },
        ],
      });
    expect(dupLabel.status).toBe(400);
    expect(dupLabel.body.error.details[0].field).toBe('openings.1.label');
    const after = await request(app).get(`/api/drum-types/${created.body.id}`).set(bearer(clerk));
    expect(after.body.openings).toHaveLength(2);
    expect(after.body.version).toBe(1);
    const replaced = await request(app)
      .patch(`/api/drum-types/${created.body.id}`)
      .set(bearer(engineer))
      .send({ version: 1, openings: [{ label: 'only bung', threadCode: 'G-2', boreMm: 50, position: 'center' }] });
    expect(replaced.status).toBe(200);
    expect(replaced.body.openings).toEqual([expect.objectContaining({ label: 'only bung', threadCode: 'G-2' })]);
    expect(replaced.body.version).toBe(2);
  });

  it('answers 409 when deleting a record others refer to', async () => {
    const res = await request(app).delete(`/api/suppliers/${supplierId}?version=1`).set(bearer(engineer));
    expect(res.status).toBe(409);
  });
});

describe('pairings and their approval', () => {
  it('a pairing starts as a draft by its author; the author cannot approve it; another engineer can', async () => {
    const tubes = await request(app).get('/api/dip-tubes?pageSize=100').set(bearer(engineer));
    const heads = await request(app).get('/api/connectors?pageSize=100').set(bearer(engineer));
    const existing = await request(app).get('/api/pairings?pageSize=200').set(bearer(engineer));
    const taken = new Set(existing.body.items.map((p: { dipTubeId: string; connectorId: string }) => `${p.dipTubeId}/${p.connectorId}`));
    let pair: { dipTubeId: string; connectorId: string } | null = null;
    for (const t of tubes.body.items) for (const c of heads.body.items) if (!pair && !taken.has(`${t.id}/${c.id}`)) pair = { dipTubeId: t.id, connectorId: c.id };
    expect(pair).not.toBeNull();

    const created = await request(app)
      .post('/api/pairings')
      .set(bearer(engineer))
      .send({ ...pair, notes: 'Trial on bay 2', status: 'approved' });
    // A client cannot set the status directly.
    expect(created.status).toBe(400);
    expect(created.body.error.details[0].field).toBe('status');
    const draft = await request(app)
      .post('/api/pairings')
      .set(bearer(engineer))
      .send({ ...pair, notes: 'Trial on bay 2' });
    expect(draft.status).toBe(201);
    expect(draft.body).toMatchObject({ status: 'draft', authorName: 'Tomasz Ilunga', approverId: null });

    const self = await request(app).post(`/api/pairings/${draft.body.id}/approve`).set(bearer(engineer)).send({});
    expect(self.status).toBe(403);
    const byClerk = await request(app).post(`/api/pairings/${draft.body.id}/approve`).set(bearer(clerk)).send({});
    expect(byClerk.status).toBe(403);
    const rejected = await request(app).post(`/api/pairings/${draft.body.id}/reject`).set(bearer(engineer2)).send({ comment: 'Check the tip gap first.' });
    expect(rejected.status).toBe(200);
    expect(rejected.body.status).toBe('draft');
    const approved = await request(app).post(`/api/pairings/${draft.body.id}/approve`).set(bearer(engineer2)).send({ comment: 'Tip gap measured at 14 mm.' });
    expect(approved.status).toBe(200);
    expect(approved.body).toMatchObject({ status: 'approved', approverName: 'Mirela Sandoval' });
    expect(approved.body.reviews.map((r: { decision: string }) => r.decision)).toEqual(['rejected', 'approved']);
    const twice = await request(app).post(`/api/pairings/${draft.body.id}/approve`).set(bearer(engineer2)).send({});
    expect(twice.status).toBe(409);
    const dup = await request(app).post('/api/pairings').set(bearer(engineer)).send(pair!);
    expect(dup.status).toBe(409);
  });

  it('a rejection must say why', async () => {
    const drafts = await request(app).get('/api/pairings?status=draft').set(bearer(engineer2));
    const target = drafts.body.items.find((p: { authorId: string }) => p.authorId !== undefined);
    const res = await request(app).post(`/api/pairings/${target.id}/reject`).set(bearer(engineer2)).send({});
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].field).toBe('comment');
  });
});

import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { parse } from 'csv-parse/sync';
import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { bearer, makeTestApp, openTestApp, tokensFor } from '../support/app';
import { testStorage } from '../support/services';

// One regression test per defect found by attacking a running instance (issue 10, input hardening). Each
// failed before the fix: the sort keys answered 200 and then broke the process, the rest answered 500,
// mailOff was stored letter by letter, and exported dates carried quotes of their own.

let ds: DataSource;
let app: Express;
const t: Record<string, string> = {};
const id: Record<string, string> = {};

beforeAll(async () => {
  ({ ds, app } = await openTestApp({ storage: testStorage() }));
  Object.assign(t, await tokensFor(app, ['clerk', 'engineer', 'buyer', 'admin']));
  id.supplier = (await request(app).get('/api/suppliers?pageSize=1').set(bearer(t.admin))).body.items[0].id;
  id.drumType = (await request(app).get('/api/drum-types?sort=insideDepthMm&order=desc&pageSize=1').set(bearer(t.admin))).body.items[0].id;
  const check = await request(app).post('/api/receiving-checks').set(bearer(t.clerk)).send({ lotNumber: 'HARD-1', drumCount: 1, drumTypeId: id.drumType });
  id.check = check.body.id;
});

afterAll(() => ds.destroy());

const get = (path: string, token = t.clerk) => request(app).get(path).set(bearer(token));
/** A 400 (or the given status) in the one error shape, naming the field; `what` names the request in a failure. */
function expectRefused(res: request.Response, field: string, status = 400, what?: string): void {
  expect({ what, status: res.status, fields: (res.body.error?.details ?? []).map((d: { field: string }) => d.field) }).toEqual({ what, status, fields: expect.arrayContaining([field]) });
  expect(typeof res.body.error.message).toBe('string');
}
/** Each GET refused with a 400 naming its field: `[path, field]`, or `[path, field, token]` for someone other than the clerk. */
async function expectGetsRefused(cases: Array<[path: string, field: string, token?: string]>): Promise<void> {
  for (const [path, field, token] of cases) expectRefused(await get(path, token), field, 400, path);
}

describe('a client-supplied key is never looked up in a plain object', () => {
  it('refuses prototype names as sort keys, in lists and exports, and the process keeps answering', async () => {
    const before = Object.getOwnPropertyNames(Object.prototype).sort();
    for (const key of ['__proto__', 'constructor', 'toString', 'hasOwnProperty', 'valueOf']) {
      expectRefused(await get(`/api/suppliers?sort=${key}`), 'sort');
      expectRefused(await get(`/api/exports/suppliers?sort=${key}`), 'sort');
    }
    expect(Object.getOwnPropertyNames(Object.prototype).sort()).toEqual(before);
    for (let i = 0; i < 20; i++) {
      const list = await get('/api/suppliers?sort=name');
      expect(list.status).toBe(200);
      expect(list.body.items.length).toBeGreaterThan(0);
    }
    expect((await get('/api/me')).status).toBe(200);
  });

  it('checks each list parameter against the values it takes, and refuses parameters a list does not take', async () => {
    await expectGetsRefused([
      ['/api/suppliers?region=Atlantis', 'region'],
      ['/api/drum-types?region=__proto__', 'region'],
      ['/api/pairings?status=pending', 'status'],
      ['/api/connectors?status=draft', 'status'],
      ['/api/tube-sets?status=broken', 'status'],
      ['/api/dip-tubes?thread=%3Bdrop', 'thread'],
      ['/api/thread-specs?thread=NPS-2', 'thread'],
      ['/api/dip-tubes?key=a%20b', 'key'],
      ['/api/suppliers?colour=red', 'colour'],
      ['/api/thread-specs?region=NA', 'region'],
      ['/api/suppliers?region=NA&region=EU', 'region'],
      ['/api/users?role=admin', 'role', t.admin],
      ['/api/notifications?unread=1', 'unread'],
      ['/api/sourcing-plans?status=open', 'status'],
    ]);
    // What the client sends still works: a known value, and an empty one meaning "any".
    expect((await get('/api/thread-specs?thread=NPS&sort=code')).status).toBe(200);
    expect((await get('/api/drum-types?region=NA&thread=NPS-2&key=')).status).toBe(200);
    expect((await get('/api/exports/connectors.csv?status=both')).status).toBe(200);
  });
});

describe('bad input answers a 4xx naming the field, never a 500', () => {
  it('refuses a NUL byte or another control character in query, path and body text', async () => {
    await expectGetsRefused([
      ['/api/suppliers?q=%00', 'q'],
      ['/api/receiving-checks?q=lot%00', 'q'],
      ['/api/audit?entity=%00', 'entity', t.admin],
      ['/api/tools/packaging-codes/1A1%00', 'path'],
    ]);
    const hold = await request(app).post(`/api/receiving-checks/${id.check}/hold`).set(bearer(t.clerk)).send({ reason: 'does not\u0000 fit' });
    expectRefused(hold, 'reason');
    const nested = await request(app)
      .post('/api/fit-checks')
      .set(bearer(t.clerk))
      .send({ drum: { insideDepthMm: 800, openings: [{ threadCode: 'NPS-2\u0001' }] } });
    expectRefused(nested, 'drum.openings.0.threadCode');
    const key = await request(app).patch('/api/me').set(bearer(t.clerk)).set('Content-Type', 'application/json').send('{"lengthUnit\\u0000":"mm"}');
    expectRefused(key, 'lengthUnit\u0000');
    expect((await get(`/api/receiving-checks/${id.check}`)).body.status).toBe('checked');
  });

  it('bounds page and pageSize, and reads them in digits only', async () => {
    await expectGetsRefused(['1e20', '100000000', '-0', '0x10'].map((page) => [`/api/suppliers?page=${page}`, 'page']));
    await expectGetsRefused([
      ['/api/suppliers?pageSize=1e20', 'pageSize'],
      ['/api/exports/suppliers?page=1e20', 'page'],
      ['/api/receiving-checks?page=99999999999999999999', 'page'],
      ['/api/audit?page=1e20', 'page', t.admin],
    ]);
    const last = await get('/api/suppliers?page=100000&pageSize=200');
    expect(last.status).toBe(200);
    expect(last.body.items).toEqual([]);
  });

  it('refuses a filter id that is not an id', async () => {
    expectRefused(await get('/api/drum-types?supplierId=acme'), 'supplierId');
    expectRefused(await get('/api/slurries?supplierId=1%20OR%201%3D1'), 'supplierId');
    expectRefused(await get('/api/tube-sets?stationId=bay-3'), 'stationId');
    expect((await get(`/api/drum-types?supplierId=${id.supplier}`)).status).toBe(200);
  });

  it('refuses dates that do not exist on the calendar', async () => {
    await expectGetsRefused([
      ['/api/receiving-checks?from=2024-02-30', 'from'],
      ['/api/receiving-checks?to=2023-02-29', 'to'],
      ['/api/audit?from=2024-02-30', 'from', t.admin],
      ['/api/audit?to=0000-01-01T00:00Z', 'to', t.admin],
    ]);
    expect((await get('/api/receiving-checks?from=2024-02-29')).status).toBe(200);
    expect((await get('/api/audit?from=2026-05-14T08:30:00%2B02:00', t.admin)).status).toBe(200);
    const plan = (startDate: string) =>
      request(app).post('/api/sourcing-plans').set(bearer(t.buyer)).send({ slurryName: 'Calendar test', supplierId: id.supplier, drumTypeId: id.drumType, startDate, drumsPerMonth: 2 });
    expectRefused(await plan('0000-01-01'), 'startDate');
    expectRefused(await plan('2027-02-29'), 'startDate');
    expect((await plan('2028-02-29')).status).toBe(201);
  });

  it('answers a malformed %-escape in the path with a 400', async () => {
    expectRefused(await get('/api/suppliers/%E0%A4%A'), 'path');
    expectRefused(await get('/api/exports/%FF'), 'path');
    expectRefused(await get('/api/suppliers?q=%E0%A4%A'), 'q');
    // Outside the API too: the web app's fallback route decodes its path the same way.
    const web = makeTestApp(ds, { webDir: process.env.BUNGWISE_WEB_DIR ?? path.resolve(__dirname, '..', '..', 'dist', 'web') });
    expectRefused(await request(web).get('/registry/%E0%A4%A'), 'path');
    expect((await request(web).get('/registry/suppliers')).status).toBe(200);
  });

  it('answers encodings it does not read with 415, and a damaged body or upload with 400', async () => {
    // The identity serializer: superagent would otherwise JSON.stringify a Buffer sent as JSON.
    const post = () =>
      request(app)
        .post('/api/fit-checks')
        .set(bearer(t.clerk))
        .serialize((bytes: unknown) => bytes as string);
    expectRefused(await post().set('Content-Type', 'application/json').set('Content-Encoding', 'compress').send('{}'), 'Content-Encoding', 415);
    expectRefused(await post().set('Content-Type', 'application/json').set('Content-Encoding', 'gzip').send(Buffer.from('not gzip')), 'body');
    expectRefused(await post().set('Content-Type', 'application/json; charset=koi8-r').send('{}'), 'Content-Type', 415);
    expectRefused(await post().set('Content-Type', 'text/plain').send('drumTypeId'), 'Content-Type', 415);
    const fine = await post()
      .set('Content-Type', 'application/json')
      .set('Content-Encoding', 'gzip')
      .send(gzipSync(JSON.stringify({ drumTypeId: id.drumType })));
    expect(fine.status).toBe(200);
    const upload = () => request(app).post('/api/imports').set(bearer(t.engineer));
    expectRefused(await upload().set('Content-Type', 'multipart/form-data').send(Buffer.from('kind=dip-tubes')), 'file');
    const b = 'cut-off';
    const truncated = Buffer.from(`--${b}\r\nContent-Disposition: form-data; name="kind"\r\n\r\ndip-tubes\r\n--${b}\r\nContent-Disposition: form-data; name="file"; filename="a.csv"\r\n\r\npart_num`);
    expectRefused(await upload().set('Content-Type', `multipart/form-data; boundary=${b}`).send(truncated), 'file');
    const nul = await upload().field('kind', 'dip-tubes\u0000').field('dryRun', 'true').attach('file', Buffer.from('a,b\n'), 'spec.csv');
    expectRefused(nul, 'kind');
  });

  it('refuses bodies nested without end and prototype keys', async () => {
    const deep = '['.repeat(10_000) + ']'.repeat(10_000);
    expectRefused(await request(app).post('/api/tools/flow').set(bearer(t.clerk)).set('Content-Type', 'application/json').send(deep), 'body');
    const proto = await request(app).patch('/api/me').set(bearer(t.clerk)).set('Content-Type', 'application/json').send('{"__proto__":{"lengthUnit":"in"}}');
    expectRefused(proto, '__proto__');
  });
});

describe('null for a field that cannot be empty', () => {
  it('is refused naming the field, in partial updates and in settings, instead of reaching a NOT NULL column', async () => {
    const key = (await get('/api/key-codes?pageSize=1', t.engineer)).body.items[0];
    expectRefused(await request(app).patch(`/api/key-codes/${key.id}`).set(bearer(t.engineer)).send({ version: key.version, label: null }), 'label');
    const set = (await get('/api/tube-sets?pageSize=1', t.engineer)).body.items[0];
    expectRefused(await request(app).patch(`/api/tube-sets/${set.id}`).set(bearer(t.engineer)).send({ version: set.version, label: null }), 'label');
    const settings = (await get('/api/settings', t.engineer)).body;
    expectRefused(await request(app).patch('/api/settings').set(bearer(t.engineer)).send({ version: settings.version, tipClearanceMinMm: null }), 'tipClearanceMinMm');
    const buyer = (await get('/api/users', t.admin)).body.items.find((u: { email: string }) => u.email === 'buyer@bungwise.example');
    expectRefused(await request(app).patch(`/api/users/${buyer.id}`).set(bearer(t.admin)).send({ active: null }), 'active');
    expectRefused(await request(app).post('/api/fit-checks').set(bearer(t.clerk)).send({ drumTypeId: id.drumType, tapping: 'one-opening', flowLpm: null }), 'flowLpm');
    // Where null means "clear it", it still does.
    const supplier = (await get(`/api/suppliers/${id.supplier}`, t.engineer)).body;
    const cleared = await request(app).patch(`/api/suppliers/${id.supplier}`).set(bearer(t.engineer)).send({ version: supplier.version, notes: null });
    expect({ status: cleared.status, notes: cleared.body.notes }).toEqual({ status: 200, notes: null });
    expect((await get(`/api/key-codes/${key.id}`, t.engineer)).body.label).toBe(key.label);
  });
});

describe('PATCH /api/me', () => {
  it('refuses mailOff given as one kind instead of a list, and keeps the stored list', async () => {
    const before = (await get('/api/me', t.buyer)).body.user.mailOff;
    expectRefused(await request(app).patch('/api/me').set(bearer(t.buyer)).send({ mailOff: 'lot-held' }), 'mailOff');
    expect((await get('/api/me', t.buyer)).body.user.mailOff).toEqual(before);
    const ok = await request(app)
      .patch('/api/me')
      .set(bearer(t.buyer))
      .send({ mailOff: ['lot-held'] });
    expect(ok.body.user.mailOff).toEqual(['lot-held']);
  });
});

describe('CSV exports', () => {
  it('writes dates as plain ISO 8601 cells, without quotes of their own', async () => {
    const res = await get('/api/exports/suppliers.csv');
    expect(res.status).toBe(200);
    expect(res.text).not.toContain('"""');
    const [header, ...rows] = parse(res.text) as string[][];
    const column = header.indexOf('updatedAt');
    expect(column).toBeGreaterThanOrEqual(0);
    expect(rows.length).toBeGreaterThan(0);
    for (const row of rows) expect(row[column]).toMatch(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/);
  });
});

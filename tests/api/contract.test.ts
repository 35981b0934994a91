import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { DRUM_TYPE_FIELDS, RECEIVING_CHECK_FIELDS, SETTINGS_FIELDS, SUPPLIER_FIELDS, TUBE_SET_FIELDS, USER_FIELDS } from '../../shared/contract/fields';
import type { DrumTypeRecord, SupplierRecord } from '../../shared/contract/records';
import type { ReceivingCheckDetail } from '../../shared/contract/receiving';
import { DEMO_REGISTRY_SUMMARY as demo } from '../../seeds/demo-registry';
import { bearer, makeTestApp, tokenFor } from '../support/app';
import { openTestDataSource, resetDatabase } from '../support/db';
import { testStorage } from '../support/services';

// Real answers held against the contract (shared/contract): each list in shared/contract/fields.ts is checked by
// the type to name every required field, and here a serialiser must send exactly those (plus a detail's extras).

let ds: DataSource;
let app: Express;
const t: Record<string, string> = {};

const keysOf = (body: object) => Object.keys(body).sort();
const sorted = (...lists: ReadonlyArray<readonly string[]>) => lists.flat().sort();

beforeAll(async () => {
  ds = await openTestDataSource();
  await resetDatabase(ds);
  app = makeTestApp(ds, { storage: testStorage() });
  for (const role of ['clerk', 'engineer']) t[role] = await tokenFor(app, `${role}@bungwise.example`);
});

afterAll(async () => {
  await ds.destroy();
});

const get = async (path: string, token = t.engineer) => (await request(app).get(`/api${path}`).set(bearer(token)).expect(200)).body;

describe('the answers carry the contract fields', () => {
  it('suppliers: every list row has exactly the record fields; the detail adds its counts', async () => {
    const page = await get('/suppliers');
    expect(page.items.length).toBeGreaterThan(0);
    for (const row of page.items) expect(keysOf(row)).toEqual(sorted(SUPPLIER_FIELDS));
    const extras: Array<keyof SupplierRecord> = ['drumTypes', 'dipTubes', 'connectors'];
    expect(keysOf(await get(`/suppliers/${page.items[0].id}`))).toEqual(sorted(SUPPLIER_FIELDS, extras));
  });

  it('drum types: list rows and the detail, with its pairings and slurries', async () => {
    const page = await get('/drum-types?pageSize=100');
    for (const row of page.items) expect(keysOf(row)).toEqual(sorted(DRUM_TYPE_FIELDS));
    const extras: Array<keyof DrumTypeRecord> = ['pairings', 'slurries'];
    expect(keysOf(await get(`/drum-types/${page.items[0].id}`))).toEqual(sorted(DRUM_TYPE_FIELDS, extras));
  });

  it('tube sets: the rows carry the lot and drum a set is in', async () => {
    const page = await get('/tube-sets?pageSize=100');
    expect(page.items.length).toBeGreaterThan(0);
    for (const row of page.items) expect(keysOf(row)).toEqual(sorted(TUBE_SET_FIELDS));
  });

  it('a dock check: the recorded check, its detail and its history row', async () => {
    const drums = await get(`/drum-types?q=${encodeURIComponent(demo.fittingDrum)}`, t.clerk);
    const stations = await get(`/stations?q=${encodeURIComponent(demo.fittingStation)}`, t.clerk);
    const res = await request(app)
      .post('/api/receiving-checks')
      .set(bearer(t.clerk))
      .send({ lotNumber: 'CONTRACT-1', drumCount: 1, drumTypeId: drums.items[0].id, stationId: stations.items[0].id })
      .expect(201);
    const changeOuts: Array<keyof ReceivingCheckDetail> = ['changeOuts'];
    expect(keysOf(res.body)).toEqual(sorted(RECEIVING_CHECK_FIELDS, changeOuts));
    expect(keysOf(await get(`/receiving-checks/${res.body.id}`, t.clerk))).toEqual(sorted(RECEIVING_CHECK_FIELDS, changeOuts));
    const history = await get('/receiving-checks?q=CONTRACT-1', t.clerk);
    expect(keysOf(history.items[0])).toEqual(sorted(RECEIVING_CHECK_FIELDS));
  });

  it('the settings and the signed-in person', async () => {
    expect(keysOf(await get('/settings'))).toEqual(sorted(SETTINGS_FIELDS));
    expect(keysOf((await get('/me')).user)).toEqual(sorted(USER_FIELDS));
  });
});

import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { DEMO_REGISTRY_SUMMARY as demo } from '../../seeds/demo-registry';
import { bearer, makeTestApp, tokenFor } from '../support/app';
import { openTestDataSource, resetDatabase } from '../support/db';

// Every write route, hit with a corpus of bad input: missing fields, wrong types, negative and absurd
// numbers, unknown units and codes, over-long and non-Latin strings, malformed JSON. Each answer must be
// a 4xx naming the field, never a 500, and nothing may be written anywhere.

type Kind = 'text' | 'ident' | 'code' | 'number' | 'int' | 'bool' | 'id' | 'enum' | 'date' | 'email' | 'array' | 'unit';
interface Target {
  method: 'post' | 'patch';
  path: () => string;
  body: () => Record<string, unknown>;
  /** Field path -> kind; optional fields are not tested for absence. */
  fields: Record<string, Kind>;
  optional?: string[];
}

let ds: DataSource;
let app: Express;
let admin: string;
const id: Record<string, string> = {};

const first = async (resource: string, q = '') => (await request(app).get(`/api/${resource}?pageSize=1${q}`).set(bearer(admin))).body.items[0];

beforeAll(async () => {
  ds = await openTestDataSource();
  await resetDatabase(ds);
  app = makeTestApp(ds);
  admin = await tokenFor(app, 'admin@bungwise.example');
  id.supplier = (await first('suppliers')).id;
  id.drumType = (await first('drum-types', `&q=${demo.foreignDrum}`)).id;
  const tube = await first('dip-tubes');
  id.tube = tube.id;
  id.tubeVersion = tube.version;
  id.connector = (await first('connectors')).id;
  id.station = (await first('stations')).id;
  const set = await first('tube-sets');
  id.tubeSet = set.id;
  id.draft = (await first('pairings', '&status=draft')).id;
  const check = await request(app).post('/api/receiving-checks').set(bearer(admin)).send({ lotNumber: 'BAD-0', drumCount: 1, drumTypeId: id.drumType });
  id.check = check.body.id;
  id.settingsVersion = (await request(app).get('/api/settings').set(bearer(admin))).body.version;
});

afterAll(async () => {
  await ds.destroy();
});

const TARGETS: Record<string, Target> = {
  'POST /suppliers': { method: 'post', path: () => '/suppliers', body: () => ({ name: 'Corpus Supplier', region: 'EU' }), fields: { name: 'text', region: 'enum' } },
  'POST /key-codes': { method: 'post', path: () => '/key-codes', body: () => ({ code: 'K-CORPUS', label: 'Corpus key' }), fields: { code: 'ident', label: 'text' } },
  'POST /thread-specs': {
    method: 'post',
    path: () => '/thread-specs',
    body: () => ({ code: 'X-CORPUS', family: 'other', nominalLabel: 'x', majorDiameterMm: 30, pitchMm: 2, threadsPerInch: 12.7, flankAngleDeg: 60, form: 'parallel', standard: 'none' }),
    fields: { code: 'ident', family: 'enum', nominalLabel: 'text', majorDiameterMm: 'number', pitchMm: 'number', threadsPerInch: 'number', flankAngleDeg: 'number', form: 'enum', standard: 'text' },
  },
  'POST /drum-types': {
    method: 'post',
    path: () => '/drum-types',
    body: () => ({
      supplierId: id.supplier,
      region: 'NA',
      name: 'Corpus drum',
      partNumber: 'CORPUS-1',
      nominalCapacityL: 208,
      material: 'steel',
      head: 'tight',
      outsideHeightMm: 880,
      insideDepthMm: 851,
      outsideDiameterMm: 585,
      openings: [{ label: 'large', threadCode: 'NPS-2', boreMm: 50, position: 'large' }],
    }),
    fields: {
      supplierId: 'id',
      region: 'enum',
      name: 'text',
      partNumber: 'text',
      nominalCapacityL: 'number',
      material: 'enum',
      head: 'enum',
      outsideHeightMm: 'number',
      insideDepthMm: 'number',
      outsideDiameterMm: 'number',
      openings: 'array',
    },
  },
  'POST /dip-tubes': {
    method: 'post',
    path: () => '/dip-tubes',
    body: () => ({ partNumber: 'CORPUS-T', supplierId: id.supplier, threadCode: 'NPS-2', lengthMm: 836, boreMm: 19, odMm: 25.4, material: 'PFA', channels: 'feed' }),
    fields: { partNumber: 'text', supplierId: 'id', threadCode: 'code', lengthMm: 'number', boreMm: 'number', odMm: 'number', material: 'text', channels: 'enum' },
  },
  'POST /connectors': {
    method: 'post',
    path: () => '/connectors',
    body: () => ({ partNumber: 'CORPUS-H', supplierId: id.supplier, feedBoreMm: 19.05, feedNominal: '3/4 in', returnPath: 'none', suitedTo: 'two-opening', wettedMaterials: 'PFA' }),
    fields: { partNumber: 'text', supplierId: 'id', feedBoreMm: 'number', feedNominal: 'text', returnPath: 'enum', suitedTo: 'enum', wettedMaterials: 'text' },
  },
  'POST /pairings': { method: 'post', path: () => '/pairings', body: () => ({ dipTubeId: id.tube, connectorId: id.connector }), fields: { dipTubeId: 'id', connectorId: 'id' } },
  'POST /slurries': {
    method: 'post',
    path: () => '/slurries',
    body: () => ({ name: 'Corpus slurry', supplierId: id.supplier, region: 'NA', drumTypeId: id.drumType, foams: false, shearSensitive: false, solidsWtPct: 12, shelfLifeDays: 365, storageMinC: 5 }),
    fields: {
      name: 'text',
      supplierId: 'id',
      region: 'enum',
      drumTypeId: 'id',
      foams: 'bool',
      shearSensitive: 'bool',
      solidsWtPct: 'number',
      shelfLifeDays: 'int',
      minRemainingDays: 'int',
      certificateRequired: 'bool',
      densityKgM3: 'number',
      viscosityModel: 'enum',
      flowIndex: 'number',
      maxWallShearPerS: 'number',
      oxidiser: 'enum',
    },
    optional: ['shelfLifeDays', 'minRemainingDays', 'certificateRequired', 'densityKgM3', 'viscosityModel', 'flowIndex', 'maxWallShearPerS', 'oxidiser'],
  },
  'POST /stations': {
    method: 'post',
    path: () => '/stations',
    body: () => ({ name: 'Corpus station', bay: 'Z', tapping: 'one-opening', agitation: 'pump', flowLpm: 20 }),
    fields: { name: 'text', bay: 'text', tapping: 'enum', agitation: 'enum', flowLpm: 'number', lineLengthM: 'number', lineRoughnessUm: 'number' },
    optional: ['lineLengthM', 'lineRoughnessUm'],
  },
  'POST /tube-sets': {
    method: 'post',
    path: () => '/tube-sets',
    body: () => ({ stationId: id.station, label: 'Set Z', dipTubeId: id.tube }),
    fields: { stationId: 'id', label: 'text', dipTubeId: 'id' },
  },
  'PATCH /dip-tubes/:id': {
    method: 'patch',
    path: () => `/dip-tubes/${id.tube}`,
    body: () => ({ version: Number(id.tubeVersion), lengthMm: 840 }),
    fields: { version: 'int', lengthMm: 'number' },
    optional: ['lengthMm'],
  },
  'POST /fit-checks': {
    method: 'post',
    path: () => '/fit-checks',
    body: () => ({ drumTypeId: id.drumType, tapping: 'one-opening', flowLpm: 20 }),
    fields: { drumTypeId: 'id', tapping: 'enum', flowLpm: 'number' },
    optional: ['tapping', 'flowLpm'],
  },
  'POST /tools/flow': {
    method: 'post',
    path: () => '/tools/flow',
    body: () => ({ flow: { value: 20, unit: 'L/min' }, feedBoreMm: 19.05 }),
    fields: { 'flow.value': 'number', 'flow.unit': 'unit', feedBoreMm: 'number' },
  },
  'POST /tools/thread-match': {
    method: 'post',
    path: () => '/tools/thread-match',
    body: () => ({ majorDiameter: { value: 60, unit: 'mm' } }),
    fields: { 'majorDiameter.value': 'number', 'majorDiameter.unit': 'unit' },
  },
  'POST /receiving-checks': {
    method: 'post',
    path: () => '/receiving-checks',
    body: () => ({ lotNumber: 'CORPUS-LOT', drumCount: 2, drumTypeId: id.drumType, productionDate: '2026-01-05', temperatureIndicator: 'intact' }),
    fields: { lotNumber: 'text', drumCount: 'int', drumTypeId: 'id', productionDate: 'date', expiryDate: 'date', temperatureIndicator: 'enum' },
    optional: ['productionDate', 'expiryDate', 'temperatureIndicator'],
  },
  'POST /receiving-checks/:id/hold': { method: 'post', path: () => `/receiving-checks/${id.check}/hold`, body: () => ({ reason: 'does not fit' }), fields: { reason: 'text' } },
  'POST /sourcing-plans': {
    method: 'post',
    path: () => '/sourcing-plans',
    body: () => ({ slurryName: 'Corpus', supplierId: id.supplier, drumTypeId: id.drumType, startDate: '2027-01-01', drumsPerMonth: 4 }),
    fields: { slurryName: 'text', supplierId: 'id', drumTypeId: 'id', startDate: 'date', drumsPerMonth: 'int' },
  },
  'POST /users': {
    method: 'post',
    path: () => '/users',
    body: () => ({ email: 'corpus@bungwise.example', name: 'Corpus', role: 'clerk', temporaryPassword: 'long-enough-password' }),
    fields: { email: 'email', name: 'text', role: 'enum', temporaryPassword: 'text' },
  },
  'PATCH /settings': {
    method: 'patch',
    path: () => '/settings',
    body: () => ({ version: Number(id.settingsVersion), tipClearanceMinMm: 5 }),
    fields: { version: 'int', tipClearanceMinMm: 'number' },
    optional: ['tipClearanceMinMm'],
  },
  'POST /me/password': {
    method: 'post',
    path: () => '/me/password',
    body: () => ({ currentPassword: 'bungwise-demo', newPassword: 'long-enough-password' }),
    fields: { currentPassword: 'text', newPassword: 'text' },
  },
  'POST /auth/forgot-password': { method: 'post', path: () => '/auth/forgot-password', body: () => ({ email: 'admin@bungwise.example' }), fields: { email: 'email' } },
  'POST /auth/reset-password': {
    method: 'post',
    path: () => '/auth/reset-password',
    body: () => ({ token: 'A'.repeat(43), newPassword: 'long-enough-password' }),
    fields: { token: 'text', newPassword: 'text' },
  },
  'PATCH /me': { method: 'patch', path: () => '/me', body: () => ({ lengthUnit: 'in', theme: 'dark' }), fields: { lengthUnit: 'enum', theme: 'enum' }, optional: ['lengthUnit', 'theme'] },
  'POST /tube-sets/:id/standby': { method: 'post', path: () => `/tube-sets/${id.tubeSet}/standby`, body: () => ({ version: 1 }), fields: { version: 'int' } },
  'POST /tube-sets/:id/rinse': { method: 'post', path: () => `/tube-sets/${id.tubeSet}/rinse`, body: () => ({ note: 'x' }), fields: { note: 'text' }, optional: ['note'] },
  'POST /pairings/:id/reject': { method: 'post', path: () => `/pairings/${id.draft}/reject`, body: () => ({ comment: 'needs work' }), fields: { comment: 'text' } },
};

function setPath(body: Record<string, unknown>, field: string, value: unknown): void {
  const parts = field.split('.');
  let o = body as Record<string, unknown>;
  for (const p of parts.slice(0, -1)) o = o[p] as Record<string, unknown>;
  if (value === undefined) delete o[parts[parts.length - 1]];
  else o[parts[parts.length - 1]] = value;
}

function corpus(kind: Kind): Array<[string, unknown]> {
  const long = 'x'.repeat(5000);
  const byKind: Record<Kind, Array<[string, unknown]>> = {
    text: [
      ['wrong type', 12345],
      ['over-long', long],
      ['an object', { $ne: null }],
    ],
    // A new record's own code: any form the pattern allows is fine, so no "unknown code" case.
    ident: [
      ['wrong type', 12345],
      ['over-long', long],
      ['non-Latin', 'ＫＥＹ－１'],
      ['punctuation', 'K1;DROP'],
    ],
    code: [
      ['wrong type', 12345],
      ['over-long', long],
      ['unknown code', 'NO-SUCH-CODE-9'],
      ['non-Latin', 'ＮＰＳ－２'],
    ],
    number: [
      ['wrong type', 'abc'],
      ['negative', -1],
      ['absurd', 1e12],
      ['non-Latin digits', '８５１'],
      ['not finite', 'Infinity'],
    ],
    int: [
      ['wrong type', 'abc'],
      ['negative', -1],
      ['absurd', 1e12],
      ['a fraction', 1.5],
    ],
    bool: [
      ['wrong type', 'yes'],
      ['a number', 1],
    ],
    id: [
      ['wrong type', 12345],
      ['not an id', 'abc'],
      ['non-Latin', '識別子'],
      ['unknown id', '00000000-0000-4000-8000-000000000000'],
      ['over-long', long],
    ],
    enum: [
      ['wrong type', 12345],
      ['unknown value', 'sideways'],
      ['over-long', long],
    ],
    date: [
      ['wrong type', 12345],
      ['not a date', 'next week'],
      ['over-long', long],
    ],
    email: [
      ['wrong type', 12345],
      ['not an e-mail', 'nobody'],
      ['over-long', `${long}@x.example`],
    ],
    array: [
      ['wrong type', 'x'],
      ['empty', []],
    ],
    unit: [
      ['unknown unit', 'furlong'],
      ['wrong type', 3],
    ],
  };
  return byKind[kind];
}

async function totalRows(): Promise<number> {
  // The rate-limit counters are not records: a wrong current password is counted there on purpose.
  const tables: Array<{ tablename: string }> = await ds.query(`SELECT tablename FROM pg_tables WHERE schemaname = 'public' AND tablename <> 'sign_in_counters'`);
  let n = 0;
  for (const t of tables) n += Number((await ds.query(`SELECT count(*) AS n FROM "${t.tablename}"`))[0].n);
  return n;
}

const namesField = (details: unknown, field: string) =>
  Array.isArray(details) && details.some((d: { field?: string }) => typeof d?.field === 'string' && (d.field === field || d.field.startsWith(`${field}.`) || field.startsWith(`${d.field}.`)));

describe('the bad-input corpus', () => {
  it('answers every bad write with a 4xx naming the field, never a 500, and writes nothing', async () => {
    const before = await totalRows();
    const problems: string[] = [];
    let cases = 0;
    for (const [name, target] of Object.entries(TARGETS)) {
      const send = (body: unknown) =>
        request(app)
          [target.method](`/api${target.path()}`)
          .set(bearer(admin))
          .send(body as object);
      for (const [field, kind] of Object.entries(target.fields)) {
        const mutations: Array<[string, unknown]> = [...(target.optional?.includes(field) ? [] : ([['missing', undefined]] as Array<[string, unknown]>)), ...corpus(kind)];
        for (const [label, value] of mutations) {
          cases++;
          const body = structuredClone(target.body());
          setPath(body, field, value);
          const res = await send(body);
          if (res.status >= 500) problems.push(`${name} ${field} ${label}: ${res.status}`);
          else if (res.status < 400) problems.push(`${name} ${field} ${label}: accepted with ${res.status}`);
          else if (!namesField(res.body?.error?.details, field))
            problems.push(`${name} ${field} ${label}: ${res.status} without naming the field (${JSON.stringify(res.body?.error?.details)?.slice(0, 160)})`);
        }
      }
      cases++;
      const malformed = await request(app)[target.method](`/api${target.path()}`).set(bearer(admin)).set('Content-Type', 'application/json').send('{"broken": ');
      if (malformed.status !== 400 || !namesField(malformed.body.error?.details, 'body')) problems.push(`${name} malformed JSON: ${malformed.status}`);
      cases++;
      const notObject = await send([1, 2, 3]);
      if (notObject.status !== 400) problems.push(`${name} array body: ${notObject.status}`);
    }
    expect(problems).toEqual([]);
    expect(cases).toBeGreaterThan(400);
    expect(await totalRows()).toBe(before);
  }, 180_000);
});

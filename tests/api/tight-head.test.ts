import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { bearer, makeTestApp, tokenFor } from '../support/app';
import { openTestDataSource, resetDatabase } from '../support/db';

// The tight-head opening rule end to end: a drum type recorded as tight head with an opening wider than 7.0 cm
// (UN Model Regulations 6.1.4.1.5, from memory) gets a caution from the fit check and the dock snapshot alike.
let ds: DataSource;
let app: Express;
let engineer: string;
let clerk: string;
let drum: { id: string; version: number; openings: Array<Record<string, unknown>> };

type Rule = { rule: string; outcome: string; message: string; numbers?: Record<string, number> };

beforeAll(async () => {
  ds = await openTestDataSource();
  await resetDatabase(ds);
  app = makeTestApp(ds);
  [engineer, clerk] = [await tokenFor(app, 'engineer@bungwise.example'), await tokenFor(app, 'clerk@bungwise.example')];
  const list = await request(app).get('/api/drum-types?q=KFC-P200-B5670').set(bearer(engineer)).expect(200);
  drum = (await request(app).get(`/api/drum-types/${list.body.items[0].id}`).set(bearer(engineer)).expect(200)).body;
});

afterAll(async () => {
  await ds.destroy();
});

const ruleOf = (body: { candidates: Array<{ rules: Rule[] }> }) => body.candidates[0].rules.find((r) => r.rule === 'tight-head');
const ask = async (q: Record<string, unknown>) => (await request(app).post('/api/fit-checks').set(bearer(clerk)).send(q).expect(200)).body;

describe('the tight-head opening rule through the API', () => {
  it('passes the demo tight-head drum (widest opening 60 mm) and keeps its fit', async () => {
    const answer = await ask({ drumTypeId: drum.id });
    expect(answer.verdict).toBe('fits');
    expect(ruleOf(answer)).toMatchObject({ outcome: 'pass', numbers: { widestBoreMm: 60, maxBoreMm: 70 } });
  });

  it('cautions the drum once an opening is recorded wider than 70 mm, naming both numbers; the phone agrees', async () => {
    const openings = drum.openings.map(({ id: _id, ...o }) => (o.label === '70x6 bung' ? { ...o, boreMm: 75 } : o));
    const patched = await request(app).patch(`/api/drum-types/${drum.id}`).set(bearer(engineer)).send({ version: drum.version, openings }).expect(200);
    const answer = await ask({ drumTypeId: drum.id });
    expect(answer.verdict).toBe('caution');
    const rule = ruleOf(answer)!;
    expect(rule).toMatchObject({ outcome: 'caution', numbers: { widestBoreMm: 75, maxBoreMm: 70 } });
    expect(rule.message).toMatch(/75\.0 mm .*70\.0 mm/);
    const snapshot = (await request(app).get('/api/dock-snapshot').set(bearer(clerk)).expect(200)).body;
    expect(snapshot.drumTypes.find((d: { id: string }) => d.id === drum.id)).toMatchObject({ head: 'tight' });

    // Recorded as open head, the limit no longer applies.
    await request(app).patch(`/api/drum-types/${drum.id}`).set(bearer(engineer)).send({ version: patched.body.version, head: 'open' }).expect(200);
    const open = await ask({ drumTypeId: drum.id });
    expect(ruleOf(open)!.outcome).toBe('pass');
    expect(open.verdict).toBe('fits');
  });

  it('lists the rule as not checked for a drum described at the dock (no head type recorded)', async () => {
    const answer = await ask({ drum: { insideDepthMm: 880, openings: [{ label: 'bung', threadCode: 'BT-56x4', boreMm: 80 }] } });
    expect(answer.candidates[0].notChecked).toContainEqual({ rule: 'tight-head', reason: "not checked: the drum's head type is not recorded" });
  });
});

import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { bearer, openTestApp, tokenFor } from '../support/app';

let ds: DataSource;
let app: Express;
let clerk: string;

beforeAll(async () => {
  ({ ds, app } = await openTestApp());
  clerk = await tokenFor(app, 'clerk@bungwise.example');
});

afterAll(() => ds.destroy());

describe('POST /api/tools/thread-match', () => {
  const match = (body: object) => request(app).post('/api/tools/thread-match').set(bearer(clerk)).send(body);

  it('identifies 2 in NPS from OD 2.375 in, 11.5 TPI, parallel', async () => {
    // ASME B1.20.1 Table 2: 2 in pipe OD 2.375 in, 11.5 threads/in [pub]
    const res = await match({ majorDiameter: { value: 2.375, unit: 'in' }, threadsPerInch: 11.5, flankAngleDeg: 60, taper: 'parallel' });
    expect(res.status).toBe(200);
    expect(res.body.matches[0]).toMatchObject({ code: 'NPS-2', threadsPerInch: 11.5 });
    expect(res.body.matches[0].majorDiameterMm).toBeCloseTo(2.375 * 25.4, 3);
    expect(res.body.ambiguous).toBe(false);
  });

  it('identifies G 2 from 59.614 mm and 11 TPI, not 2 in NPS', async () => {
    // ISO 228-1: G 2, 11 threads/in, major diameter 59.614 mm [pub]
    const res = await match({ majorDiameter: { value: 59.614, unit: 'mm' }, threadsPerInch: 11, flankAngleDeg: 55, taper: 'parallel' });
    // ISO 7-1 [mem]: Rp 2 (internal parallel) has the G 2 dimensions; R 2 and Rc 2 are tapered, so left out
    expect(res.body.matches.map((m: { code: string }) => m.code).sort()).toEqual(['G-2', 'Rp-2']);
    const tapered = await match({ majorDiameter: { value: 59.614, unit: 'mm' }, threadsPerInch: 11, flankAngleDeg: 55, taper: 'tapered' });
    expect(tapered.body.matches.map((m: { code: string }) => m.code).sort()).toEqual(['R-2', 'Rc-2']);
  });

  it('reports a diameter-only reading near 60 mm as ambiguous, with what to measure next', async () => {
    const res = await match({ majorDiameter: { value: 60, unit: 'mm' } });
    expect(res.body.ambiguous).toBe(true);
    const codes = res.body.matches.map((m: { code: string }) => m.code);
    expect(codes).toEqual(expect.arrayContaining(['G-2', 'NPS-2', 'NPT-2']));
    expect(res.body.advice).toMatch(/thread/i);
  });

  it('answers 400 for an unknown unit and a negative diameter, naming the field', async () => {
    const unit = await match({ majorDiameter: { value: 2, unit: 'furlong' } });
    expect(unit.status).toBe(400);
    expect(unit.body.error.details[0].field).toBe('majorDiameter.unit');
    const negative = await match({ majorDiameter: { value: -2, unit: 'in' } });
    expect(negative.body.error.details[0].field).toBe('majorDiameter.value');
  });

  it('an internal thread (a bung) is never R, which ISO 7-1 cuts outside only; an unknown side is a 400 naming the field', async () => {
    const reading = { majorDiameter: { value: 59.6, unit: 'mm' }, threadsPerInch: 11, flankAngleDeg: 55 };
    const codes = async (body: object) => ((await match(body)).body.matches as Array<{ code: string }>).map((m) => m.code).sort();
    expect(await codes(reading)).toEqual(['G-2', 'R-2', 'Rc-2', 'Rp-2']);
    expect(await codes({ ...reading, side: 'internal' })).toEqual(['G-2', 'Rc-2', 'Rp-2']);
    const bad = await match({ ...reading, side: 'inside' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0].field).toBe('side');
  });
});

describe('POST /api/tools/flow', () => {
  const flow = (body: object) => request(app).post('/api/tools/flow').set(bearer(clerk)).send(body);

  it('reproduces the shear-rate worked example: 10 m3/h through a 50 mm bore', async () => {
    const res = await flow({ flow: { value: 10, unit: 'm3/h' }, feedBoreMm: 50 });
    expect(res.status).toBe(200);
    // Shear-rate worked example: v = 1.415 m/s, wall shear rate 226.4 1/s [pub]
    expect(res.body.feed.velocityMs).toBeCloseTo(1.415, 3);
    expect(res.body.feed.shearRatePerS).toBeCloseTo(226.4, 1);
    expect(res.body.feed.regime).toBe('turbulent');
  });

  it('gives the (Df/Dr)^2 ratio for a 3/4 in feed and 1/2 in return: 2.25', async () => {
    // (19.05 / 12.7)^2 = 1.5^2 = 2.25 [derived]; common practice, no published source for the caution itself
    const res = await flow({ flow: { value: 20, unit: 'L/min' }, feedBoreMm: 19.05, returnBoreMm: 12.7 });
    expect(res.body.velocityRatio).toBeCloseTo(2.25, 10);
    expect(res.body.return.velocityMs / res.body.feed.velocityMs).toBeCloseTo(2.25, 10);
  });

  it('answers 400 for an unknown flow unit, naming the field', async () => {
    const res = await flow({ flow: { value: 20, unit: 'buckets/h' }, feedBoreMm: 19 });
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].field).toBe('flow.unit');
  });
});

describe('GET /api/tools/packaging-codes/:code', () => {
  it('explains 1A1 as a steel drum with a non-removable head', async () => {
    // UN Model Regulations 6.1.2 / 49 CFR 178.502: 1 drum, A steel, 1 non-removable head [pub]
    const res = await request(app).get('/api/tools/packaging-codes/1A1').set(bearer(clerk));
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ ok: true, code: '1A1', kind: '1', material: 'A', category: '1' });
    expect(res.body.explanation).toMatch(/steel drum/i);
  });

  it('answers 400 for a code that is not a packaging code', async () => {
    const res = await request(app).get('/api/tools/packaging-codes/9Z9').set(bearer(clerk));
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].field).toBe('code');
  });

  it('answers 400 naming what is wrong for a well-formed code that does not exist', async () => {
    // UN Model Regulations 6.1.2.7 [mem]: jerricans are 3A, 3B and 3H; the fibreboard box is 4G with no numeral
    for (const [code, reason] of [
      ['3N1', /jerrican/],
      ['4G1', /written 4G/],
    ] as const) {
      const res = await request(app).get(`/api/tools/packaging-codes/${code}`).set(bearer(clerk));
      expect(res.status).toBe(400);
      expect(res.body.error.details[0]).toMatchObject({ field: 'code' });
      expect(res.body.error.message).toMatch(reason);
    }
  });

  it('explains a whole mark, and refuses one with a bad part', async () => {
    // UN Model Regulations 6.1.3.7 example [mem]: 1A1/Y1.4/150/98/NL/VL824
    const res = await request(app)
      .get(`/api/tools/packaging-codes/${encodeURIComponent('UN 1A1/Y1.4/150/98/NL/VL824')}`)
      .set(bearer(clerk));
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ code: '1A1', mark: { relativeDensity: 1.4, testPressureKpa: 150, state: 'NL', maker: 'VL824' } });
    const bad = await request(app)
      .get(`/api/tools/packaging-codes/${encodeURIComponent('1A1/Y1.4/155/98/NL/VL824')}`)
      .set(bearer(clerk));
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toMatch(/nearest 10 kPa/);
  });

  it('checks a drum type: recommended tube length and its declared code', async () => {
    const drums = await request(app).get('/api/drum-types?pageSize=50').set(bearer(clerk));
    const drum = drums.body.items.find((d: { unPackagingCode: string | null }) => d.unPackagingCode);
    const res = await request(app).get(`/api/tools/drum-types/${drum.id}/checks`).set(bearer(clerk));
    expect(res.status).toBe(200);
    expect(res.body.recommendedLength.targetMm).toBeCloseTo(drum.insideDepthMm - 15, 6); // default window 5..25 mm: midpoint 15 mm
    expect(res.body.packaging[0]).toMatchObject({ check: 'code', outcome: 'pass' });
  });
});

import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { DEMO_REGISTRY_SUMMARY as demo } from '../../seeds/demo-registry';
import { bearer, idsOf, openTestApp, tokenFor } from '../support/app';

let ds: DataSource;
let app: Express;
let clerk: string;
const ids: Record<string, string> = {};

const check = (body: object) => request(app).post('/api/fit-checks').set(bearer(clerk)).send(body);
type Rule = { rule: string; outcome: string; message: string; numbers?: Record<string, number> };
type Candidate = { dipTubePartNumber: string; connectorPartNumber: string; verdict: string; rules: Rule[]; pairingStatus: string; installedAtStation: boolean };
const ruleOf = (c: Candidate, name: string) => c.rules.find((r) => r.rule === name);

beforeAll(async () => {
  ({ ds, app } = await openTestApp());
  clerk = await tokenFor(app, 'clerk@bungwise.example');
  Object.assign(ids, await idsOf(app, clerk, 'drum-types', 'partNumber', { fittingDrum: demo.fittingDrum, foreignDrum: demo.foreignDrum }));
  Object.assign(ids, await idsOf(app, clerk, 'stations', 'name', { fittingStation: demo.fittingStation, splitStation: demo.oneOpeningStationWithSplitHead, cautionStation: demo.cautionStation }));
  Object.assign(ids, await idsOf(app, clerk, 'slurries', 'name', { foamingSlurry: demo.foamingSlurry, foreignSlurry: demo.foreignSlurry }));
});

afterAll(() => ds.destroy());

describe('POST /api/fit-checks', () => {
  it('a drum the site is equipped for fits, naming the approved pairing, with handling cautions', async () => {
    const res = await check({ drumTypeId: ids.fittingDrum, stationId: ids.fittingStation });
    expect(res.status).toBe(200);
    expect(res.body.verdict).toBe('fits');
    const best: Candidate = res.body.candidates[0];
    expect(best).toMatchObject({ dipTubePartNumber: demo.fittingTube, connectorPartNumber: demo.fittingHead, verdict: 'fits', pairingStatus: 'approved', installedAtStation: true });
    expect(best.rules.every((r) => r.outcome === 'pass')).toBe(true);
    expect(best.rules.map((r) => r.rule)).toEqual(expect.arrayContaining(['thread', 'key', 'reach', 'tapping', 'ports', 'openings', 'approval']));
    // The reach rule reports the tip gap in mm and in.
    expect(ruleOf(best, 'reach')!.numbers).toEqual(expect.objectContaining({ gapMm: expect.any(Number), gapIn: expect.any(Number) }));
    expect(ruleOf(best, 'reach')!.numbers!.gapIn).toBeCloseTo(ruleOf(best, 'reach')!.numbers!.gapMm / 25.4, 6); // 1 in = 25.4 mm exactly (NIST SP 811)
    expect(res.body.summary).toMatch(/fits/);
    expect(res.body.cautions.map((c: { topic: string }) => c.topic)).toEqual(expect.arrayContaining(['ppe', 'sds', 'spills', 'pressure', 'codes']));
  });

  it('a drum from another region with a different design does not fit, and says why', async () => {
    const res = await check({ drumTypeId: ids.foreignDrum, slurryId: ids.foreignSlurry });
    expect(res.status).toBe(200);
    expect(res.body.verdict).toBe('no-fit');
    expect(res.body.candidates.length).toBeGreaterThan(0);
    for (const c of res.body.candidates as Candidate[]) expect(c.verdict).toBe('no-fit');
    expect(ruleOf(res.body.candidates[0], 'reach')!.outcome).toBe('fail');
    expect(res.body.summary).toMatch(/does not fit/);
  });

  it('a feed-with-separate-return head at a one-opening station fails on tapping with the shear reason (common practice, no published source)', async () => {
    const res = await check({ drumTypeId: ids.fittingDrum, stationId: ids.splitStation });
    const installed = (res.body.candidates as Candidate[]).filter((c) => c.connectorPartNumber === demo.splitHead);
    expect(installed.length).toBeGreaterThan(0);
    for (const c of installed) {
      expect(c.verdict).toBe('no-fit');
      expect(ruleOf(c, 'tapping')).toMatchObject({ outcome: 'fail' });
      expect(ruleOf(c, 'tapping')!.message).toMatch(/shear/i);
    }
  });

  it('a foaming slurry at a mechanically agitated station fails on foam (common practice, no published source)', async () => {
    const res = await check({ drumTypeId: ids.fittingDrum, stationId: ids.splitStation, slurryId: ids.foamingSlurry });
    expect(res.body.verdict).toBe('no-fit');
    for (const c of res.body.candidates as Candidate[]) expect(ruleOf(c, 'foam')!.outcome).toBe('fail');
  });

  it('a smaller return port in one-opening tapping is a caution with the velocity ratio and return velocity', async () => {
    const res = await check({ drumTypeId: ids.fittingDrum, stationId: ids.cautionStation });
    const reduced = (res.body.candidates as Candidate[]).find((c) => c.connectorPartNumber === demo.reducedReturnHead)!;
    expect(reduced).toBeDefined();
    const ports = ruleOf(reduced, 'ports')!;
    expect(ports.outcome).toBe('caution');
    // (Df/Dr)^2 at equal flow [derived from v = Q/A]
    expect(ports.numbers!.velocityRatio).toBeCloseTo(ports.numbers!.returnVelocityMs / ports.numbers!.feedVelocityMs, 6);
  });

  it('a tube set not rinsed since its last drum makes its tube no-fit on the rinse rule', async () => {
    const sets = await request(app).get(`/api/tube-sets?stationId=${ids.fittingStation}`).set(bearer(clerk));
    const dirty = sets.body.items.find((s: { label: string }) => s.label === demo.dirtyTubeSet);
    const res = await check({ drumTypeId: ids.fittingDrum, stationId: ids.fittingStation, tubeSetId: dirty.id });
    const withSet = (res.body.candidates as Candidate[]).filter((c) => ruleOf(c, 'rinse'));
    expect(withSet.length).toBeGreaterThan(0);
    for (const c of withSet) {
      expect(ruleOf(c, 'rinse')!.outcome).toBe('fail');
      expect(c.verdict).toBe('no-fit');
    }
  });

  it('checks a drum described by hand (caliper and gauge) like a registered one', async () => {
    const registered = await check({ drumTypeId: ids.fittingDrum });
    const drum = registered.body.drum;
    const adHoc = await check({
      drum: { insideDepthMm: drum.insideDepthMm, openings: drum.openings.map((o: { threadCode: string; keyCode: string | null }) => ({ threadCode: o.threadCode, keyCode: o.keyCode })) },
    });
    expect(adHoc.status).toBe(200);
    expect(adHoc.body.verdict).toBe(registered.body.verdict);
    expect(adHoc.body.candidates.map((c: Candidate) => c.dipTubePartNumber + c.connectorPartNumber).sort()).toEqual(
      registered.body.candidates.map((c: Candidate) => c.dipTubePartNumber + c.connectorPartNumber).sort(),
    );
  });

  it('refuses a tube wider than the opening on the pass-through rule, with both numbers', async () => {
    const registered = await check({ drumTypeId: ids.fittingDrum });
    const drum = registered.body.drum;
    // The same drum with every bore recorded as 20 mm: the demo tubes are 25.4 mm outside (1 in, NIST SP 811).
    const narrow = await check({
      drum: { insideDepthMm: drum.insideDepthMm, openings: drum.openings.map((o: { threadCode: string; keyCode: string | null }) => ({ threadCode: o.threadCode, keyCode: o.keyCode, boreMm: 20 })) },
    });
    expect(narrow.status).toBe(200);
    const refused = narrow.body.candidates.map((c: Candidate) => ruleOf(c, 'pass-through')).filter(Boolean);
    expect(refused.length).toBeGreaterThan(0);
    for (const r of refused) {
      expect(r.outcome).toBe('fail');
      expect(r.message).toMatch(/25\.4 mm.*20\.0 mm/);
    }
    expect(narrow.body.verdict).toBe('no-fit');
    const best = registered.body.candidates[0] as Candidate;
    expect(ruleOf(best, 'pass-through')?.outcome).toBe('pass');
  });

  it('takes a station described inline: tapping, agitation and flow', async () => {
    const res = await check({ drumTypeId: ids.fittingDrum, tapping: 'one-opening', agitation: 'pump', flowLpm: 20 });
    expect(res.status).toBe(200);
    expect(res.body.station).toMatchObject({ tapping: 'one-opening', agitation: 'pump', flowLpm: 20 });
  });

  it.each([
    [{ drum: { insideDepthMm: -10, openings: [{ threadCode: 'NPS-2' }] } }, 'drum.insideDepthMm'],
    [{ drum: { insideDepthMm: 851, openings: [{ threadCode: 'NPX-2' }] } }, 'drum.openings.0.threadCode'],
    [{ drum: { insideDepthMm: 851, openings: [{ threadCode: 'NPS-2', keyCode: 'NO-SUCH-KEY' }] } }, 'drum.openings.0.keyCode'],
    [{ drum: { insideDepthMm: 851, openings: [] } }, 'drum.openings'],
    [{}, 'drumTypeId'],
    [{ drumTypeId: '00000000-0000-4000-8000-000000000000' }, 'drumTypeId'],
    [{ drumTypeId: 'abc' }, 'drumTypeId'],
    [{ drum: { insideDepthMm: 851, openings: [{ threadCode: 'NPS-2' }] }, tapping: 'three-opening' }, 'tapping'],
    [{ drum: { insideDepthMm: 851, openings: [{ threadCode: 'NPS-2' }] }, flowLpm: -3, tapping: 'one-opening' }, 'flowLpm'],
  ])('answers 400 naming the field for %j', async (body, field) => {
    const res = await check(body);
    expect(res.status).toBe(400);
    expect(res.body.error.details.map((d: { field: string }) => d.field)).toContain(field);
  });

  it('suggests the nearest thread codes for an unknown one', async () => {
    const res = await check({ drum: { insideDepthMm: 851, openings: [{ threadCode: 'NPS 2' }] } });
    expect(res.body.error.details[0].messages[0]).toMatch(/NPS-2/);
  });
});

import fs from 'node:fs';
import path from 'node:path';
import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { bearer, makeTestApp, tokenFor } from '../support/app';
import { openTestDataSource, resetDatabase } from '../support/db';

// No behaviour lost: the verdicts of every demo drum type at every demo station (and at none), with every demo
// slurry (and none), as the fit check, the dock check and a sourcing plan give them, compared with the answers
// recorded in tests/fixtures/demo-verdicts.json. `UPDATE=1 npm test -- tests/api/demo-verdicts.test.ts` records
// them again (then `npx prettier --write tests/fixtures/demo-verdicts.json`); a change to the file is a change
// of behaviour, to be made on purpose and said in the commit.
const FIXTURE = path.join(__dirname, '..', 'fixtures', 'demo-verdicts.json');
const NOW = new Date('2026-11-20T12:00:00Z');

let ds: DataSource;
let app: Express;
const t: Record<string, string> = {};

interface Named {
  id: string;
  name: string;
  partNumber?: string;
}

interface FitBody {
  verdict: string;
  summary: string;
  candidateCount: number;
  candidates: Array<{
    dipTubePartNumber: string;
    connectorPartNumber: string;
    verdict: string;
    installedAtStation: boolean;
    rules: Array<{ rule: string; outcome: string }>;
    notChecked: Array<{ rule: string }>;
  }>;
}

/** What a verdict is made of: the chosen pair, the rules that did not pass, every candidate's verdict. */
const shapeOfFit = (r: FitBody) => ({
  verdict: r.verdict,
  summary: r.summary,
  candidateCount: r.candidateCount,
  chosen: r.candidates[0] ? `${r.candidates[0].dipTubePartNumber} + ${r.candidates[0].connectorPartNumber}` : null,
  notPassed: r.candidates[0]?.rules.filter((x) => x.outcome !== 'pass').map((x) => `${x.rule}:${x.outcome}`) ?? [],
  notChecked: r.candidates[0]?.notChecked.map((n) => n.rule) ?? [],
  candidates: r.candidates.map((c) => `${c.dipTubePartNumber} + ${c.connectorPartNumber}: ${c.verdict}${c.installedAtStation ? ' (installed)' : ''}`),
});

beforeAll(async () => {
  ds = await openTestDataSource();
  await resetDatabase(ds);
  app = makeTestApp(ds, { clock: () => NOW });
  for (const role of ['clerk', 'engineer', 'buyer']) t[role] = await tokenFor(app, `${role}@bungwise.example`);
  const settings = await request(app).get('/api/settings').set(bearer(t.engineer));
  await request(app).patch('/api/settings').set(bearer(t.engineer)).send({ version: settings.body.version, timeZone: 'UTC' }).expect(200);
});

afterAll(async () => {
  await ds.destroy();
});

const list = async (route: string): Promise<Named[]> => {
  const res = await request(app).get(`/api/${route}?pageSize=100`).set(bearer(t.engineer)).expect(200);
  return (res.body.items as Named[]).sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0));
};

async function liveAnswers() {
  const [drums, stations, slurries, suppliers] = [await list('drum-types'), await list('stations'), await list('slurries'), await list('suppliers')];
  const fitChecks = [];
  const dockChecks = [];
  let n = 0;
  for (const drum of drums) {
    for (const station of [null, ...stations]) {
      for (const slurry of [null, ...slurries]) {
        const q = { drumTypeId: drum.id, ...(station ? { stationId: station.id } : {}), ...(slurry ? { slurryId: slurry.id } : {}) };
        const res = await request(app).post('/api/fit-checks').set(bearer(t.clerk)).send(q).expect(200);
        fitChecks.push({ drum: drum.partNumber, station: station?.name ?? null, slurry: slurry?.name ?? null, ...shapeOfFit(res.body) });
      }
      // The dock check records the same fit answer with a lot decision (a passing lot, so the hardware decides).
      const slurry = slurries[n++ % slurries.length];
      const lot = {
        lotNumber: `FIX-${n}`,
        drumCount: 1,
        drumTypeId: drum.id,
        slurryId: slurry.id,
        ...(station ? { stationId: station.id } : {}),
        expiryDate: '2027-09-30',
        temperatureIndicator: 'intact',
      };
      const res = await request(app).post('/api/receiving-checks').set(bearer(t.clerk)).send(lot).expect(201);
      dockChecks.push({
        drum: drum.partNumber,
        station: station?.name ?? null,
        slurry: slurry.name,
        decision: res.body.decision,
        status: res.body.status,
        sentence: res.body.lotVerdict.sentence,
        ...shapeOfFit(res.body.result),
      });
    }
  }
  const plans = [];
  for (const drum of drums) {
    for (const flags of [
      { foams: false, shearSensitive: false },
      { foams: true, shearSensitive: true },
    ]) {
      const body = { slurryName: `Fixture ${drum.partNumber}`, supplierId: suppliers[0].id, drumTypeId: drum.id, startDate: '2027-02-01', drumsPerMonth: 4, ...flags };
      const res = await request(app).post('/api/sourcing-plans').set(bearer(t.buyer)).send(body).expect(201);
      plans.push({
        drum: drum.partNumber,
        ...flags,
        stations: (res.body.impact.stations as Array<{ stationName: string; verdict: string; summary: string; order: Array<Record<string, unknown>> }>).map((s) => ({
          station: s.stationName,
          verdict: s.verdict,
          summary: s.summary,
          order: s.order.map(({ id: _id, ...line }) => line),
        })),
        order: (res.body.impact.order as Array<Record<string, unknown>>).map(({ id: _id, ...line }) => line),
      });
    }
  }
  return { counts: { drums: drums.length, stations: stations.length, slurries: slurries.length }, fitChecks, dockChecks, plans };
}

describe('the demo verdicts', () => {
  it('are the recorded ones, for every demo drum type at every demo station and at none: fit check, dock check and sourcing plan', async () => {
    const live = await liveAnswers();
    if (process.env.UPDATE === '1') {
      fs.mkdirSync(path.dirname(FIXTURE), { recursive: true });
      fs.writeFileSync(FIXTURE, `${JSON.stringify(live, null, 2)}\n`);
    }
    const recorded = JSON.parse(fs.readFileSync(FIXTURE, 'utf8'));
    // The comparison means something only if the demo covers every verdict.
    expect(new Set(live.fitChecks.map((c) => c.verdict))).toEqual(new Set(['fits', 'caution', 'no-fit']));
    expect(live.fitChecks).toHaveLength(live.counts.drums * (live.counts.stations + 1) * (live.counts.slurries + 1));
    expect(live.counts).toEqual(recorded.counts);
    for (const [i, c] of live.fitChecks.entries()) expect(c).toEqual(recorded.fitChecks[i]);
    for (const [i, c] of live.dockChecks.entries()) expect(c).toEqual(recorded.dockChecks[i]);
    for (const [i, p] of live.plans.entries()) expect(p).toEqual(recorded.plans[i]);
    expect(live).toEqual(recorded);
  });
});

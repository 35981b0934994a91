import { randomUUID } from 'node:crypto';
import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { provisionalCheck, type DockQuestion, type DockSnapshot } from '../../shared/dock/snapshot';
import { bearer, openTestApp, setSiteTimeZone, tokensFor } from '../support/app';
import { testStorage } from '../support/services';

// The offline dock: the registry snapshot a phone keeps, the verdict it works out from it (compared here
// with the server's for every demo drum type at every demo station), and checks sent later by key.
const NOW = new Date('2026-11-20T12:00:00Z');

let ds: DataSource;
let app: Express;
const t: Record<string, string> = {};
let snap: DockSnapshot;

beforeAll(async () => {
  ({ ds, app } = await openTestApp({ storage: testStorage(), clock: () => NOW }));
  Object.assign(t, await tokensFor(app, ['clerk', 'engineer', 'buyer']));
  await setSiteTimeZone(app, t.engineer, 'UTC');
  snap = (await request(app).get('/api/dock-snapshot').set(bearer(t.clerk)).expect(200)).body;
});

afterAll(() => ds.destroy());

/** What a verdict is made of, for comparing the phone's with the server's. */
const shapeOfFit = (r: {
  verdict: string;
  summary: string;
  candidateCount: number;
  candidates: Array<{ dipTubePartNumber: string; connectorPartNumber: string; verdict: string; installedAtStation: boolean; rules: Array<{ rule: string; outcome: string; message: string }> }>;
}) => ({
  verdict: r.verdict,
  summary: r.summary,
  candidateCount: r.candidateCount,
  candidates: r.candidates.map((c) => ({
    pair: `${c.dipTubePartNumber}+${c.connectorPartNumber}`,
    verdict: c.verdict,
    installed: c.installedAtStation,
    rules: c.rules.map((x) => `${x.rule}:${x.outcome}:${x.message}`),
  })),
});

describe('the dock snapshot', () => {
  it('holds the registry the dock needs, stamped with a revision that is its ETag; an unchanged registry answers 304', async () => {
    expect(snap.drumTypes.length).toBeGreaterThanOrEqual(4);
    expect(snap.stations.length).toBeGreaterThanOrEqual(3);
    expect(snap.pairings.every((p) => p.status !== 'retired')).toBe(true);
    expect(snap.settings.timeZone).toBe('UTC');
    const res = await request(app).get('/api/dock-snapshot').set(bearer(t.clerk)).expect(200);
    expect(res.headers.etag).toBe(`"${snap.revision}"`);
    await request(app).get('/api/dock-snapshot').set(bearer(t.clerk)).set('If-None-Match', res.headers.etag).expect(304);
  });

  it('gets a new revision when the registry changes', async () => {
    const station = snap.stations[0];
    const row = (await request(app).get(`/api/stations/${station.id}`).set(bearer(t.engineer))).body;
    await request(app)
      .patch(`/api/stations/${station.id}`)
      .set(bearer(t.engineer))
      .send({ version: row.version, flowLpm: row.flowLpm + 1 })
      .expect(200);
    const after = (await request(app).get('/api/dock-snapshot').set(bearer(t.clerk)).expect(200)).body as DockSnapshot;
    expect(after.revision).not.toBe(snap.revision);
    const again = (await request(app).get(`/api/stations/${station.id}`).set(bearer(t.engineer))).body;
    await request(app).patch(`/api/stations/${station.id}`).set(bearer(t.engineer)).send({ version: again.version, flowLpm: row.flowLpm }).expect(200);
    expect((await request(app).get('/api/dock-snapshot').set(bearer(t.clerk))).body.revision).toBe(snap.revision);
  });

  it('is for the dock: a buyer is refused', async () => {
    await request(app).get('/api/dock-snapshot').set(bearer(t.buyer)).expect(403);
  });
});

describe('the phone and the server find the same verdicts', () => {
  it('for every demo drum type at every demo station (and at none), with every demo slurry: the hardware answer', async () => {
    let compared = 0;
    for (const drum of snap.drumTypes) {
      for (const station of [null, ...snap.stations]) {
        for (const slurry of [null, ...snap.slurries]) {
          const q: DockQuestion = { drumTypeId: drum.id, ...(station ? { stationId: station.id } : {}), ...(slurry ? { slurryId: slurry.id } : {}) };
          const server = await request(app).post('/api/fit-checks').set(bearer(t.clerk)).send(q).expect(200);
          const phone = provisionalCheck(snap, q, NOW);
          expect({ drum: drum.partNumber, station: station?.name, slurry: slurry?.name, ...shapeOfFit(phone.result) }).toEqual({
            drum: drum.partNumber,
            station: station?.name,
            slurry: slurry?.name,
            ...shapeOfFit(server.body),
          });
          compared++;
        }
      }
    }
    expect(compared).toBe(snap.drumTypes.length * (snap.stations.length + 1) * (snap.slurries.length + 1));
  });

  it('for every demo drum type at every demo station, recorded at the dock: the lot decision and its sentence', async () => {
    const decisions = new Set<string>();
    let n = 0;
    for (const drum of snap.drumTypes) {
      for (const station of [null, ...snap.stations]) {
        const slurry = snap.slurries[n % snap.slurries.length];
        // Dates and indicators vary so that the acceptance rules decide some of the cases.
        const lot = [
          { expiryDate: '2027-09-30', productionDate: '2026-10-01', temperatureIndicator: 'intact' as const },
          { expiryDate: '2026-11-19', temperatureIndicator: 'intact' as const },
          { expiryDate: '2027-06-30', temperatureIndicator: 'froze' as const },
          { temperatureIndicator: 'not-fitted' as const },
        ][n % 4];
        n++;
        const q: DockQuestion = { drumTypeId: drum.id, slurryId: slurry.id, ...(station ? { stationId: station.id } : {}), ...lot };
        const phone = provisionalCheck(snap, q, NOW);
        const server = await request(app)
          .post('/api/receiving-checks')
          .set(bearer(t.clerk))
          .send({ lotNumber: `CMP-${n}`, drumCount: 1, ...q })
          .expect(201);
        expect({ case: n, decision: phone.lotVerdict.decision, sentence: phone.lotVerdict.sentence, blockers: phone.lotVerdict.blockers.map((b) => b.source) }).toEqual({
          case: n,
          decision: server.body.lotVerdict.decision,
          sentence: server.body.lotVerdict.sentence,
          blockers: server.body.lotVerdict.blockers.map((b: { source: string }) => b.source),
        });
        expect(shapeOfFit(phone.result)).toEqual(shapeOfFit(server.body.result));
        decisions.add(server.body.decision);
      }
    }
    // The comparison means something only if it covers more than one kind of decision.
    expect(decisions.size).toBeGreaterThanOrEqual(3);
  });

  it('for a drum described by hand', async () => {
    const q: DockQuestion = { drum: { insideDepthMm: 851, openings: [{ label: 'large bung', threadCode: snap.drumTypes[0].openings[0].threadCode }] }, stationId: snap.stations[0].id };
    const server = await request(app).post('/api/fit-checks').set(bearer(t.clerk)).send(q).expect(200);
    expect(shapeOfFit(provisionalCheck(snap, q, NOW).result)).toEqual(shapeOfFit(server.body));
  });
});

describe('checks sent later, by key', () => {
  const body = (clientKey: string, extra: Record<string, unknown> = {}) => ({
    clientKey,
    lotNumber: `KEY-${clientKey.slice(0, 8)}`,
    drumCount: 1,
    drumTypeId: snap.drumTypes[0].id,
    temperatureIndicator: 'intact',
    ...extra,
  });
  const count = async (key: string) => Number((await ds.query(`SELECT count(*) AS n FROM receiving_checks WHERE client_key = $1`, [key]))[0].n);

  it('records a key once: the replay answers the same check with 200', async () => {
    const key = randomUUID();
    const first = await request(app).post('/api/receiving-checks').set(bearer(t.clerk)).send(body(key)).expect(201);
    const again = await request(app).post('/api/receiving-checks').set(bearer(t.clerk)).send(body(key)).expect(200);
    expect(again.body.id).toBe(first.body.id);
    expect(await count(key)).toBe(1);
  });

  it('records a key once when two sends of it arrive at the same time', async () => {
    const key = randomUUID();
    const answers = await Promise.all([0, 1, 2].map(() => request(app).post('/api/receiving-checks').set(bearer(t.clerk)).send(body(key))));
    expect(answers.map((a) => a.status).sort()).toEqual([200, 200, 201]);
    expect(new Set(answers.map((a) => a.body.id)).size).toBe(1);
    expect(await count(key)).toBe(1);
  });

  it("refuses another person's key, naming the field", async () => {
    const key = randomUUID();
    await request(app).post('/api/receiving-checks').set(bearer(t.clerk)).send(body(key)).expect(201);
    const res = await request(app).post('/api/receiving-checks').set(bearer(t.engineer)).send(body(key)).expect(400);
    expect(res.body.error.details[0].field).toBe('clientKey');
  });

  it("tells the clerk and the engineers when the server's verdict differs from the phone's, and only then", async () => {
    const unread = async (token: string) => (await request(app).get('/api/notifications').set(bearer(token))).body.items.filter((n: { kind: string }) => n.kind === 'verdict-differs').length;
    const [clerkBefore, engineerBefore] = [await unread(t.clerk), await unread(t.engineer)];
    const q = body(randomUUID());
    const honest = provisionalCheck(snap, q as DockQuestion, NOW);
    const same = { decision: honest.lotVerdict.decision, verdict: honest.result.verdict, sentence: honest.lotVerdict.sentence, revision: snap.revision, madeAt: NOW.toISOString() };
    const recorded = await request(app)
      .post('/api/receiving-checks')
      .set(bearer(t.clerk))
      .send({ ...q, provisional: same })
      .expect(201);
    expect(recorded.body.provisional).toMatchObject({ decision: same.decision });
    expect([await unread(t.clerk), await unread(t.engineer)]).toEqual([clerkBefore, engineerBefore]);
    const other = same.decision === 'quarantine' ? 'accept' : 'quarantine';
    await request(app)
      .post('/api/receiving-checks')
      .set(bearer(t.clerk))
      .send({ ...body(randomUUID()), provisional: { ...same, decision: other } })
      .expect(201);
    expect([await unread(t.clerk), await unread(t.engineer)]).toEqual([clerkBefore + 1, engineerBefore + 1]);
  });

  it('refuses a malformed provisional verdict, naming the field', async () => {
    const res = await request(app)
      .post('/api/receiving-checks')
      .set(bearer(t.clerk))
      .send({ ...body(randomUUID()), provisional: { decision: 'maybe', verdict: 'fits', sentence: 'x', revision: 'r', madeAt: NOW.toISOString() } })
      .expect(400);
    expect(JSON.stringify(res.body.error.details)).toContain('provisional');
  });
});

import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { DEMO_REGISTRY_SUMMARY as demo } from '../../seeds/demo-registry';
import { bearer, idOf, idsOf, openTestApp, tokensFor } from '../support/app';

let ds: DataSource;
let app: Express;
const t: Record<string, string> = {};
const ids: Record<string, string> = {};

beforeAll(async () => {
  ({ ds, app } = await openTestApp());
  Object.assign(t, await tokensFor(app, ['clerk', 'engineer', 'engineer2', 'buyer', 'admin']));
  Object.assign(ids, await idsOf(app, t.clerk, 'drum-types', 'partNumber', { fittingDrum: demo.fittingDrum, foreignDrum: demo.foreignDrum }));
  Object.assign(ids, await idsOf(app, t.clerk, 'stations', 'name', { fittingStation: demo.fittingStation }));
  Object.assign(ids, await idsOf(app, t.clerk, 'slurries', 'name', { foreignSlurry: demo.foreignSlurry }));
  const suppliers = await request(app).get('/api/suppliers?region=KR').set(bearer(t.clerk));
  ids.krSupplier = suppliers.body.items[0].id;
});

afterAll(() => ds.destroy());

const notices = async (token: string) => (await request(app).get('/api/notifications').set(bearer(token))).body;

describe('dock checks', () => {
  it('records a fitting lot with its verdict, who and when', async () => {
    const res = await request(app).post('/api/receiving-checks').set(bearer(t.clerk)).send({ lotNumber: 'LR-24-1187', drumCount: 4, drumTypeId: ids.fittingDrum, stationId: ids.fittingStation });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ lotNumber: 'LR-24-1187', drumCount: 4, verdict: 'fits', status: 'checked', checkedByName: 'Noor Halvorsen', stationName: demo.fittingStation });
    expect(res.body.result.candidates[0].pairingStatus).toBe('approved');
    expect(typeof res.body.checkedAt).toBe('string');
  });

  it('a no-fit lot is put on hold by the rules when recorded: engineers and buyers are told, a warning lists what to order', async () => {
    const before = (await notices(t.buyer)).unread;
    const check = await request(app).post('/api/receiving-checks').set(bearer(t.clerk)).send({ lotNumber: 'SE-0931', drumCount: 2, drumTypeId: ids.foreignDrum, slurryId: ids.foreignSlurry });
    expect(check.body.verdict).toBe('no-fit');
    // No typed reason: the verdict's own reasons, largest first (the hardware, then the slurry's missing certificate).
    expect(check.body).toMatchObject({ status: 'on-hold', decision: 'hold', heldByRules: true, heldByName: 'Noor Halvorsen' });
    expect(check.body.lotVerdict.sentence).toMatch(/^Hold: every G 2 tube on site is too long for this drum \(the shortest by \d+ mm\); an engineer must register a tube of 793 to 813 mm\.$/);
    expect(check.body.lotVerdict.blockers.map((b: { source: string }) => b.source)).toEqual(['fit', 'certificate', 'shelf-life']);
    expect(check.body.holdReason).toMatch(/^Closest pairing, dip tube AFC-TR-G2-825 with head .*: the tube is too long and bottoms out: it is 7\.0 mm \(0\.28 in\) longer than the drum is deep/);
    const buyer = await notices(t.buyer);
    // The buyer hears of the hold and of the hardware it needs.
    expect(buyer.unread).toBe(before + 2);
    expect(
      buyer.items
        .slice(0, 2)
        .map((n: { kind: string }) => n.kind)
        .sort(),
    ).toEqual(['hardware-gap', 'lot-held']);
    expect(buyer.items.find((n: { kind: string }) => n.kind === 'lot-held')).toMatchObject({ link: `/receive/${check.body.id}` });
    expect((await notices(t.engineer)).items[0].kind).toBe('lot-held');
    // The clerk who recorded it is not notified of their own check.
    expect((await notices(t.clerk)).items.filter((n: { kind: string }) => n.kind === 'lot-held')).toHaveLength(0);
    const warnings = await request(app).get('/api/warnings?status=open').set(bearer(t.buyer));
    const w = warnings.body.items.find((x: { receivingCheckId: string }) => x.receivingCheckId === check.body.id);
    expect(w).toMatchObject({ source: 'lot', status: 'open', lotNumber: 'SE-0931' });
    expect(w.needs[0].order.length).toBeGreaterThan(0);
    // A hold by hand still needs a reason, and a held lot is not held twice.
    const noReason = await request(app).post(`/api/receiving-checks/${check.body.id}/hold`).set(bearer(t.clerk)).send({});
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.details[0].field).toBe('reason');
    const again = await request(app).post(`/api/receiving-checks/${check.body.id}/hold`).set(bearer(t.clerk)).send({ reason: 'twice' });
    expect(again.status).toBe(409);
  });

  it('a lot that fits with caution is recorded as checked and held by hand with a reason, which raises the same warning and notices', async () => {
    const before = (await notices(t.engineer)).unread;
    const cautionStation = await idOf(app, t.clerk, 'stations', 'name', demo.cautionStation);
    const drum = await idOf(app, t.clerk, 'drum-types', 'partNumber', 'HPM-C20-B56');
    const check = await request(app).post('/api/receiving-checks').set(bearer(t.clerk)).send({ lotNumber: 'CU-0402', drumCount: 1, drumTypeId: drum, stationId: cautionStation });
    expect(check.body).toMatchObject({ verdict: 'caution', decision: 'caution', status: 'checked' });
    const held = await request(app).post(`/api/receiving-checks/${check.body.id}/hold`).set(bearer(t.clerk)).send({ reason: 'Return port too small for this flow' });
    expect(held.body).toMatchObject({ status: 'on-hold', holdReason: 'Return port too small for this flow', heldByRules: false });
    expect((await notices(t.engineer)).unread).toBe(before + 1);
    const warnings = await request(app).get('/api/warnings?status=open').set(bearer(t.buyer));
    expect(warnings.body.items.some((x: { receivingCheckId: string }) => x.receivingCheckId === check.body.id)).toBe(true);
  });

  it('a fitting lot is not held; a clerk cannot release, an engineer can', async () => {
    const fits = await request(app).post('/api/receiving-checks').set(bearer(t.clerk)).send({ lotNumber: 'LR-24-1188', drumCount: 1, drumTypeId: ids.fittingDrum });
    const hold = await request(app).post(`/api/receiving-checks/${fits.body.id}/hold`).set(bearer(t.clerk)).send({ reason: 'just because' });
    expect(hold.status).toBe(400);
    const held = (await request(app).get('/api/receiving-checks?q=SE-0931').set(bearer(t.clerk))).body.items[0];
    expect(held.status).toBe('on-hold');
    expect((await request(app).post(`/api/receiving-checks/${held.id}/release`).set(bearer(t.clerk)).send({ comment: 'ok now' })).status).toBe(403);
    const released = await request(app).post(`/api/receiving-checks/${held.id}/release`).set(bearer(t.engineer)).send({ comment: 'Tubes cut to 800 mm arrived' });
    expect(released.body).toMatchObject({ status: 'released', releasedByName: 'Tomasz Ilunga' });
  });

  it('filters the history by verdict, status and lot number', async () => {
    const noFit = await request(app).get('/api/receiving-checks?verdict=no-fit').set(bearer(t.buyer));
    expect(noFit.body.items.length).toBeGreaterThan(0);
    expect(noFit.body.items.every((r: { verdict: string }) => r.verdict === 'no-fit')).toBe(true);
    const byLot = await request(app).get('/api/receiving-checks?q=1187').set(bearer(t.buyer));
    expect(byLot.body.items.map((r: { lotNumber: string }) => r.lotNumber)).toEqual(['LR-24-1187']);
    const bad = await request(app).get('/api/receiving-checks?verdict=maybe').set(bearer(t.buyer));
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0].field).toBe('verdict');
  });

  it('refuses a buyer (403) and bad input (400 naming the field)', async () => {
    expect((await request(app).post('/api/receiving-checks').set(bearer(t.buyer)).send({ lotNumber: 'X', drumCount: 1, drumTypeId: ids.fittingDrum })).status).toBe(403);
    const zero = await request(app).post('/api/receiving-checks').set(bearer(t.clerk)).send({ lotNumber: 'X-1', drumCount: 0, drumTypeId: ids.fittingDrum });
    expect(zero.body.error.details[0].field).toBe('drumCount');
    const both = await request(app).post('/api/receiving-checks').set(bearer(t.clerk)).send({ lotNumber: 'X-1', drumCount: 1 });
    expect(both.body.error.details[0].field).toBe('drumTypeId');
  });
});

describe('sourcing plans and warnings', () => {
  it('a buyer plans slurry from a new region: the impact lists each station, whether it fits and what to order; a warning opens', async () => {
    const stations = await request(app).get('/api/stations').set(bearer(t.buyer));
    const res = await request(app)
      .post('/api/sourcing-plans')
      .set(bearer(t.buyer))
      .send({ slurryName: 'Seoripul STI-Select 3', supplierId: ids.krSupplier, drumTypeId: ids.foreignDrum, startDate: '2027-02-01', drumsPerMonth: 12 });
    expect(res.status).toBe(201);
    expect(res.body.region).toBe('KR');
    expect(res.body.impact.stations).toHaveLength(stations.body.total);
    for (const s of res.body.impact.stations) {
      expect(['fits', 'caution', 'no-fit']).toContain(s.verdict);
      expect(typeof s.summary).toBe('string');
    }
    const lacking = res.body.impact.stations.filter((s: { verdict: string }) => s.verdict !== 'fits');
    expect(lacking.length).toBeGreaterThan(0);
    // Three sets per drum position: a tube line orders up to 3 per station.
    const tubeLines = res.body.impact.order.filter((o: { kind: string }) => o.kind === 'dip-tube' || o.kind === 'spec');
    expect(tubeLines.length).toBeGreaterThan(0);
    for (const line of res.body.impact.order) expect(line.count).toBeGreaterThan(0);
    expect(res.body.warnings).toHaveLength(1);
    expect(res.body.warnings[0].status).toBe('open');
    const buyer = await notices(t.buyer);
    expect(buyer.items[0]).toMatchObject({ kind: 'hardware-gap', link: `/sourcing/${res.body.id}` });
  });

  it('a plan for the drum the site is built for fits; a warning opens only when something must be ordered', async () => {
    const suppliers = await request(app).get('/api/suppliers?region=NA').set(bearer(t.buyer));
    const fitting = await request(app)
      .get(`/api/stations?q=${encodeURIComponent(demo.fittingStation)}`)
      .set(bearer(t.buyer));
    const res = await request(app)
      .post('/api/sourcing-plans')
      .set(bearer(t.buyer))
      .send({
        slurryName: 'Second source oxide',
        supplierId: suppliers.body.items[0].id,
        drumTypeId: ids.fittingDrum,
        startDate: '2027-03-01',
        drumsPerMonth: 6,
        stationIds: [fitting.body.items[0].id],
      });
    expect(res.status).toBe(201);
    expect(res.body.impact.stations[0].verdict).toBe('fits');
    expect(res.body.impact.order.every((o: { kind: string }) => o.kind === 'dip-tube' || o.kind === 'connector')).toBe(true);
    expect(res.body.warnings).toHaveLength(res.body.impact.order.length ? 1 : 0);
  });

  it('warnings move open -> acknowledged -> resolved; a clerk cannot plan or acknowledge', async () => {
    const open = await request(app).get('/api/warnings?status=open').set(bearer(t.buyer));
    const id = open.body.items[0].id;
    expect((await request(app).post(`/api/warnings/${id}/acknowledge`).set(bearer(t.clerk))).status).toBe(403);
    const ack = await request(app).post(`/api/warnings/${id}/acknowledge`).set(bearer(t.buyer));
    expect(ack.body).toMatchObject({ status: 'acknowledged', acknowledgedByName: 'Priya Castellanos' });
    const resolved = await request(app).post(`/api/warnings/${id}/resolve`).set(bearer(t.buyer));
    expect(resolved.body.status).toBe('resolved');
    expect((await request(app).post(`/api/warnings/${id}/resolve`).set(bearer(t.buyer))).status).toBe(409);
    expect((await request(app).post('/api/sourcing-plans').set(bearer(t.clerk)).send({})).status).toBe(403);
    const bad = await request(app)
      .post('/api/sourcing-plans')
      .set(bearer(t.buyer))
      .send({ slurryName: 'x', supplierId: ids.krSupplier, drumTypeId: ids.foreignDrum, startDate: 'next week', drumsPerMonth: 2 });
    expect(bad.body.error.details[0].field).toBe('startDate');
  });
});

describe('station rotation', () => {
  type Board = {
    tubeSets: Array<{ id: string; label: string; state: string; version: number; rinse: { outcome: string } }>;
    changeOuts: Array<{ tubeSetLabel: string; lotNumber: string; connectorPartNumber: string }>;
    rinses: Array<{ tubeSetLabel: string; byName: string }>;
  };
  const board = async (): Promise<Board> => (await request(app).get(`/api/stations/${ids.fittingStation}/board`).set(bearer(t.clerk))).body;
  const set = (b: Board, state: string) => b.tubeSets.find((s) => s.state === state)!;

  it('a dirty set is refused; rinsed, it goes into the standby drum; a change-out records lot, set and head; the lot shows them', async () => {
    const lot = await request(app).post('/api/receiving-checks').set(bearer(t.clerk)).send({ lotNumber: 'LR-24-1200', drumCount: 1, drumTypeId: ids.fittingDrum, stationId: ids.fittingStation });
    let b = await board();
    const cleaning = set(b, 'cleaning');
    expect(cleaning.rinse.outcome).toBe('fail');
    // Straight from cleaning into a drum: refused.
    const early = await request(app).post(`/api/tube-sets/${cleaning.id}/standby`).set(bearer(t.clerk)).send({ version: cleaning.version, receivingCheckId: lot.body.id });
    expect(early.status).toBe(409);
    // A state change through the registry is refused too.
    const patched = await request(app).patch(`/api/tube-sets/${cleaning.id}`).set(bearer(t.engineer)).send({ version: cleaning.version, state: 'ready' });
    expect(patched.status).toBe(400);
    expect(patched.body.error.details[0].field).toBe('state');

    expect((await request(app).post(`/api/tube-sets/${cleaning.id}/rinse`).set(bearer(t.clerk)).send({ note: 'DI water, 3 flushes' })).status).toBe(204);
    b = await board();
    const ready = b.tubeSets.find((s) => s.id === cleaning.id)!;
    expect(ready.state).toBe('ready');
    expect(ready.rinse.outcome).toBe('pass');
    expect(b.rinses[0]).toMatchObject({ tubeSetLabel: cleaning.label, byName: 'Noor Halvorsen' });

    // The standby drum is taken: change out first.
    const busy = await request(app).post(`/api/tube-sets/${ready.id}/standby`).set(bearer(t.clerk)).send({ version: ready.version, receivingCheckId: lot.body.id });
    expect(busy.status).toBe(409);
    const oldOnline = set(b, 'online');
    const oldStandby = set(b, 'standby');
    expect((await request(app).post(`/api/stations/${ids.fittingStation}/change-out`).set(bearer(t.clerk))).status).toBe(204);
    b = await board();
    expect(b.tubeSets.find((s) => s.id === oldOnline.id)!.state).toBe('cleaning');
    expect(b.tubeSets.find((s) => s.id === oldStandby.id)!.state).toBe('online');

    const standby = await request(app).post(`/api/tube-sets/${ready.id}/standby`).set(bearer(t.clerk)).send({ version: ready.version, receivingCheckId: lot.body.id, drumSerial: 'D-7731' });
    expect(standby.status).toBe(204);
    expect((await request(app).post(`/api/stations/${ids.fittingStation}/change-out`).set(bearer(t.clerk))).status).toBe(204);
    b = await board();
    expect(b.changeOuts[0]).toMatchObject({ tubeSetLabel: ready.label, lotNumber: 'LR-24-1200' });
    expect(b.changeOuts[0].connectorPartNumber).toBe(demo.fittingHead);

    const history = await request(app).get(`/api/receiving-checks/${lot.body.id}`).set(bearer(t.engineer));
    expect(history.body.changeOuts).toEqual([expect.objectContaining({ stationName: demo.fittingStation, tubeSetLabel: ready.label, connectorPartNumber: demo.fittingHead, drumSerial: 'D-7731' })]);
  });

  it('a buyer cannot rotate sets (403)', async () => {
    const b = await board();
    expect((await request(app).post(`/api/tube-sets/${b.tubeSets[0].id}/rinse`).set(bearer(t.buyer)).send({})).status).toBe(403);
  });
});

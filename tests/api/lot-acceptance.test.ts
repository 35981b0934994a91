import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { DEMO_REGISTRY_SUMMARY as demo } from '../../seeds/demo-registry';
import { bearer, idsOf, makeTestApp, openTestApp, setSiteTimeZone, tokensFor } from '../support/app';
import { testStorage } from '../support/services';

// Lot acceptance through POST /api/receiving-checks, on a fixed clock: the site's date is 20 Nov 2026 (UTC).
const NOW = new Date('2026-11-20T12:00:00Z');
const PDF = Buffer.from('%PDF-1.4\n1 0 obj<<>>endobj\ntrailer<<>>\n%%EOF\n', 'latin1');

let ds: DataSource;
let app: Express;
const t: Record<string, string> = {};
const ids: Record<string, string> = {};

beforeAll(async () => {
  ({ ds, app } = await openTestApp({ storage: testStorage(), clock: () => NOW }));
  Object.assign(t, await tokensFor(app, ['clerk', 'engineer', 'buyer']));
  await setSiteTimeZone(app, t.engineer, 'UTC');
  Object.assign(ids, await idsOf(app, t.clerk, 'drum-types', 'partNumber', { fittingDrum: demo.fittingDrum, twinDrum: demo.twinBungDrum }));
  Object.assign(ids, await idsOf(app, t.clerk, 'stations', 'name', { fittingStation: demo.fittingStation, twoOpeningStation: demo.twoOpeningStation }));
  Object.assign(ids, await idsOf(app, t.clerk, 'slurries', 'name', { oxide: demo.shelfLifeSlurry, tungsten: demo.certificateSlurry }));
});

afterAll(() => ds.destroy());

const check = (body: Record<string, unknown>, token = t.clerk) =>
  request(app)
    .post('/api/receiving-checks')
    .set(bearer(token))
    .send({ drumCount: 2, drumTypeId: ids.fittingDrum, stationId: ids.fittingStation, slurryId: ids.oxide, temperatureIndicator: 'intact', ...body });
const notices = async (token: string) => (await request(app).get('/api/notifications').set(bearer(token))).body;
const ruleOf = (body: { lotVerdict: { acceptance: { rules: Array<{ rule: string }> } } }, rule: string) => body.lotVerdict.acceptance.rules.find((r) => r.rule === rule);

describe('lot acceptance at the dock', () => {
  it('a good lot that fits is recorded as checked, with its dates and the sentence naming what to use', async () => {
    const res = await check({ lotNumber: 'OX-GOOD-1', expiryDate: '2027-09-30', productionDate: '2026-10-01' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      status: 'checked',
      decision: 'accept',
      verdict: 'fits',
      productionDate: '2026-10-01',
      expiryDate: '2027-09-30',
      temperatureIndicator: 'intact',
      heldByRules: false,
    });
    expect(res.body.lotVerdict.sentence).toBe(`Use dip tube ${demo.fittingTube} with head ${demo.fittingHead} at ${demo.fittingStation}.`);
    expect(ruleOf(res.body, 'shelf-life')).toMatchObject({ outcome: 'pass', numbers: { remainingDays: 314, minRemainingDays: 90 } });
  });

  it('an expired lot is put on hold at once with the rule reason: warning and notices as for a hold by hand; only an engineer releases it', async () => {
    const before = (await notices(t.engineer)).unread;
    const res = await check({ lotNumber: 'OX-EXPIRED-1', expiryDate: '2026-11-19' });
    expect(res.body).toMatchObject({ status: 'on-hold', decision: 'hold', heldByRules: true, heldByName: 'Noor Halvorsen' });
    expect(res.body.lotVerdict.sentence).toBe('Hold: the lot expired on 19 Nov 2026; an engineer must decide.');
    expect(res.body.holdReason).toMatch(/expired on 19 Nov 2026/);
    expect(res.body.lotVerdict.blockers[0]).toMatchObject({ source: 'shelf-life', severity: 'hold', releasedBy: ['engineer', 'admin'] });
    const eng = await notices(t.engineer);
    expect(eng.unread).toBe(before + 1);
    expect(eng.items[0]).toMatchObject({ kind: 'lot-held', link: `/receive/${res.body.id}` });
    const warnings = await request(app).get('/api/warnings?status=open').set(bearer(t.buyer));
    expect(warnings.body.items.find((w: { receivingCheckId: string }) => w.receivingCheckId === res.body.id)).toMatchObject({ source: 'lot', lotNumber: 'OX-EXPIRED-1' });
    // Already held: a hold by hand is refused; a clerk cannot release; an engineer can, with a comment.
    expect((await request(app).post(`/api/receiving-checks/${res.body.id}/hold`).set(bearer(t.clerk)).send({ reason: 'held twice' })).status).toBe(409);
    expect((await request(app).post(`/api/receiving-checks/${res.body.id}/release`).set(bearer(t.clerk)).send({ comment: 'looks fine' })).status).toBe(403);
    const released = await request(app).post(`/api/receiving-checks/${res.body.id}/release`).set(bearer(t.engineer)).send({ comment: 'Supplier extended the expiry in writing' });
    expect(released.body).toMatchObject({ status: 'released', releasedByName: 'Tomasz Ilunga' });
  });

  it('expiry from production date + shelf life: 276 days old with a 365-day life leaves 89 days, below the 90 needed', async () => {
    const res = await check({ lotNumber: 'OX-SHORT-1', productionDate: '2026-02-17' });
    expect(res.body).toMatchObject({ status: 'on-hold', decision: 'hold' });
    expect(ruleOf(res.body, 'shelf-life')).toMatchObject({ outcome: 'fail', numbers: { remainingDays: 89, shelfLifeDays: 365 } });
    const enough = await check({ lotNumber: 'OX-SHORT-2', productionDate: '2026-02-18' });
    expect(enough.body).toMatchObject({ status: 'checked', decision: 'accept' });
  });

  it('a lot that froze is quarantined; an engineer releases a quarantine with a comment too', async () => {
    const res = await check({ lotNumber: 'OX-FROZE-1', expiryDate: '2027-09-30', temperatureIndicator: 'froze' });
    expect(res.body).toMatchObject({ status: 'quarantined', decision: 'quarantine', heldByRules: true });
    expect(res.body.lotVerdict.sentence).toBe('Quarantine: the temperature indicator shows the lot froze; an engineer must decide.');
    expect((await notices(t.buyer)).items[0]).toMatchObject({ kind: 'lot-held', title: expect.stringMatching(/in quarantine/) });
    const list = await request(app).get('/api/receiving-checks?status=quarantined').set(bearer(t.buyer));
    expect(list.body.items.map((r: { lotNumber: string }) => r.lotNumber)).toEqual(['OX-FROZE-1']);
    expect(list.body.items[0].lotVerdict).toEqual({ decision: 'quarantine', sentence: res.body.lotVerdict.sentence });
    expect((await request(app).post(`/api/receiving-checks/${res.body.id}/release`).set(bearer(t.engineer)).send({})).body.error.details[0].field).toBe('comment');
    const released = await request(app).post(`/api/receiving-checks/${res.body.id}/release`).set(bearer(t.engineer)).send({ comment: 'Drums thawed were not used; lab test passed' });
    expect(released.body.status).toBe('released');
  });

  it('a tripped indicator holds the lot for an engineer', async () => {
    const res = await check({ lotNumber: 'OX-TRIP-1', expiryDate: '2027-09-30', temperatureIndicator: 'tripped' });
    expect(res.body).toMatchObject({ status: 'on-hold', decision: 'hold' });
    expect(res.body.lotVerdict.sentence).toBe('Hold: the temperature indicator tripped; an engineer must decide.');
    expect(ruleOf(res.body, 'temperature')).toMatchObject({ message: expect.stringContaining('5 to 35 °C') });
  });

  it('a missing certificate holds the lot; attaching it as the certificate lifts the hold and settles the warning', async () => {
    const res = await check({ lotNumber: 'W-CERT-1', drumTypeId: ids.twinDrum, stationId: ids.twoOpeningStation, slurryId: ids.tungsten, expiryDate: '2027-03-31' });
    expect(res.body).toMatchObject({ status: 'on-hold', decision: 'hold', verdict: 'fits' });
    expect(res.body.lotVerdict.sentence).toBe('Hold until the certificate of analysis is attached: this slurry needs it at the dock.');
    expect(res.body.lotVerdict.blockers[0]).toMatchObject({ source: 'certificate', release: 'certificate', releasedBy: ['clerk', 'engineer', 'admin'] });
    // A plain file is not the certificate: the hold stays.
    const attach = (purpose?: string) => {
      const req = request(app).post('/api/attachments').set(bearer(t.clerk)).field('ownerKind', 'receiving-check').field('ownerId', res.body.id);
      return (purpose ? req.field('purpose', purpose) : req).attach('file', PDF, 'coa.pdf');
    };
    expect((await attach()).body.purpose).toBe('file');
    expect((await request(app).get(`/api/receiving-checks/${res.body.id}`).set(bearer(t.clerk))).body.status).toBe('on-hold');
    expect((await attach('maybe')).body.error.details[0].field).toBe('purpose');
    const cert = await attach('certificate');
    expect(cert.status).toBe(201);
    expect(cert.body.purpose).toBe('certificate');
    const after = await request(app).get(`/api/receiving-checks/${res.body.id}`).set(bearer(t.clerk));
    expect(after.body).toMatchObject({ status: 'released', decision: 'accept', releasedByName: 'Noor Halvorsen' });
    expect(after.body.releaseComment).toMatch(/certificate of analysis was attached/);
    expect(ruleOf(after.body, 'certificate')).toMatchObject({ outcome: 'pass' });
    const warnings = await request(app).get('/api/warnings?status=resolved').set(bearer(t.buyer));
    expect(warnings.body.items.some((w: { receivingCheckId: string }) => w.receivingCheckId === res.body.id)).toBe(true);
  });

  it('attaching the certificate does not lift a hold that another rule makes', async () => {
    const res = await check({ lotNumber: 'W-CERT-2', drumTypeId: ids.twinDrum, stationId: ids.twoOpeningStation, slurryId: ids.tungsten, expiryDate: '2026-11-10' });
    expect(res.body.lotVerdict.blockers.map((b: { source: string }) => b.source)).toEqual(['shelf-life', 'certificate']);
    await request(app)
      .post('/api/attachments')
      .set(bearer(t.clerk))
      .field('ownerKind', 'receiving-check')
      .field('ownerId', res.body.id)
      .field('purpose', 'certificate')
      .attach('file', PDF, 'coa.pdf')
      .expect(201);
    const after = await request(app).get(`/api/receiving-checks/${res.body.id}`).set(bearer(t.clerk));
    expect(after.body).toMatchObject({ status: 'on-hold', decision: 'hold' });
    expect(after.body.lotVerdict.blockers.map((b: { source: string }) => b.source)).toEqual(['shelf-life']);
  });

  it('a certificate is for a receiving check only', async () => {
    const res = await request(app)
      .post('/api/attachments')
      .set(bearer(t.engineer))
      .field('ownerKind', 'drum-type')
      .field('ownerId', ids.fittingDrum)
      .field('purpose', 'certificate')
      .attach('file', PDF, 'coa.pdf');
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].field).toBe('purpose');
  });

  it('a caution lot (no dates for a slurry with a shelf life) is recorded as checked; the clerk may still hold it by hand', async () => {
    const res = await check({ lotNumber: 'OX-NODATE-1' });
    expect(res.body).toMatchObject({ status: 'checked', decision: 'caution' });
    expect(res.body.lotVerdict.sentence).toMatch(/^Caution: use dip tube .* but the lot's remaining life is unknown/);
    const held = await request(app).post(`/api/receiving-checks/${res.body.id}/hold`).set(bearer(t.clerk)).send({ reason: 'Label torn; waiting for the supplier' });
    expect(held.body).toMatchObject({ status: 'on-hold', heldByRules: false });
  });

  it('refuses dates that cannot be meant and an unknown indicator, naming the field', async () => {
    const cases: Array<[Record<string, unknown>, string]> = [
      [{ productionDate: '2026-11-21' }, 'productionDate'],
      [{ productionDate: '2026-10-01', expiryDate: '2026-09-01' }, 'expiryDate'],
      [{ expiryDate: '2026-02-30' }, 'expiryDate'],
      [{ expiryDate: '30/11/2026' }, 'expiryDate'],
      [{ temperatureIndicator: 'warm' }, 'temperatureIndicator'],
    ];
    for (const [body, field] of cases) {
      const res = await check({ lotNumber: 'BAD-1', ...body });
      expect(res.status).toBe(400);
      expect(res.body.error.details.map((d: { field: string }) => d.field)).toContain(field);
    }
    expect((await request(app).get('/api/receiving-checks?q=BAD-1').set(bearer(t.clerk))).body.total).toBe(0);
  });

  it("today is the site's local date: late on 20 Nov UTC it is already 21 Nov in Tokyo, so a lot expiring on the 20th has expired", async () => {
    const late = makeTestApp(ds, { clock: () => new Date('2026-11-20T23:30:00Z') });
    const settings = await request(late).get('/api/settings').set(bearer(t.engineer));
    await request(late).patch('/api/settings').set(bearer(t.engineer)).send({ version: settings.body.version, timeZone: 'Asia/Tokyo' }).expect(200);
    const bad = await request(late)
      .patch('/api/settings')
      .set(bearer(t.engineer))
      .send({ version: settings.body.version + 1, timeZone: 'Mars/Olympus' });
    expect(bad.body.error.details[0].field).toBe('timeZone');
    const res = await request(late)
      .post('/api/receiving-checks')
      .set(bearer(t.clerk))
      .send({ lotNumber: 'TZ-1', drumCount: 1, drumTypeId: ids.fittingDrum, expiryDate: '2026-11-20', temperatureIndicator: 'intact' });
    expect(res.body).toMatchObject({ status: 'on-hold', decision: 'hold' });
    expect(res.body.lotVerdict.today).toBe('2026-11-21');
  });
});

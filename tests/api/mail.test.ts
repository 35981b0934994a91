import nodemailer from 'nodemailer';
import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { DEMO_REGISTRY_SUMMARY as demo } from '../../seeds/demo-registry';
import { OutboxMessage } from '../../server/entities';
import { MailSender } from '../../server/mail/sender';
import { bearer, makeTestApp, tokenFor } from '../support/app';
import { openTestDataSource, resetDatabase } from '../support/db';
import { clearInbox, inbox, smtpUrl } from '../support/services';

let ds: DataSource;
let app: Express;
const t: Record<string, string> = {};

beforeAll(async () => {
  ds = await openTestDataSource();
  await resetDatabase(ds);
  app = makeTestApp(ds);
  for (const role of ['clerk', 'engineer', 'engineer2', 'buyer']) t[role] = await tokenFor(app, `${role}@bungwise.example`);
  await clearInbox();
});

afterAll(async () => {
  await ds.destroy();
});

async function holdForeignLot(lotNumber: string) {
  const drums = await request(app).get(`/api/drum-types?q=${demo.foreignDrum}`).set(bearer(t.clerk));
  const check = await request(app).post('/api/receiving-checks').set(bearer(t.clerk)).send({ lotNumber, drumCount: 2, drumTypeId: drums.body.items[0].id });
  // Nothing fits this drum: the check itself puts the lot on hold, with the same notices as a hold by hand.
  expect(check.body.status).toBe('on-hold');
  return check.body.id as string;
}

describe('e-mail through the outbox', () => {
  it('a held lot mails the engineers and the buyers, in text and HTML with a link back, through the relay', async () => {
    const id = await holdForeignLot('ML-001');
    const queued = await ds.getRepository(OutboxMessage).find({ where: { status: 'pending' } });
    expect(queued.map((q) => q.toEmail).sort()).toEqual(expect.arrayContaining(['buyer@bungwise.example', 'engineer2@bungwise.example', 'engineer@bungwise.example']));
    const sender = new MailSender(ds, nodemailer.createTransport(smtpUrl()));
    expect(await sender.flush()).toBe(queued.length);
    const mail = await inbox(queued.length);
    const toEngineer = mail.find((m) => m.to[0].address === 'engineer@bungwise.example' && /on hold/.test(m.subject))!;
    expect(toEngineer).toBeDefined();
    expect(toEngineer.text).toContain('Lot ML-001');
    expect(toEngineer.text).toContain(`/receive/${id}`);
    expect(toEngineer.html).toContain(`/receive/${id}`);
    const toBuyer = mail.filter((m) => m.to[0].address === 'buyer@bungwise.example').map((m) => m.subject);
    expect(toBuyer.some((s) => /Hardware needed/.test(s))).toBe(true);
    // Nobody mails the clerk about their own hold.
    expect(mail.some((m) => m.to[0].address === 'clerk@bungwise.example')).toBe(false);
  });

  it('keeps mail in the outbox while the relay is down, then sends it when it is back', async () => {
    await clearInbox();
    await holdForeignLot('ML-002');
    const down = new MailSender(ds, nodemailer.createTransport({ host: '127.0.0.1', port: 9, connectionTimeout: 1000 }), { baseDelayMs: 1 });
    expect(await down.flush()).toBe(0);
    const waiting = await ds.getRepository(OutboxMessage).find({ where: { status: 'pending' } });
    expect(waiting.length).toBeGreaterThan(0);
    for (const w of waiting) {
      expect(w.attempts).toBe(1);
      expect(w.lastError).toBeTruthy();
    }
    await new Promise((r) => setTimeout(r, 20));
    const up = new MailSender(ds, nodemailer.createTransport(smtpUrl()));
    expect(await up.flush()).toBe(waiting.length);
    expect(await ds.getRepository(OutboxMessage).count({ where: { status: 'pending' } })).toBe(0);
    expect((await inbox(waiting.length)).some((m) => /ML-002/.test(m.text))).toBe(true);
  });

  it('a pairing awaiting review mails the other engineers; its approval mails the author; each kind can be turned off', async () => {
    await clearInbox();
    const off = await request(app)
      .patch('/api/me')
      .set(bearer(t.engineer2))
      .send({ mailOff: ['pairing-review'] });
    expect(off.body.user.mailOff).toEqual(['pairing-review']);
    const bad = await request(app)
      .patch('/api/me')
      .set(bearer(t.engineer2))
      .send({ mailOff: ['everything'] });
    expect(bad.body.error.details[0].field).toBe('mailOff');
    const tubes = await request(app).get('/api/dip-tubes?pageSize=100').set(bearer(t.engineer));
    const heads = await request(app).get('/api/connectors?pageSize=100').set(bearer(t.engineer));
    const pairings = await request(app).get('/api/pairings?pageSize=200').set(bearer(t.engineer));
    const taken = new Set(pairings.body.items.map((p: { dipTubeId: string; connectorId: string }) => `${p.dipTubeId}/${p.connectorId}`));
    let pair: { dipTubeId: string; connectorId: string } | undefined;
    for (const tube of tubes.body.items) for (const head of heads.body.items) if (!pair && !taken.has(`${tube.id}/${head.id}`)) pair = { dipTubeId: tube.id, connectorId: head.id };
    const created = await request(app).post('/api/pairings').set(bearer(t.engineer)).send(pair);
    expect(created.status).toBe(201);
    const approved = await request(app).post(`/api/pairings/${created.body.id}/approve`).set(bearer(t.engineer2)).send({ comment: 'Checked at bay 4' });
    expect(approved.status).toBe(200);
    const sent = await new MailSender(ds, nodemailer.createTransport(smtpUrl())).flush();
    const mail = await inbox(sent);
    // engineer2 turned review mail off: still notified in the app, not by mail.
    expect(mail.some((m) => m.to[0].address === 'engineer2@bungwise.example')).toBe(false);
    const notices = await request(app).get('/api/notifications').set(bearer(t.engineer2));
    expect(notices.body.items.some((n: { kind: string }) => n.kind === 'pairing-review')).toBe(true);
    const decision = mail.find((m) => m.to[0].address === 'engineer@bungwise.example')!;
    expect(decision.subject).toMatch(/approved/);
    expect(decision.text).toContain('Checked at bay 4');
    expect(decision.text).toContain(`/registry/pairings/${created.body.id}`);
  });
});

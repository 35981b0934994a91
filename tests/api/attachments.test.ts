import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { bearer, makeTestApp, tokenFor } from '../support/app';
import { openTestDataSource, resetDatabase } from '../support/db';
import { testStorage, unreachableStorage } from '../support/services';

let ds: DataSource;
let app: Express;
const t: Record<string, string> = {};
let drumTypeId: string;

// The smallest well-formed PDF header and a PNG signature: the type is read from these bytes.
const PDF = Buffer.from('%PDF-1.4\n1 0 obj<<>>endobj\ntrailer<<>>\n%%EOF\n', 'latin1');
const PNG = Buffer.concat([Buffer.from('89504e470d0a1a0a0000000d494844520000000100000001080600000000', 'hex'), Buffer.alloc(40, 0)]);

beforeAll(async () => {
  ds = await openTestDataSource();
  await resetDatabase(ds);
  app = makeTestApp(ds, { storage: testStorage() });
  for (const role of ['clerk', 'engineer', 'buyer', 'admin']) t[role] = await tokenFor(app, `${role}@bungwise.example`);
  drumTypeId = (await request(app).get('/api/drum-types').set(bearer(t.clerk))).body.items[0].id;
});

afterAll(async () => {
  await ds.destroy();
});

const attach = (token: string, ownerKind: string, ownerId: string, bytes: Buffer, name: string, a: Express = app) =>
  request(a).post('/api/attachments').set(bearer(token)).field('ownerKind', ownerKind).field('ownerId', ownerId).attach('file', bytes, name);

describe('attachments through the S3 stand-in', () => {
  it('an engineer attaches a spec sheet to a drum type; everyone signed in reads it back byte for byte', async () => {
    const res = await attach(t.engineer, 'drum-type', drumTypeId, PDF, 'spec-sheet.pdf');
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ contentType: 'application/pdf', sizeBytes: PDF.length, fileName: 'spec-sheet.pdf' });
    const list = await request(app).get(`/api/attachments?ownerKind=drum-type&ownerId=${drumTypeId}`).set(bearer(t.buyer));
    expect(list.body.items.map((a: { id: string }) => a.id)).toContain(res.body.id);
    const content = await request(app)
      .get(`/api/attachments/${res.body.id}/content`)
      .set(bearer(t.clerk))
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(content.status).toBe(200);
    expect(Buffer.compare(content.body as Buffer, PDF)).toBe(0);
    // A short-lived signed link serves the same bytes from the store.
    const url = await request(app).get(`/api/attachments/${res.body.id}/url`).set(bearer(t.clerk));
    expect(url.body.expiresInSeconds).toBeLessThanOrEqual(300);
    const direct = await fetch(url.body.url);
    expect(Buffer.compare(Buffer.from(await direct.arrayBuffer()), PDF)).toBe(0);
    // Without a token: refused.
    expect((await request(app).get(`/api/attachments/${res.body.id}/content`)).status).toBe(401);
  });

  it('a buyer cannot attach to a drum type (403); a clerk can attach a photo to a receiving check', async () => {
    expect((await attach(t.buyer, 'drum-type', drumTypeId, PDF, 'x.pdf')).status).toBe(403);
    const check = await request(app).post('/api/receiving-checks').set(bearer(t.clerk)).send({ lotNumber: 'PH-1', drumCount: 1, drumTypeId });
    const photo = await attach(t.clerk, 'receiving-check', check.body.id, PNG, 'bung.png');
    expect(photo.status).toBe(201);
    expect(photo.body.contentType).toBe('image/png');
  });

  it('checks the type on the bytes, not the name, and refuses oversized files', async () => {
    const fake = await attach(t.engineer, 'drum-type', drumTypeId, Buffer.from('just text, named like a PDF'), 'sheet.pdf');
    expect(fake.status).toBe(415);
    expect(fake.body.error.details[0].field).toBe('file');
    const big = Buffer.concat([PDF, Buffer.alloc(11 * 1024 * 1024, 0x20)]);
    const tooBig = await attach(t.engineer, 'drum-type', drumTypeId, big, 'big.pdf');
    expect(tooBig.status).toBe(413);
    const unknownOwner = await attach(t.engineer, 'drum-type', '00000000-0000-4000-8000-000000000000', PDF, 'x.pdf');
    expect(unknownOwner.body.error.details[0].field).toBe('ownerId');
    const kind = await attach(t.engineer, 'pump', drumTypeId, PDF, 'x.pdf');
    expect(kind.body.error.details[0].field).toBe('ownerKind');
  });
});

describe('who reads which files', () => {
  it("an import's files follow the import's own policy: engineers and admins read them, a clerk and a buyer get 403", async () => {
    const supplier = (await request(app).get('/api/suppliers').set(bearer(t.clerk))).body.items[0].name;
    const sheet = `supplier,part_number,thread,length_mm,bore_mm,od_mm,material,key,channels\n${supplier},ATT-IMP-1,NPS-2,836,19,25.4,PFA,,feed\n`;
    const run = await request(app).post('/api/imports').set(bearer(t.engineer)).field('kind', 'dip-tubes').field('dryRun', 'true').attach('file', Buffer.from(sheet), 'sheet.csv');
    expect(run.status).toBe(200);
    const id = run.body.attachmentId as string;
    const routes = [`/api/attachments?ownerKind=import&ownerId=${run.body.id}`, `/api/attachments/${id}/content`, `/api/attachments/${id}/url`];
    for (const route of routes) {
      for (const role of ['clerk', 'buyer']) {
        const res = await request(app).get(route).set(bearer(t[role]));
        expect([route, role, res.status]).toEqual([route, role, 403]);
        expect(res.body.error.message).toMatch(/engineer or admin/);
      }
      for (const role of ['engineer', 'admin']) expect([route, role, (await request(app).get(route).set(bearer(t[role]))).status]).toEqual([route, role, 200]);
    }
  });

  it("a receiving check's photos and a drum type's sheets are read by everyone signed in", async () => {
    const check = await request(app).post('/api/receiving-checks').set(bearer(t.clerk)).send({ lotNumber: 'PH-2', drumCount: 1, drumTypeId });
    const photo = await attach(t.clerk, 'receiving-check', check.body.id, PNG, 'label.png');
    const sheet = await attach(t.engineer, 'drum-type', drumTypeId, PDF, 'sheet.pdf');
    for (const role of ['clerk', 'buyer', 'engineer', 'admin']) {
      expect((await request(app).get(`/api/attachments?ownerKind=receiving-check&ownerId=${check.body.id}`).set(bearer(t[role]))).status).toBe(200);
      expect((await request(app).get(`/api/attachments/${photo.body.id}/content`).set(bearer(t[role]))).status).toBe(200);
      expect((await request(app).get(`/api/attachments/${sheet.body.id}/url`).set(bearer(t[role]))).status).toBe(200);
    }
  });
});

describe('file names and outages', () => {
  it('keeps a non-ASCII file name as sent and serves it back in Content-Disposition (RFC 6266, filename*=UTF-8)', async () => {
    const name = 'Ünïcødé-東京.png';
    const res = await attach(t.engineer, 'drum-type', drumTypeId, PNG, name);
    expect(res.status).toBe(201);
    expect(res.body.fileName).toBe(name);
    const list = await request(app).get(`/api/attachments?ownerKind=drum-type&ownerId=${drumTypeId}`).set(bearer(t.clerk));
    expect(list.body.items.map((a: { fileName: string }) => a.fileName)).toContain(name);
    const content = await request(app).get(`/api/attachments/${res.body.id}/content`).set(bearer(t.clerk));
    const disposition = content.headers['content-disposition'];
    expect(disposition).toContain(`filename*=UTF-8''${encodeURIComponent(name)}`);
    // An ASCII fallback for clients that do not read filename*.
    expect(disposition).toMatch(/^attachment; filename="?[\x20-\x7e]+"?;/);
    // The signed link names the file the same way.
    const url = await request(app).get(`/api/attachments/${res.body.id}/url`).set(bearer(t.clerk));
    expect((await fetch(url.body.url)).headers.get('content-disposition')).toContain(`filename*=UTF-8''${encodeURIComponent(name)}`);
  });

  it('an object-store outage answers 503 naming file storage (not the database), and keeps no row', async () => {
    const down = makeTestApp(ds, { storage: await unreachableStorage() });
    const rows = async () => Number((await ds.query(`SELECT count(*) AS n FROM attachments`))[0].n);
    const before = await rows();
    const res = await attach(t.engineer, 'drum-type', drumTypeId, PDF, 'outage.pdf', down);
    expect(res.status).toBe(503);
    expect(res.body.error).toMatchObject({ code: 'storage_unavailable', message: expect.stringMatching(/file storage/i) });
    expect(await rows()).toBe(before);
    const existing = (await request(app).get(`/api/attachments?ownerKind=drum-type&ownerId=${drumTypeId}`).set(bearer(t.clerk))).body.items[0].id;
    const content = await request(down).get(`/api/attachments/${existing}/content`).set(bearer(t.clerk));
    expect(content.status).toBe(503);
    expect(content.body.error.code).toBe('storage_unavailable');
  });
});

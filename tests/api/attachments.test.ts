import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { bearer, makeTestApp, tokenFor } from '../support/app';
import { openTestDataSource, resetDatabase } from '../support/db';
import { testStorage } from '../support/services';

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
  for (const role of ['clerk', 'engineer', 'buyer']) t[role] = await tokenFor(app, `${role}@bungwise.example`);
  drumTypeId = (await request(app).get('/api/drum-types').set(bearer(t.clerk))).body.items[0].id;
});

afterAll(async () => {
  await ds.destroy();
});

const attach = (token: string, ownerKind: string, ownerId: string, bytes: Buffer, name: string) =>
  request(app).post('/api/attachments').set(bearer(token)).field('ownerKind', ownerKind).field('ownerId', ownerId).attach('file', bytes, name);

describe('attachments through the S3 stand-in', () => {
  it('an engineer attaches a spec sheet to a drum type; everyone signed in reads it back byte for byte', async () => {
    const res = await attach(t.engineer, 'drum-type', drumTypeId, PDF, 'spec-sheet.pdf');
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ contentType: 'application/pdf', sizeBytes: PDF.length, fileName: 'spec-sheet.pdf' });
    const list = await request(app).get(`/api/attachments?ownerKind=drum-type&ownerId=${drumTypeId}`).set(bearer(t.buyer));
    expect(list.body.items.map((a: { id: string }) => a.id)).toContain(res.body.id);
    const content = await request(app).get(`/api/attachments/${res.body.id}/content`).set(bearer(t.clerk)).buffer(true).parse((r, cb) => {
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

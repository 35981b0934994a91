import { randomUUID } from 'node:crypto';
import iconv from 'iconv-lite';
import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { bearer, makeTestApp, openTestApp, tokenFor } from '../support/app';
import { AttachmentsService } from '../../server/attachments/attachments.service';
import { storedKeys, testStorage, unreachableStorage } from '../support/services';
import { TUBE_HEADER } from '../support/spec-sheets';

let ds: DataSource;
let app: Express;
let engineer: string;
let clerk: string;
let supplierName: string;

const upload = (a: Express, token: string, kind: string, dryRun: boolean, content: Buffer | string, name = 'spec.csv') =>
  request(a)
    .post('/api/imports')
    .set(bearer(token))
    .field('kind', kind)
    .field('dryRun', String(dryRun))
    .attach('file', Buffer.isBuffer(content) ? content : Buffer.from(content, 'utf8'), name);

const tubeCount = async () => Number((await ds.query(`SELECT count(*) AS n FROM dip_tubes`))[0].n);
const importCount = async () => Number((await ds.query(`SELECT count(*) AS n FROM imports`))[0].n);

beforeAll(async () => {
  ({ ds, app } = await openTestApp({ storage: testStorage() }));
  engineer = await tokenFor(app, 'engineer@bungwise.example');
  clerk = await tokenFor(app, 'clerk@bungwise.example');
  const suppliers = await request(app).get('/api/suppliers?region=NA').set(bearer(clerk));
  supplierName = suppliers.body.items[0].name;
});

afterAll(() => ds.destroy());

const cleanFile = () =>
  [
    'Supplier,Part Number,Thread,Length (mm),Bore_mm,OD mm,Material,Key,Channels',
    `${supplierName},IMP-T-001,NPS-2,836,19,25.4,PFA,,feed`,
    `${supplierName},IMP-T-002,NPS-2,845.5,19,25.4,PVDF,,feed-return`,
    `${supplierName},IMP-T-003,G-2,830,19,25.4,PFA,,feed`,
  ].join('\n');

describe('CSV import of dip tubes', () => {
  it('a dry run counts new rows and writes nothing; the commit writes them all; the file is kept', async () => {
    const before = await tubeCount();
    const dry = await upload(app, engineer, 'dip-tubes', true, cleanFile());
    expect(dry.status).toBe(200);
    expect(dry.body.counts).toEqual({ new: 3, changed: 0, unchanged: 0, rejected: 0 });
    expect(dry.body.encoding).toBe('UTF-8');
    expect(await tubeCount()).toBe(before);
    const commit = await upload(app, engineer, 'dip-tubes', false, cleanFile());
    expect(commit.status).toBe(201);
    expect(commit.body.outcome).toBe('committed');
    expect(await tubeCount()).toBe(before + 3);
    const tube = await request(app).get('/api/dip-tubes?q=IMP-T-002').set(bearer(clerk));
    expect(tube.body.items[0]).toMatchObject({ partNumber: 'IMP-T-002', threadCode: 'NPS-2', lengthMm: 845.5, channels: 'feed-return' });
    const history = await request(app).get('/api/imports').set(bearer(engineer));
    expect(history.body.items[0]).toMatchObject({ kind: 'dip-tubes', outcome: 'committed', byName: 'Tomasz Ilunga', counts: { new: 3 } });
    // The imported file is kept as an attachment of the import.
    const file = await request(app).get(`/api/attachments/${commit.body.attachmentId}/content`).set(bearer(engineer));
    expect(file.status).toBe(200);
    expect(file.text ?? file.body.toString()).toContain('IMP-T-003');
  });

  it('the same file again changes nothing', async () => {
    const before = await tubeCount();
    const again = await upload(app, engineer, 'dip-tubes', false, cleanFile());
    expect(again.body.counts).toEqual({ new: 0, changed: 0, unchanged: 3, rejected: 0 });
    expect(await tubeCount()).toBe(before);
    const tube = await request(app).get('/api/dip-tubes?q=IMP-T-001').set(bearer(clerk));
    expect(tube.body.items[0].version).toBe(1);
  });

  it('a changed row is counted as changed and updated; inch columns are converted', async () => {
    const file = ['supplier,part_number,thread,length_in,bore_in,od_in,material,key,channels', `${supplierName},IMP-T-001,NPS-2,33,0.75,1,PFA,,feed`].join('\n');
    const res = await upload(app, engineer, 'dip-tubes', false, file);
    expect(res.body.counts).toEqual({ new: 0, changed: 1, unchanged: 0, rejected: 0 });
    const tube = await request(app).get('/api/dip-tubes?q=IMP-T-001').set(bearer(clerk));
    expect(tube.body.items[0].lengthMm).toBeCloseTo(33 * 25.4, 9); // 1 in = 25.4 mm exactly (NIST SP 811)
    expect(tube.body.items[0].version).toBe(2);
  });

  it('bad rows are reported by line and column, with the nearest thread codes, and nothing is written', async () => {
    const before = await tubeCount();
    const file = [
      'supplier,part_number,thread,length_mm,bore_mm,od_mm,material,key,channels',
      `${supplierName},IMP-B-001,NPS-2,836,19,25.4,PFA,,feed`,
      `${supplierName},IMP-B-002,NPS 2,836,19,25.4,PFA,,feed`,
      `${supplierName},IMP-B-003,NPS-2,-5,19,25.4,PFA,,feed`,
      `Nobody Industries,IMP-B-004,NPS-2,836,19,25.4,PFA,,feed`,
      `${supplierName},IMP-B-005,NPS-2,836,30,25.4,PFA,,feed`,
    ].join('\n');
    const res = await upload(app, engineer, 'dip-tubes', false, file);
    expect(res.status).toBe(422);
    expect(res.body.error.details.counts).toEqual({ new: 1, changed: 0, unchanged: 0, rejected: 4 });
    const errors = res.body.error.details.errors as Array<{ line: number; column: string; reason: string }>;
    expect(errors.map((e) => [e.line, e.column])).toEqual([
      [3, 'thread'],
      [4, 'length_mm'],
      [5, 'supplier'],
      [6, 'bore_mm'],
    ]);
    expect(errors[0].reason).toMatch(/nearest: .*NPS-2/);
    expect(await tubeCount()).toBe(before);
  });

  it('a failure part-way through a commit writes nothing', async () => {
    const faulty = makeTestApp(ds, { storage: testStorage(), imports: { chunkSize: 1, failAfterRows: 2 } });
    const before = await tubeCount();
    const file = ['supplier,part_number,thread,length_mm,bore_mm,od_mm,material,key,channels', ...[1, 2, 3].map((i) => `${supplierName},IMP-F-00${i},NPS-2,836,19,25.4,PFA,,feed`)].join('\n');
    const res = await upload(faulty, engineer, 'dip-tubes', false, file);
    expect(res.status).toBe(500);
    expect(await tubeCount()).toBe(before);
    expect((await request(app).get('/api/dip-tubes?q=IMP-F').set(bearer(clerk))).body.total).toBe(0);
  });

  it('reads a Shift_JIS file from a Japanese supplier correctly', async () => {
    const created = await request(app).post('/api/suppliers').set(bearer(engineer)).send({ name: '東雲精機', region: 'JP' });
    expect(created.status).toBe(201);
    const text = ['仕入先,part_number,thread,length_mm,bore_mm,od_mm,material,key,channels', '東雲精機,SJ-DT-01,BT-56x4,862,19,25.4,PFA（高純度）,,feed'].join('\r\n');
    // The header's first cell is not a known column; "supplier" is needed: use an alias row instead.
    const file = iconv.encode(text.replace('仕入先', 'supplier'), 'Shift_JIS');
    expect(file.toString('utf8')).not.toContain('東雲精機'); // really not UTF-8
    const res = await upload(app, engineer, 'dip-tubes', false, file);
    expect(res.status).toBe(201);
    expect(res.body.encoding).toBe('Shift_JIS');
    const tube = await request(app).get('/api/dip-tubes?q=SJ-DT-01').set(bearer(clerk));
    expect(tube.body.items[0]).toMatchObject({ supplierName: '東雲精機', material: 'PFA（高純度）' });
  });

  it('accepts a semicolon file with decimal commas; refuses a decimal comma in a comma file', async () => {
    const semi = ['supplier;part_number;thread;length_mm;bore_mm;od_mm;material;key;channels', `${supplierName};IMP-S-001;NPS-2;836,5;19;25,4;PFA;;feed`].join('\n');
    const ok = await upload(app, engineer, 'dip-tubes', false, semi);
    expect(ok.status).toBe(201);
    expect(ok.body.delimiter).toBe(';');
    const tube = await request(app).get('/api/dip-tubes?q=IMP-S-001').set(bearer(clerk));
    expect(tube.body.items[0]).toMatchObject({ lengthMm: 836.5, odMm: 25.4 });
    const comma = ['supplier,part_number,thread,length_mm,bore_mm,od_mm,material,key,channels', `${supplierName},IMP-S-002,NPS-2,836,5,19,25.4,PFA,,feed`].join('\n');
    const bad = await upload(app, engineer, 'dip-tubes', true, comma);
    expect(bad.body.counts.rejected).toBe(1);
    expect(bad.body.errors[0].reason).toMatch(/decimal comma/);
  });

  it('refuses an encoding it cannot read, a binary file, an oversized file, a missing column and a clerk', async () => {
    // UTF-16 without a byte-order mark cannot be told from binary data.
    const utf16 = iconv.encode('supplier,part_number,thread,length_mm,bore_mm,od_mm,material,key,channels\nMüller Rohrtechnik GmbH,X,NPS-2,836,19,25.4,PFA,,feed\n', 'utf16le');
    const enc = await upload(app, engineer, 'dip-tubes', true, utf16);
    expect(enc.status).toBe(415);
    expect(enc.body.error.details[0].field).toBe('file');
    const png = Buffer.from('89504e470d0a1a0a0000000d49484452', 'hex');
    expect((await upload(app, engineer, 'dip-tubes', true, png, 'spec.csv')).status).toBe(415);
    const big = Buffer.alloc(21 * 1024 * 1024, 0x41);
    const tooBig = await upload(app, engineer, 'dip-tubes', true, big);
    expect(tooBig.status).toBe(413);
    const missing = await upload(app, engineer, 'dip-tubes', true, 'supplier,part_number\nA,B\n');
    expect(missing.status).toBe(400);
    expect(missing.body.error.message).toMatch(/thread/);
    expect((await upload(app, clerk, 'dip-tubes', true, cleanFile())).status).toBe(403);
    const kind = await upload(app, engineer, 'pumps', true, cleanFile());
    expect(kind.body.error.details[0].field).toBe('kind');
  });

  it('imports drum types with their openings, one row per opening, and serves a template per kind', async () => {
    const template = await request(app).get('/api/imports/templates/drum-types').set(bearer(engineer));
    expect(template.status).toBe(200);
    const lines = template.text.trim().split('\n');
    expect(lines[0]).toContain('inside_depth_mm');
    const file = lines.map((l) => l.replaceAll('Example Drum Co', supplierName).replaceAll('DR-EX-208', 'IMP-DR-1')).join('\n');
    const res = await upload(app, engineer, 'drum-types', false, file);
    expect(res.status).toBe(201);
    expect(res.body.counts).toEqual({ new: 1, changed: 0, unchanged: 0, rejected: 0 });
    const drum = await request(app).get('/api/drum-types?q=IMP-DR-1').set(bearer(clerk));
    expect(drum.body.items[0].openings.map((o: { threadCode: string }) => o.threadCode).sort()).toEqual(['NPS-2', 'NPS-3/4']);
    const again = await upload(app, engineer, 'drum-types', false, file);
    expect(again.body.counts.unchanged).toBe(1);
  });
});

describe('CSV export', () => {
  it('exports a registry table with formula-like cells neutralised', async () => {
    const suppliers = await request(app).get('/api/suppliers?region=NA').set(bearer(clerk));
    const created = await request(app).post('/api/dip-tubes').set(bearer(engineer)).send({
      partNumber: '=HYPERLINK("http://x")',
      supplierId: suppliers.body.items[0].id,
      threadCode: 'NPS-2',
      lengthMm: 836,
      boreMm: 19,
      odMm: 25.4,
      material: '@SUM(A1)',
      keyCode: null,
      channels: 'feed',
    });
    expect(created.status).toBe(201);
    const csv = await request(app).get('/api/exports/dip-tubes.csv?q=HYPERLINK').set(bearer(clerk));
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    expect(csv.text).toContain(`"'=HYPERLINK(""http://x"")"`);
    expect(csv.text).toContain("'@SUM(A1)");
    expect(csv.text).not.toMatch(/(^|,)=HYPERLINK/m);
  });
});

describe('spec sheets in each encoding', () => {
  const supplier = async (name: string, region: string) => {
    const res = await request(app).post('/api/suppliers').set(bearer(engineer)).send({ name, region });
    expect(res.status).toBe(201);
  };
  const tube = async (partNumber: string) =>
    (
      await request(app)
        .get(`/api/dip-tubes?q=${encodeURIComponent(partNumber)}`)
        .set(bearer(clerk))
    ).body.items[0];
  const sheet = (rows: string[]) => [TUBE_HEADER, ...rows].join('\r\n') + '\r\n';

  it('commits a Windows-1252 sheet as written (DT-Müller, once read as Shift_JIS) and records the encoding read', async () => {
    await supplier('Müller Rohrtechnik GmbH', 'EU');
    const file = iconv.encode(sheet(['Müller Rohrtechnik GmbH,DT-Müller-ÄÖÜ,NPS-2,836,19,25.4,PFA,,feed']), 'windows-1252');
    const res = await upload(app, engineer, 'dip-tubes', false, file, 'mueller.csv');
    expect(res.status).toBe(201);
    expect(res.body.encoding).toBe('Windows-1252');
    expect(await tube('DT-Müller-ÄÖÜ')).toMatchObject({ partNumber: 'DT-Müller-ÄÖÜ', supplierName: 'Müller Rohrtechnik GmbH' });
    const record = await request(app).get(`/api/imports/${res.body.id}`).set(bearer(engineer));
    expect(record.body.encoding).toBe('Windows-1252');
  });

  it('commits a Taiwanese (Big5), a Korean (EUC-KR) and a UTF-16 sheet', async () => {
    await supplier('台灣精密管件股份有限公司', 'TW');
    await supplier('한국정밀공업 주식회사', 'KR');
    const big5 = await upload(app, engineer, 'dip-tubes', false, iconv.encode(sheet(['台灣精密管件股份有限公司,TW-DT-01,NPS-2,836,19,25.4,聚四氟乙烯,,feed']), 'Big5'));
    expect([big5.status, big5.body.encoding]).toEqual([201, 'Big5']);
    expect(await tube('TW-DT-01')).toMatchObject({ supplierName: '台灣精密管件股份有限公司', material: '聚四氟乙烯' });
    const korean = await upload(app, engineer, 'dip-tubes', false, iconv.encode(sheet(['한국정밀공업 주식회사,KR-DT-01,NPS-2,836,19,25.4,불소수지,,feed']), 'EUC-KR'));
    expect([korean.status, korean.body.encoding]).toEqual([201, 'EUC-KR']);
    expect(await tube('KR-DT-01')).toMatchObject({ supplierName: '한국정밀공업 주식회사', material: '불소수지' });
    const utf16 = await upload(app, engineer, 'dip-tubes', false, iconv.encode(sheet([`${supplierName},U16-DT-01,NPS-2,836,19,25.4,PFA（高純度）,,feed`]), 'utf-16le', { addBOM: true }));
    expect([utf16.status, utf16.body.encoding]).toEqual([201, 'UTF-16LE (BOM)']);
    expect(await tube('U16-DT-01')).toMatchObject({ material: 'PFA（高純度）' });
  });

  it('refuses a byte soup with a 400 naming the encodings it could not choose between, and writes nothing', async () => {
    const before = await tubeCount();
    const imports = await importCount();
    // Letters and high bytes half and half (the generator of tests/unit/decode.test.ts, seed 1).
    let s = 1;
    const rnd = (n: number) => ((s = (s * 1103515245 + 12345) & 0x7fffffff) >>> 16) % n;
    const soup = Buffer.from(Array.from({ length: 200 }, () => (rnd(1000) < 500 ? 0x80 + rnd(128) : 'abcdefghijklmnopqrstuvwxyz0123456789,\n'.charCodeAt(rnd(38)))));
    const res = await upload(app, engineer, 'dip-tubes', false, soup);
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'encoding_uncertain', details: [{ field: 'file' }] });
    expect(res.body.error.message).toMatch(/reads as \S+ hardly better than as \S+/);
    expect(await tubeCount()).toBe(before);
    expect(await importCount()).toBe(imports);
  });
});

describe('the kept file of an import', () => {
  it('a failed commit leaves no attachment row and no stored object', async () => {
    const storage = testStorage();
    const faulty = makeTestApp(ds, { storage, imports: { chunkSize: 1, failAfterRows: 1 } });
    const rowsBefore = Number((await ds.query(`SELECT count(*) AS n FROM attachments WHERE owner_kind = 'import'`))[0].n);
    const keysBefore = new Set(await storedKeys(storage, 'import/'));
    const file = [TUBE_HEADER, `${supplierName},IMP-K-001,NPS-2,836,19,25.4,PFA,,feed`, `${supplierName},IMP-K-002,NPS-2,836,19,25.4,PFA,,feed`].join('\n');
    expect((await upload(faulty, engineer, 'dip-tubes', false, file)).status).toBe(500);
    expect(Number((await ds.query(`SELECT count(*) AS n FROM attachments WHERE owner_kind = 'import'`))[0].n)).toBe(rowsBefore);
    const orphans = (await storedKeys(storage, 'import/')).filter((k) => !keysBefore.has(k));
    expect(orphans).toEqual([]);
  });

  it('the sweep removes an object left by a process killed before its commit, and keeps the ones rows name', async () => {
    const storage = testStorage();
    const kept = await upload(app, engineer, 'dip-tubes', true, cleanFile());
    const keptKey = (await ds.query(`SELECT storage_key FROM attachments WHERE id = $1`, [kept.body.attachmentId]))[0].storage_key as string;
    // What a killed import leaves: the object is put, the transaction never commits.
    const orphanPrefix = `import/${randomUUID()}/`;
    await storage.put(`${orphanPrefix}${randomUUID()}`, Buffer.from('a,b\n'), 'text/csv');
    const sweeper = new AttachmentsService(ds, storage);
    const young = await sweeper.sweep({ prefixes: [orphanPrefix] });
    expect(young.deleted).toEqual([]); // within the grace period an import may still be writing its row
    const swept = await sweeper.sweep({ olderThanMs: 0, prefixes: [orphanPrefix, keptKey.replace(/[^/]+$/, '')] });
    expect(swept.deleted).toEqual([expect.stringMatching(new RegExp(`^${orphanPrefix}`))]);
    expect(await storedKeys(storage, orphanPrefix)).toEqual([]);
    expect(await storedKeys(storage, keptKey)).toEqual([keptKey]);
  });

  it('keeps a non-ASCII file name as the browser sent it, in the answer, the history and the kept file', async () => {
    const name = 'Prüfblatt-東京.csv';
    const res = await upload(app, engineer, 'dip-tubes', true, cleanFile(), name);
    expect(res.status).toBe(200);
    expect(res.body.fileName).toBe(name);
    expect((await request(app).get(`/api/imports/${res.body.id}`).set(bearer(engineer))).body.fileName).toBe(name);
    const files = await request(app).get(`/api/attachments?ownerKind=import&ownerId=${res.body.id}`).set(bearer(engineer));
    expect(files.body.items.map((f: { fileName: string }) => f.fileName)).toEqual([name]);
    const content = await request(app).get(`/api/attachments/${res.body.attachmentId}/content`).set(bearer(engineer));
    expect(content.headers['content-disposition']).toContain(`filename*=UTF-8''${encodeURIComponent(name)}`);
  });

  it('an object-store outage answers 503 naming file storage, and writes nothing', async () => {
    const down = makeTestApp(ds, { storage: await unreachableStorage() });
    const before = await tubeCount();
    const imports = await importCount();
    const file = [TUBE_HEADER, `${supplierName},IMP-O-001,NPS-2,836,19,25.4,PFA,,feed`].join('\n');
    const res = await upload(down, engineer, 'dip-tubes', false, file);
    expect(res.status).toBe(503);
    expect(res.body.error.code).toBe('storage_unavailable');
    expect(res.body.error.message).toMatch(/file storage/i);
    expect(await tubeCount()).toBe(before);
    expect(await importCount()).toBe(imports);
  });
});

// How the web build and the API travel: compressed (brotli or gzip, as the browser accepts), hashed files
// kept a year, everything else revalidated, client routes answered with index.html, and the fit check's
// kept answers compressed like any other.
import type { Express } from 'express';
import fs from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';
import type { DataSource } from 'typeorm';
import { colors } from '../../components/theme';
import { ChangeFeed } from '../../server/db/change-feed';
import { precompress } from '../../scripts/web/precompress';
import { DEMO_REGISTRY_SUMMARY as demo } from '../../seeds/demo-registry';
import { MANIFEST_FILE, ROUTE_CHUNKS_FILE, SERVICE_WORKER_FILE } from '../../shared/web-delivery';
import { makeTestApp, tokenFor } from '../support/app';
import { openTestDataSource, resetDatabase } from '../support/db';

const WEB_DIR = process.env.BUNGWISE_WEB_DIR ?? path.resolve(__dirname, '..', '..', 'dist', 'web');
const IMMUTABLE = 'public, max-age=31536000, immutable';
const BR = { 'Accept-Encoding': 'gzip, deflate, br' };

interface Answer {
  status: number;
  headers: http.IncomingHttpHeaders;
  /** The bytes as sent, before any decoding. */
  wire: Buffer;
  /** The bytes after undoing Content-Encoding. */
  body: Buffer;
}

let ds: DataSource;
let feed: ChangeFeed;
const servers: http.Server[] = [];

async function listen(app: Express): Promise<string> {
  const server = await new Promise<http.Server>((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
  });
  servers.push(server);
  return `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
}

/** A raw HTTP exchange: supertest and fetch both undo the encoding before a test could see it. */
function exchange(base: string, urlPath: string, init: { method?: string; headers?: Record<string, string>; body?: string } = {}): Promise<Answer> {
  return new Promise((resolve, reject) => {
    const req = http.request(`${base}${urlPath}`, { method: init.method ?? 'GET', headers: init.headers }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => {
        const wire = Buffer.concat(chunks);
        const encoding = res.headers['content-encoding'];
        const body = encoding === 'br' ? zlib.brotliDecompressSync(wire) : encoding === 'gzip' ? zlib.gunzipSync(wire) : wire;
        resolve({ status: res.statusCode ?? 0, headers: res.headers, wire, body });
      });
    });
    req.on('error', reject);
    req.end(init.body);
  });
}

/** The woff2 files in the export, as URLs. */
function woff2Files(): string[] {
  const out: string[] = [];
  const walk = (dir: string) => {
    for (const e of fs.readdirSync(dir, { withFileTypes: true })) {
      if (e.isDirectory()) walk(path.join(dir, e.name));
      else if (e.name.endsWith('.woff2')) out.push(`/${path.relative(WEB_DIR, path.join(dir, e.name)).split(path.sep).join('/')}`);
    }
  };
  walk(path.join(WEB_DIR, 'assets'));
  return out.sort();
}

let base: string;
let bundlePath: string;
let fontPath: string;

beforeAll(async () => {
  if (!fs.existsSync(path.join(WEB_DIR, SERVICE_WORKER_FILE))) throw new Error(`${WEB_DIR} has no ${SERVICE_WORKER_FILE}: run through \`npm test\`, which exports the web app.`);
  ds = await openTestDataSource();
  await resetDatabase(ds);
  feed = new ChangeFeed(process.env.DATABASE_URL!, 1000);
  await feed.start();
  base = await listen(makeTestApp(ds, { webDir: WEB_DIR, changes: feed }));
  const html = fs.readFileSync(path.join(WEB_DIR, 'index.html'), 'utf8');
  // The largest script index.html starts (the entry; async routes put the runtime and common chunk beside it).
  bundlePath = [...html.matchAll(/<script src="([^"]+\.js)"/g)].map((m) => m[1]).sort((a, b) => fs.statSync(path.join(WEB_DIR, b)).size - fs.statSync(path.join(WEB_DIR, a)).size)[0];
  fontPath = woff2Files()[0];
});

afterAll(async () => {
  await Promise.all(servers.map((s) => new Promise((r) => s.close(r))));
  await feed.stop();
  await ds.destroy();
});

describe('the web build', () => {
  it('index.html comes brotli-compressed to a browser that accepts it, gzip to one that does not, plain to one that asks for neither, and is revalidated', async () => {
    const file = fs.readFileSync(path.join(WEB_DIR, 'index.html'));
    const br = await exchange(base, '/', { headers: BR });
    expect(br.status).toBe(200);
    expect(br.headers['content-encoding']).toBe('br');
    expect(br.headers['content-type']).toMatch(/^text\/html/);
    expect(br.headers['cache-control']).toBe('no-cache');
    expect(br.headers.vary).toMatch(/Accept-Encoding/i);
    expect(br.body.equals(file)).toBe(true);
    expect(br.wire.length).toBeLessThan(file.length);
    const gz = await exchange(base, '/', { headers: { 'Accept-Encoding': 'gzip' } });
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(gz.body.equals(file)).toBe(true);
    const plain = await exchange(base, '/');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.wire.equals(file)).toBe(true);
  });

  it('a client route is answered with index.html, compressed and revalidated; a missing file is a 404, not the page', async () => {
    const route = await exchange(base, '/receive/history', { headers: BR });
    expect(route.status).toBe(200);
    expect(route.headers['content-encoding']).toBe('br');
    expect(route.headers['cache-control']).toBe('no-cache');
    expect(route.body.equals(fs.readFileSync(path.join(WEB_DIR, 'index.html')))).toBe(true);
    const missing = await exchange(base, '/_expo/static/js/web/entry-0123456789abcdef0123456789abcdef.js', { headers: BR });
    expect(missing.status).toBe(404);
    expect(missing.headers['content-type']).toMatch(/json/);
  });

  it('the hashed JavaScript bundle is compressed to under a third and kept a year', async () => {
    const res = await exchange(base, bundlePath, { headers: BR });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/javascript/); // RFC 9239
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['cache-control']).toBe(IMMUTABLE);
    expect(res.body.equals(fs.readFileSync(path.join(WEB_DIR, bundlePath)))).toBe(true);
    expect(res.wire.length).toBeLessThan(res.body.length / 3);
  });

  it('a font is a Latin-subset woff2 of a few tens of KB, kept a year and sent as it is (woff2 is compressed already)', async () => {
    const res = await exchange(base, fontPath, { headers: BR });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('font/woff2');
    expect(res.headers['cache-control']).toBe(IMMUTABLE);
    expect(res.headers['content-encoding']).toBeUndefined();
    expect(res.wire.length).toBeLessThan(40_000);
    expect(woff2Files()).toHaveLength(3); // the theme's 400, 600 and 700
    // Not preloaded: on a slow link they would take bandwidth from the first screen's scripts.
    const html = fs.readFileSync(path.join(WEB_DIR, 'index.html'), 'utf8');
    expect(html).not.toMatch(/rel="preload"[^>]+\.woff2/);
  });

  it("a page address names its layouts' and screen's chunks in a Link preload header; each is a real, year-kept script", async () => {
    const chunks = JSON.parse(fs.readFileSync(path.join(WEB_DIR, ROUTE_CHUNKS_FILE), 'utf8')) as Record<string, string>;
    // Read from the entry bundle at export (scripts/web/route-chunks.ts): every route file of app/ is found.
    expect(Object.keys(chunks)).toEqual(expect.arrayContaining(['./_layout.tsx', './(app)/_layout.tsx', './(app)/receive/index.tsx', './(app)/receive/[id].tsx']));
    const res = await exchange(base, '/receive', { headers: BR });
    expect(res.status).toBe(200);
    const links = String(res.headers.link ?? '')
      .split(', ')
      .map((l) => l.match(/^<([^>]+)>; rel=preload; as=script$/)?.[1]);
    expect(links).toEqual(expect.arrayContaining([chunks['./_layout.tsx'], chunks['./(app)/_layout.tsx'], chunks['./(app)/receive/index.tsx']]));
    expect(links).not.toContain(chunks['./(app)/receive/history.tsx']);
    for (const url of links) {
      const chunk = await exchange(base, url!, { headers: BR });
      expect(chunk.status).toBe(200);
      expect(chunk.headers['cache-control']).toBe(IMMUTABLE);
    }
    // A lot's page preloads the lot screen; files and the API get no such header.
    expect(String((await exchange(base, '/receive/0b6f3c1e-5c1a-4d7e-9f00-000000000000')).headers.link)).toContain(chunks['./(app)/receive/[id].tsx']);
    expect((await exchange(base, bundlePath)).headers.link).toBeUndefined();
    expect((await exchange(base, '/api/health')).headers.link).toBeUndefined();
  });

  it('the manifest makes the app installable: names, start URL, scope, standalone, the theme colours, icons that load', async () => {
    const res = await exchange(base, `/${MANIFEST_FILE}`, { headers: BR });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^application\/manifest\+json/);
    expect(res.headers['cache-control']).toBe('no-cache');
    const manifest = JSON.parse(res.body.toString('utf8'));
    expect(manifest).toMatchObject({ name: 'Bungwise', short_name: 'Bungwise', start_url: '/', scope: '/', display: 'standalone', theme_color: colors.primary, background_color: colors.paper });
    expect(manifest.icons.map((i: { sizes: string; purpose: string }) => `${i.sizes} ${i.purpose}`)).toEqual(['192x192 any', '512x512 any', '512x512 maskable']);
    for (const icon of manifest.icons) {
      const png = await exchange(base, icon.src);
      expect(png.status).toBe(200);
      expect(png.headers['content-type']).toBe('image/png');
      expect(png.headers['cache-control']).toBe(IMMUTABLE);
      expect(png.wire.readUInt32BE(16)).toBe(Number(icon.sizes.split('x')[0])); // the PNG's own width (IHDR)
    }
  });

  it('the service worker is revalidated on every visit, precaches the shell with an index.html fallback, and leaves /api/ alone', async () => {
    const res = await exchange(base, `/${SERVICE_WORKER_FILE}`, { headers: BR });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/javascript/); // RFC 9239
    expect(res.headers['cache-control']).toBe('no-cache');
    expect(res.headers['content-encoding']).toBe('br');
    const sw = res.body.toString('utf8');
    const precached = [...sw.matchAll(/url:"([^"]+)"/g)].map((m) => `/${m[1]}`);
    expect(precached).toEqual(expect.arrayContaining(['/index.html', bundlePath, fontPath, `/${MANIFEST_FILE}`]));
    expect(precached.some((u) => u.startsWith('/api/') || /\.(br|gz)$/.test(u))).toBe(false);
    expect(sw).toContain('"/index.html"'); // the navigation fallback
    expect(sw).toContain('^\\/api\\/'); // …which does not answer API navigations
  });

  it('serves any file of an export with its MIME type and its compressed twin: WebAssembly as application/wasm', async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'bungwise-web-'));
    try {
      fs.writeFileSync(path.join(dir, 'index.html'), '<!doctype html><title>x</title>');
      const wasm = Buffer.concat([Buffer.from([0x00, 0x61, 0x73, 0x6d, 0x01, 0x00, 0x00, 0x00]), Buffer.alloc(4096, 7)]);
      fs.writeFileSync(path.join(dir, 'decoder.0123456789ab.wasm'), wasm);
      precompress(dir);
      const local = await listen(makeTestApp(ds, { webDir: dir }));
      const res = await exchange(local, '/decoder.0123456789ab.wasm', { headers: BR });
      expect(res.status).toBe(200);
      expect(res.headers['content-type']).toBe('application/wasm');
      expect(res.headers['content-encoding']).toBe('br');
      expect(res.headers['cache-control']).toBe(IMMUTABLE);
      expect(res.body.equals(wasm)).toBe(true);
    } finally {
      fs.rmSync(dir, { recursive: true, force: true });
    }
  });
});

describe('API answers', () => {
  let clerk: string;
  let drumId: string;
  beforeAll(async () => {
    clerk = await tokenFor(makeTestApp(ds), 'clerk@bungwise.example');
    [{ id: drumId }] = await ds.query(`SELECT id FROM drum_types WHERE part_number = $1`, [demo.fittingDrum]);
  });
  const json = (token: string) => ({ ...BR, Authorization: `Bearer ${token}`, 'Content-Type': 'application/json' });

  it('a list comes compressed, and the same as uncompressed', async () => {
    const res = await exchange(base, '/api/drum-types?pageSize=50', { headers: json(clerk) });
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    const plain = await exchange(base, '/api/drum-types?pageSize=50', { headers: { Authorization: `Bearer ${clerk}` } });
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(JSON.parse(res.body.toString())).toEqual(JSON.parse(plain.wire.toString()));
  });

  it('a tiny answer is not compressed', async () => {
    const res = await exchange(base, '/api/health', { headers: BR });
    expect(res.status).toBe(200);
    expect(res.wire.length).toBeLessThan(1024);
    expect(res.headers['content-encoding']).toBeUndefined();
  });

  it('the fit check is compressed whether computed or served from the kept answers', async () => {
    expect(feed.isListening).toBe(true); // answers are kept only while the feed listens
    const ask = (headers: Record<string, string>) => exchange(base, '/api/fit-checks', { method: 'POST', headers, body: JSON.stringify({ drumTypeId: drumId }) });
    const first = await ask(json(clerk));
    expect(first.status).toBe(200);
    expect(first.headers['cache-status']).toMatch(/fwd=miss/);
    const kept = await ask(json(clerk));
    expect(kept.headers['cache-status']).toBe('bungwise; hit');
    const gz = await ask({ ...json(clerk), 'Accept-Encoding': 'gzip' });
    for (const res of [first, kept]) expect(res.headers['content-encoding']).toBe('br');
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(kept.wire.length).toBeLessThan(kept.body.length);
    expect(JSON.parse(kept.body.toString())).toEqual(JSON.parse(first.body.toString()));
    expect(JSON.parse(gz.body.toString())).toEqual(JSON.parse(first.body.toString()));
    expect(JSON.parse(kept.body.toString()).verdict).toBe('fits');
  });
});

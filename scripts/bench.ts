// `npm run bench`: the figures that matter at scale, each beside its floor, on this machine, against the
// real server and PostgreSQL. Run by the launcher against a scratch database (bungwise_bench).
import 'reflect-metadata';
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { Client } from 'pg';
import { THREAD_TABLE } from '../shared/threads/thread-table';
import { hashPassword } from '../server/auth/passwords';
import { CPU_SLOWDOWN, exportBarePage, gzipSizeOfJs, measurePageLoads, serveExport, SLOW_4G } from './bench-page-load';
// eslint-disable-next-line @typescript-eslint/no-require-imports
const autocannon = require('autocannon');

const root = path.resolve(__dirname, '..', '..', '..');
const url = process.env.DATABASE_URL!;
const SIZES = { suppliers: 200, drumTypes: 10_000, tubes: 30_000, connectors: 30_000, pairings: 100_000, importRows: 100_000 };

interface Row {
  figure: string;
  value: number;
  unit: string;
  floor: number;
  floorLabel: string;
  ratio: number;
  target: string;
  met: boolean;
}
const rows: Row[] = [];
const log = (s: string) => console.log(`[bench] ${s}`);

function percentile(sorted: number[], p: number): number {
  if (!sorted.length) return NaN;
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];
}

async function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const s = net.createServer();
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as net.AddressInfo;
      s.close(() => resolve(port));
    });
  });
}

/** 1. A large invented registry, generated in SQL. */
async function loadRegistry(db: Client): Promise<void> {
  const t0 = Date.now();
  await db.query('BEGIN');
  for (const row of THREAD_TABLE) {
    await db.query(
      `INSERT INTO thread_specs (code, family, nominal_label, major_diameter_mm, pitch_mm, threads_per_inch, flank_angle_deg, form, standard, version) VALUES ($1,$2,$3,$4,$5,$6,$7,$8,$9,1) ON CONFLICT (code) DO NOTHING`,
      [row.code, row.family, row.nominalLabel, row.majorDiameterMm, row.pitchMm, row.threadsPerInch, row.flankAngleDeg, row.form, row.standard],
    );
  }
  const hash = await hashPassword('bench-password-1');
  await db.query(
    `INSERT INTO users (email, display_name, role, password_hash, version) VALUES ('bench.engineer@bungwise.example','Bench Engineer','engineer',$1,1), ('bench.reviewer@bungwise.example','Bench Reviewer','engineer',$1,1), ('bench.clerk@bungwise.example','Bench Clerk','clerk',$1,1)`,
    [hash],
  );
  await db.query(`INSERT INTO site_settings (site_name, version) VALUES ('Bench site', 1)`);
  await db.query(`INSERT INTO key_codes (code, label, version) SELECT 'BK-' || g, 'Bench key ' || g, 1 FROM generate_series(1, 6) g`);
  const regions = `(ARRAY['NA','EU','JP','TW','KR','CN','SG','other'])[1 + g % 8]`;
  await db.query(`INSERT INTO suppliers (name, region, version) SELECT 'Bench Supplier ' || lpad(g::text, 3, '0'), ${regions}, 1 FROM generate_series(1, ${SIZES.suppliers}) g`);
  await db.query(`CREATE TEMP TABLE s AS SELECT id, row_number() OVER (ORDER BY name) AS n FROM suppliers`);
  await db.query(`CREATE TEMP TABLE th AS SELECT id, row_number() OVER (ORDER BY code) AS n FROM thread_specs`);
  await db.query(`CREATE TEMP TABLE k AS SELECT id, row_number() OVER (ORDER BY code) AS n FROM key_codes`);
  const nThreads = THREAD_TABLE.length;
  await db.query(`INSERT INTO drum_types (supplier_id, region, name, part_number, nominal_capacity_l, material, head, un_packaging_code, outside_height_mm, inside_depth_mm, outside_diameter_mm, version)
    SELECT s.id, ${regions}, 'Bench drum ' || g, 'BD-' || lpad(g::text, 6, '0'), 208, CASE WHEN g % 2 = 0 THEN 'steel' ELSE 'plastic' END, 'tight', CASE WHEN g % 2 = 0 THEN '1A1' ELSE '1H1' END, 880, 800 + g % 80, 585, 1
    FROM generate_series(1, ${SIZES.drumTypes}) g JOIN s ON s.n = 1 + g % ${SIZES.suppliers}`);
  await db.query(`INSERT INTO drum_openings (drum_type_id, label, thread_spec_id, bore_mm, key_code_id, position, version)
    SELECT d.id, o.label, th.id, 50, k.id, o.pos, 1
    FROM (SELECT id, row_number() OVER (ORDER BY part_number) AS n FROM drum_types) d
    CROSS JOIN (VALUES ('large bung', 'large', 0), ('small bung', 'small', 1)) AS o(label, pos, off)
    JOIN th ON th.n = 1 + (d.n * 3 + o.off) % ${nThreads}
    LEFT JOIN k ON k.n = 1 + d.n % 7`);
  await db.query(`INSERT INTO dip_tubes (part_number, supplier_id, thread_spec_id, length_mm, bore_mm, od_mm, material, key_code_id, channels, version)
    SELECT 'BT-' || lpad(g::text, 6, '0'), s.id, th.id, 780 + g % 90, 19, 25.4, (ARRAY['PFA','PVDF','HDPE'])[1 + g % 3], k.id, CASE WHEN g % 5 = 0 THEN 'feed-return' ELSE 'feed' END, 1
    FROM generate_series(1, ${SIZES.tubes}) g JOIN s ON s.n = 1 + g % ${SIZES.suppliers} JOIN th ON th.n = 1 + g % ${nThreads} LEFT JOIN k ON k.n = 1 + g % 7`);
  await db.query(`INSERT INTO connectors (part_number, supplier_id, key_code_id, feed_bore_mm, feed_nominal, return_bore_mm, return_nominal, return_path, suited_to, wetted_materials, version)
    SELECT 'BH-' || lpad(g::text, 6, '0'), s.id, k.id, 19.05, '3/4 in', CASE WHEN g % 3 = 0 THEN NULL ELSE 12.7 + (g % 2) * 6.35 END, CASE WHEN g % 3 = 0 THEN NULL ELSE '1/2 in' END,
      CASE WHEN g % 3 = 0 THEN 'none' ELSE 'open' END, (ARRAY['two-opening','one-opening','both'])[1 + g % 3], 'PFA, PTFE', 1
    FROM generate_series(1, ${SIZES.connectors}) g JOIN s ON s.n = 1 + g % ${SIZES.suppliers} LEFT JOIN k ON k.n = 1 + g % 7`);
  // 100,000 distinct (tube, head) pairs: each tube with up to four heads spread over the catalogue.
  await db.query(`INSERT INTO pairings (dip_tube_id, connector_id, status, author_id, approver_id, approved_at, version)
    SELECT t.id, c.id, CASE WHEN g % 4 = 0 THEN 'draft' ELSE 'approved' END,
      (SELECT id FROM users WHERE email = 'bench.engineer@bungwise.example'),
      CASE WHEN g % 4 = 0 THEN NULL ELSE (SELECT id FROM users WHERE email = 'bench.reviewer@bungwise.example') END,
      CASE WHEN g % 4 = 0 THEN NULL ELSE now() END, 1
    FROM generate_series(0, ${SIZES.pairings - 1}) g
    JOIN (SELECT id, row_number() OVER (ORDER BY part_number) - 1 AS n FROM dip_tubes) t ON t.n = g % ${SIZES.tubes}
    JOIN (SELECT id, row_number() OVER (ORDER BY part_number) - 1 AS n FROM connectors) c ON c.n = ((g % ${SIZES.tubes}) * 13 + (g / ${SIZES.tubes}) * 7477) % ${SIZES.connectors}
    ON CONFLICT DO NOTHING`);
  await db.query('COMMIT');
  // As after any bulk load: statistics and the visibility map (index-only scans), so autovacuum does not start mid-measurement.
  await db.query('VACUUM ANALYZE');
  const counts = (
    await db.query(
      `SELECT (SELECT count(*) FROM drum_types) AS d, (SELECT count(*) FROM dip_tubes) AS t, (SELECT count(*) FROM connectors) AS c, (SELECT count(*) FROM pairings) AS p, (SELECT count(*) FROM suppliers) AS s`,
    )
  ).rows[0];
  log(`registry loaded in ${((Date.now() - t0) / 1000).toFixed(1)} s: ${counts.d} drum types, ${counts.t} tubes, ${counts.c} connectors, ${counts.p} pairings, ${counts.s} suppliers`);
}

let serverProcesses = 1;

/** Starts the server as `npm start` does (one process per core) and waits until it says every process answers. */
async function startServer(port: number): Promise<ChildProcess> {
  const child = spawn('node', [path.join(root, 'dist', 'server', 'server', 'index.js')], {
    cwd: root,
    env: { ...process.env, PORT: String(port), BUNGWISE_LOG_REQUESTS: '0', BUNGWISE_DEMO: '0', S3_BUCKET: '', SMTP_URL: '', BUNGWISE_IMPORT_TIMING: '1' },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  return new Promise((resolve, reject) => {
    let out = '';
    const timer = setTimeout(() => reject(new Error('the server did not start within 30 s')), 30_000);
    child.stdout!.on('data', (d: Buffer) => {
      out += d;
      const running = out.match(/Bungwise is running at \S+( \((\d+) server processes\))?/);
      if (running) {
        clearTimeout(timer);
        serverProcesses = Number(running[2] ?? 1);
        log(`server: ${serverProcesses} process(es)`);
        resolve(child);
      }
    });
    child.on('exit', (code) => reject(new Error(`the server exited with ${code}`)));
  });
}

function cannon(opts: Record<string, unknown>): Promise<{ requests: { average: number; total: number }; latency: { p50: number; p99: number }; non2xx: number; errors: number }> {
  return new Promise((resolve, reject) => autocannon({ connections: 20, duration: 10, ...opts }, (err: Error | null, res: never) => (err ? reject(err) : resolve(res))));
}

function add(figure: string, value: number, unit: string, floor: number, floorLabel: string, target: string, met: boolean, ratio = value / floor): void {
  rows.push({ figure, value: Math.round(value * 100) / 100, unit, floor: Math.round(floor * 100) / 100, floorLabel, ratio: Math.round(ratio * 1000) / 1000, target, met });
}

/**
 * 5. The web app on a slow phone link beside a bare Expo Router page of the same SDK, served the same way.
 * Signed in as the app keeps it (the sign-in answer in localStorage, placed before the page's scripts run):
 * the clerk's daily start is the dock screen, not the sign-in page.
 */
async function webFigures(base: string, signIn: unknown): Promise<void> {
  log('exporting a bare Expo Router page for the page-load and bundle floors...');
  const webDir = process.env.BUNGWISE_WEB_DIR ?? path.join(root, 'dist', 'web');
  const bareDir = exportBarePage();
  const bareServer = await serveExport(bareDir);
  let loads;
  try {
    loads = await measurePageLoads({ url: `${base}/receive`, dir: webDir, testId: 'dock-screen', session: signIn }, { url: `${bareServer.url}/`, dir: bareDir, testId: 'bare-text' }, log);
  } finally {
    await bareServer.close();
  }
  const link = `slow 4G ${Math.round((SLOW_4G.downloadThroughput * 8) / 1000)} kbit/s ${SLOW_4G.latency} ms, CPU/${CPU_SLOWDOWN}`;
  log(`page loads under ${link}: ${JSON.stringify(loads)}`);
  add('cold load /receive, dock screen shown', loads.cold.shownMs, 'ms', loads.bare.shownMs, 'bare page text shown ms', '<= 1.3 x floor', loads.cold.shownMs <= 1.3 * loads.bare.shownMs);
  add('cold load /receive, load event', loads.cold.loadMs, 'ms', loads.bare.loadMs, 'bare page load event ms', '<= 1.3 x floor', loads.cold.loadMs <= 1.3 * loads.bare.loadMs);
  add('warm load /receive, dock screen shown', loads.warm.shownMs, 'ms', loads.cold.shownMs, 'cold load shown ms', '<= 0.5 x floor', loads.warm.shownMs <= 0.5 * loads.cold.shownMs);
  add('warm load /receive, load event', loads.warm.loadMs, 'ms', loads.cold.loadMs, 'cold load event ms', '<= 0.5 x floor', loads.warm.loadMs <= 0.5 * loads.cold.loadMs);
  add('cold load /receive, bytes on the wire', loads.cold.wireBytes / 1024, 'KB', loads.bare.wireBytes / 1024, 'bare page KB', 'report', true);
  add(
    'first route JS gzipped (/receive)',
    loads.cold.jsGzipBytes / 1024,
    'KB',
    loads.bare.jsGzipBytes / 1024,
    'bare page JS KB',
    '<= 1.6 x floor',
    loads.cold.jsGzipBytes <= 1.6 * loads.bare.jsGzipBytes,
  );
  const allJs = await gzipSizeOfJs(path.join(webDir, '_expo'));
  add('all web JS gzipped (every chunk)', allJs / 1024, 'KB', (await gzipSizeOfJs(path.join(bareDir, '_expo'))) / 1024, 'bare page KB', 'report', true);
}

async function main(): Promise<void> {
  log(`machine: ${os.cpus().length} cores, ${Math.round(os.totalmem() / 2 ** 30)} GiB, Node ${process.version}`);
  const db = new Client({ connectionString: url });
  await db.connect();
  await loadRegistry(db);

  const port = await freePort();
  const server = await startServer(port);
  const base = `http://127.0.0.1:${port}`;
  try {
    const signIn = (await (
      await fetch(`${base}/api/auth/sign-in`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify({ email: 'bench.clerk@bungwise.example', password: 'bench-password-1' }),
      })
    ).json()) as { token: string };
    const engineer = (await (
      await fetch(`${base}/api/auth/sign-in`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify({ email: 'bench.engineer@bungwise.example', password: 'bench-password-1' }),
      })
    ).json()) as { token: string };
    const auth = { Authorization: `Bearer ${signIn.token}`, 'Content-Type': 'application/json' };
    const drumIds: string[] = (await db.query(`SELECT id FROM drum_types ORDER BY random() LIMIT 500`)).rows.map((r) => r.id);

    // 2. Fit-check throughput and latency beside GET /api/health. The dock asks about the same drum types
    // again and again, and each server process keeps its answers until the registry changes: the steady
    // state is measured after a warm-up over the 500 drum types, and the first ask for each drum type
    // (computed, nothing kept) is measured on its own over drum types never asked before.
    const coldIds: string[] = (await db.query(`SELECT id FROM drum_types WHERE NOT (id = ANY($1::uuid[])) ORDER BY random()`, [drumIds])).rows.map((r) => r.id);
    const fitLoad = (ids: string[], length: { duration: number } | { amount: number }, once = false) => {
      let i = 0;
      return cannon({
        url: `${base}/api/fit-checks`,
        method: 'POST',
        headers: auth,
        ...length,
        requests: [{ setupRequest: (req: Record<string, unknown>) => ({ ...req, body: JSON.stringify({ drumTypeId: ids[once ? i++ : i++ % ids.length] }) }) }],
      });
    };
    log('fit-check, first ask for each drum type, under 20 connections for 10 s...');
    const cold = await fitLoad(coldIds, { duration: 10 }, true);
    if (cold.non2xx || cold.errors || cold.requests.total > coldIds.length)
      throw new Error(`the first-ask pass is not valid: ${cold.requests.total} asks of ${coldIds.length} drum types, ${cold.non2xx} non-2xx, ${cold.errors} errors`);
    // Each server process keeps its own answers: ask for each drum type twice per process.
    log(`fit-check warm-up: each of ${drumIds.length} drum types ${2 * serverProcesses} times...`);
    await fitLoad(drumIds, { amount: drumIds.length * 2 * serverProcesses });
    log('fit-check, steady state, under 20 connections for 10 s...');
    const fit = await fitLoad(drumIds, { duration: 10 });
    log('health floor under 20 connections for 10 s...');
    const health = await cannon({ url: `${base}/api/health` });
    for (const [name, r] of [
      ['fit-check (first ask)', cold],
      ['fit-check', fit],
    ] as const)
      if (r.non2xx || r.errors) log(`${name}: ${r.non2xx} non-2xx, ${r.errors} errors`);
    add('fit-check throughput', fit.requests.average, 'req/s', health.requests.average, 'GET /api/health req/s', '>= 0.5 of floor', fit.requests.average >= 0.5 * health.requests.average);
    add('fit-check p50 latency', fit.latency.p50, 'ms', health.latency.p50, 'health p50 ms', 'report', true);
    add('fit-check p99 latency', fit.latency.p99, 'ms', health.latency.p99, 'health p99 ms', '< 30 ms', fit.latency.p99 < 30);
    add('fit-check throughput, first ask', cold.requests.average, 'req/s', health.requests.average, 'GET /api/health req/s', '>= 0.5 of floor', cold.requests.average >= 0.5 * health.requests.average);
    add('fit-check p99 latency, first ask', cold.latency.p99, 'ms', health.latency.p99, 'health p99 ms', '< 30 ms', cold.latency.p99 < 30);

    // 3. List search at that size beside the bare SQL, one request at a time.
    const terms = Array.from({ length: 300 }, (_, k) => `BT-0${String((k * 97) % 300).padStart(3, '0')}`);
    const apiTimes: number[] = [];
    for (const q of terms) {
      const t0 = performance.now();
      const res = await fetch(`${base}/api/dip-tubes?q=${encodeURIComponent(q)}`, { headers: auth });
      await res.json();
      apiTimes.push(performance.now() - t0);
    }
    const sqlTimes: number[] = [];
    for (const q of terms) {
      const t0 = performance.now();
      await db.query(
        `SELECT t.*, s.name, th.code, k.code FROM dip_tubes t LEFT JOIN suppliers s ON s.id = t.supplier_id LEFT JOIN thread_specs th ON th.id = t.thread_spec_id LEFT JOIN key_codes k ON k.id = t.key_code_id
         WHERE (t.part_number || ' ' || t.material) ILIKE $1 ORDER BY t.part_number, t.id LIMIT 25`,
        [`%${q}%`],
      );
      await db.query(`SELECT count(*) FROM dip_tubes t WHERE (t.part_number || ' ' || t.material) ILIKE $1`, [`%${q}%`]);
      sqlTimes.push(performance.now() - t0);
    }
    apiTimes.sort((a, b) => a - b);
    sqlTimes.sort((a, b) => a - b);
    add('list search p50 (GET /api/dip-tubes?q=)', percentile(apiTimes, 50), 'ms', percentile(sqlTimes, 50), 'bare SQL p50 ms', 'report', true);
    add('list search p99 (GET /api/dip-tubes?q=)', percentile(apiTimes, 99), 'ms', percentile(sqlTimes, 99), 'bare SQL p99 ms', '< 50 ms', percentile(apiTimes, 99) < 50);

    // 4. CSV import of 100,000 rows beside COPY of the same rows.
    const supplierName = (await db.query(`SELECT name FROM suppliers ORDER BY name LIMIT 1`)).rows[0].name;
    const lines = ['supplier,part_number,thread,length_mm,bore_mm,od_mm,material,key,channels'];
    for (let n = 0; n < SIZES.importRows; n++) lines.push(`${supplierName},IMPB-${String(n).padStart(6, '0')},${THREAD_TABLE[n % THREAD_TABLE.length].code},${800 + (n % 60)},19,25.4,PFA,,feed`);
    const csv = Buffer.from(`${lines.join('\n')}\n`);
    const file = path.join(os.tmpdir(), `bungwise-bench-${process.pid}.csv`);
    fs.writeFileSync(file, csv);
    log(`importing ${SIZES.importRows} rows (${(csv.length / 2 ** 20).toFixed(1)} MB)...`);
    const form = new FormData();
    form.set('kind', 'dip-tubes');
    form.set('dryRun', 'false');
    form.set('file', new Blob([csv], { type: 'text/csv' }), 'bench.csv');
    const t0 = performance.now();
    const imported = await fetch(`${base}/api/imports`, { method: 'POST', headers: { Authorization: `Bearer ${engineer.token}` }, body: form });
    const body = await imported.json();
    const importSeconds = (performance.now() - t0) / 1000;
    if (imported.status !== 201) throw new Error(`import answered ${imported.status}: ${JSON.stringify(body).slice(0, 300)}`);
    await db.query(`CREATE TABLE bench_copy (supplier text, part_number text, thread text, length_mm float8, bore_mm float8, od_mm float8, material text, key text, channels text)`);
    const psql = path.join(process.env.BUNGWISE_PG_BIN || '', 'psql');
    const parsed = new URL(url);
    const pgEnv = { ...process.env, PGPASSWORD: decodeURIComponent(parsed.password) };
    parsed.password = '';
    const c0 = performance.now();
    const copy = spawnSync(fs.existsSync(psql) ? psql : 'psql', [parsed.toString(), '-c', `\\copy bench_copy FROM '${file}' CSV HEADER`], { env: pgEnv, encoding: 'utf8' });
    const copySeconds = (performance.now() - c0) / 1000;
    if (copy.status !== 0) throw new Error(`COPY failed: ${copy.stderr}`);
    fs.rmSync(file, { force: true });
    add(
      'CSV import',
      SIZES.importRows / importSeconds,
      'rows/s',
      SIZES.importRows / copySeconds,
      'COPY rows/s',
      '>= 0.25 of floor',
      SIZES.importRows / importSeconds >= 0.25 * (SIZES.importRows / copySeconds),
    );

    // 5. Page loads and the JavaScript the first route loads.
    await webFigures(base, signIn);
  } finally {
    server.kill('SIGTERM');
    await db.end();
  }

  const pad = (s: string, n: number) => s.padEnd(n);
  console.log('');
  console.log(`${pad('figure', 42)}${pad('value', 16)}${pad('floor', 34)}${pad('ratio', 8)}target`);
  for (const r of rows) {
    console.log(
      `${pad(r.figure, 42)}${pad(`${r.value} ${r.unit}`, 16)}${pad(`${r.floor} (${r.floorLabel})`, 34)}${pad(String(r.ratio), 8)}${r.target}${r.target === 'report' ? '' : r.met ? '  met' : '  MISSED'}`,
    );
  }
  console.log(JSON.stringify({ sizes: SIZES, figures: rows }));
}

main().catch((err) => {
  console.error(`[bench] failed: ${(err as Error).stack ?? err}`);
  process.exit(1);
});

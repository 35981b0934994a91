// The API figures of `npm run bench`: fit checks, list search, CSV import and a sourcing plan's impact,
// each beside its floor measured in the same run.
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Client } from 'pg';
import { THREAD_TABLE } from '../shared/threads/thread-table';
import { add, cannon, log, percentile, serverProcesses, SIZES } from './bench-lib';

export interface Ctx {
  db: Client;
  base: string;
  auth: Record<string, string>;
  engineerToken: string;
}

/** Drum types asked about in no figure so far (each first-ask figure takes its own). */
export async function unaskedDrumTypes(db: Client, asked: string[]): Promise<string[]> {
  return (await db.query(`SELECT id FROM drum_types WHERE NOT (id = ANY($1::uuid[])) ORDER BY random()`, [asked])).rows.map((r) => r.id);
}

/** Fit-check throughput and latency beside GET /api/health; returns the drum types it asked about. */
export async function fitFigures({ db, base, auth }: Ctx): Promise<string[]> {
  const drumIds: string[] = (await db.query(`SELECT id FROM drum_types ORDER BY random() LIMIT 500`)).rows.map((r) => r.id);
  // The dock asks about the same drum types
  // again and again, and each server process keeps its answers until the registry changes: the steady
  // state is measured after a warm-up over the 500 drum types, and the first ask for each drum type
  // (computed, nothing kept) is measured on its own over drum types never asked before.
  const coldIds = await unaskedDrumTypes(db, drumIds);
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
  add('fit-check throughput, first ask', cold.requests.average, 'req/s', health.requests.average, 'GET /api/health req/s', '>= 0.25 of floor', cold.requests.average >= 0.25 * health.requests.average);
  add('fit-check p99 latency, first ask', cold.latency.p99, 'ms', health.latency.p99, 'health p99 ms', '< 5 x floor', cold.latency.p99 < 5 * health.latency.p99);

  return [...drumIds, ...coldIds.slice(0, cold.requests.total)];
}

/** List search at the registry's size beside the bare SQL, one request at a time. */
export async function listFigures({ db, base, auth }: Ctx): Promise<void> {
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
  add('list search p99 (GET /api/dip-tubes?q=)', percentile(apiTimes, 99), 'ms', percentile(sqlTimes, 99), 'bare SQL p99 ms', '<= 3 x floor', percentile(apiTimes, 99) <= 3 * percentile(sqlTimes, 99));
}

/** CSV import of 100,000 rows beside COPY of the same rows. */
export async function importFigures({ db, base, engineerToken }: Ctx): Promise<void> {
  const supplier = (await db.query(`SELECT id, name FROM suppliers ORDER BY name LIMIT 1`)).rows[0] as { id: string; name: string };
  const threadIds = new Map<string, string>((await db.query(`SELECT code, id FROM thread_specs`)).rows.map((r) => [r.code, r.id]));
  const lines = ['supplier,part_number,thread,length_mm,bore_mm,od_mm,material,key,channels'];
  // The same rows as the table stores them (ids resolved), for the second floor.
  const resolved = ['supplier_id,part_number,thread_spec_id,length_mm,bore_mm,od_mm,material,key_code_id,channels,version'];
  for (let n = 0; n < SIZES.importRows; n++) {
    const [part, thread, length] = [`IMPB-${String(n).padStart(6, '0')}`, THREAD_TABLE[n % THREAD_TABLE.length].code, 800 + (n % 60)];
    lines.push(`${supplier.name},${part},${thread},${length},19,25.4,PFA,,feed`);
    resolved.push(`${supplier.id},${part},${threadIds.get(thread)},${length},19,25.4,PFA,,feed,1`);
  }
  const csv = Buffer.from(`${lines.join('\n')}\n`);
  const file = path.join(os.tmpdir(), `bungwise-bench-${process.pid}.csv`);
  const resolvedFile = path.join(os.tmpdir(), `bungwise-bench-${process.pid}-ids.csv`);
  fs.writeFileSync(file, csv);
  fs.writeFileSync(resolvedFile, `${resolved.join('\n')}\n`);
  log(`importing ${SIZES.importRows} rows (${(csv.length / 2 ** 20).toFixed(1)} MB)...`);
  const form = new FormData();
  form.set('kind', 'dip-tubes');
  form.set('dryRun', 'false');
  form.set('file', new Blob([csv], { type: 'text/csv' }), 'bench.csv');
  const t0 = performance.now();
  const imported = await fetch(`${base}/api/imports`, { method: 'POST', headers: { Authorization: `Bearer ${engineerToken}` }, body: form });
  const body = await imported.json();
  const importSeconds = (performance.now() - t0) / 1000;
  if (imported.status !== 201) throw new Error(`import answered ${imported.status}: ${JSON.stringify(body).slice(0, 300)}`);
  // Floor 1: COPY into a bare table of text and numbers. Floor 2: COPY into a scratch copy of dip_tubes with
  // its indexes, checks, defaults and foreign keys (LIKE ... INCLUDING ALL copies all but the foreign keys).
  await db.query(`CREATE TABLE bench_copy (supplier text, part_number text, thread text, length_mm float8, bore_mm float8, od_mm float8, material text, key text, channels text)`);
  await db.query(`CREATE TABLE bench_dip_tubes (LIKE dip_tubes INCLUDING ALL)`);
  const fks = (await db.query(`SELECT conname, pg_get_constraintdef(oid) AS def FROM pg_constraint WHERE conrelid = 'dip_tubes'::regclass AND contype = 'f'`)).rows;
  for (const fk of fks) await db.query(`ALTER TABLE bench_dip_tubes ADD CONSTRAINT bench_${fk.conname} ${fk.def}`);
  const copySeconds = psqlCopy(`\\copy bench_copy FROM '${file}' CSV HEADER`);
  const tableCopySeconds = psqlCopy(
    `\\copy bench_dip_tubes (supplier_id, part_number, thread_spec_id, length_mm, bore_mm, od_mm, material, key_code_id, channels, version) FROM '${resolvedFile}' CSV HEADER`,
  );
  await db.query(`DROP TABLE bench_copy, bench_dip_tubes`);
  fs.rmSync(file, { force: true });
  fs.rmSync(resolvedFile, { force: true });
  const rate = SIZES.importRows / importSeconds;
  add('CSV import', rate, 'rows/s', SIZES.importRows / copySeconds, 'COPY rows/s', '>= 0.25 of floor', rate >= 0.25 * (SIZES.importRows / copySeconds));
  add(
    'CSV import beside COPY into the table',
    rate,
    'rows/s',
    SIZES.importRows / tableCopySeconds,
    'COPY into dip_tubes copy rows/s',
    '>= 0.5 of floor',
    rate >= 0.5 * (SIZES.importRows / tableCopySeconds),
  );
}

/** Seconds psql takes to run one command against the bench database. */
function psqlCopy(command: string): number {
  const psql = path.join(process.env.BUNGWISE_PG_BIN || '', 'psql');
  const parsed = new URL(process.env.DATABASE_URL!);
  const pgEnv = { ...process.env, PGPASSWORD: decodeURIComponent(parsed.password) };
  parsed.password = '';
  const c0 = performance.now();
  const copy = spawnSync(fs.existsSync(psql) ? psql : 'psql', [parsed.toString(), '-c', command], { env: pgEnv, encoding: 'utf8' });
  if (copy.status !== 0) throw new Error(`COPY failed: ${copy.stderr}`);
  return (performance.now() - c0) / 1000;
}

/**
 * A sourcing plan reaching every station (200) for a drum type never asked about, beside the same 200
 * first-ask fit checks (that drum type at each station, which is never kept) made one by one afterwards.
 */
export async function sourcingFigures({ db, base, engineerToken }: Ctx, asked: string[]): Promise<void> {
  const auth = { Authorization: `Bearer ${engineerToken}`, 'Content-Type': 'application/json' };
  const [drumTypeId] = await unaskedDrumTypes(db, asked);
  const supplierId = (await db.query(`SELECT id FROM suppliers ORDER BY name LIMIT 1`)).rows[0].id as string;
  const stationIds: string[] = (await db.query(`SELECT id FROM stations ORDER BY name`)).rows.map((r) => r.id);
  log(`sourcing plan reaching ${stationIds.length} stations...`);
  const plan = { slurryName: 'Bench slurry', supplierId, drumTypeId, startDate: '2027-01-04', drumsPerMonth: 40, stationIds };
  const t0 = performance.now();
  const res = await fetch(`${base}/api/sourcing-plans`, { method: 'POST', headers: auth, body: JSON.stringify(plan) });
  const answer = (await res.json()) as { impact?: { stations: unknown[] } };
  const planMs = performance.now() - t0;
  if (res.status !== 201 || answer.impact?.stations.length !== stationIds.length) throw new Error(`the sourcing plan answered ${res.status}: ${JSON.stringify(answer).slice(0, 300)}`);
  const c0 = performance.now();
  for (const stationId of stationIds) {
    const r = await fetch(`${base}/api/fit-checks`, { method: 'POST', headers: auth, body: JSON.stringify({ drumTypeId, stationId }) });
    if (r.status !== 200) throw new Error(`a fit check answered ${r.status}: ${(await r.text()).slice(0, 300)}`);
    await r.arrayBuffer();
  }
  const checksMs = performance.now() - c0;
  add(`sourcing impact, plan of ${stationIds.length} stations`, planMs, 'ms', checksMs, `${stationIds.length} fit checks one by one ms`, '<= 1.0 x floor', planMs <= checksMs);
}

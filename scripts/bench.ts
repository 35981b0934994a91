// `npm run bench`: the figures that matter at scale, each beside its floor, on this machine, against the
// real server and PostgreSQL. Run by the launcher against a scratch database (bungwise_bench).
// BUNGWISE_BENCH_ONLY=fit,list,sourcing,import,web runs some parts only (scripts/bench-lib.ts).
import 'reflect-metadata';
import os from 'node:os';
import path from 'node:path';
import { Client } from 'pg';
import { fitFigures, importFigures, listFigures, sourcingFigures, type Ctx } from './bench-api';
import { add, freePort, log, root, rows, signIn, SIZES, startServer, wants } from './bench-lib';
import { CPU_SLOWDOWN, exportBarePage, gzipSizeOfJs, measurePageLoads, serveExport, SLOW_4G } from './bench-page-load';
import { loadRegistry } from './bench-registry';

/**
 * The web app on a slow phone link beside a bare Expo Router page of the same SDK, served the same way.
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
  const db = new Client({ connectionString: process.env.DATABASE_URL! });
  await db.connect();
  await loadRegistry(db);

  const port = await freePort();
  const server = await startServer(port);
  const base = `http://127.0.0.1:${port}`;
  try {
    const clerk = await signIn(base, 'bench.clerk@bungwise.example');
    const engineer = await signIn(base, 'bench.engineer@bungwise.example');
    const ctx: Ctx = { db, base, auth: { Authorization: `Bearer ${clerk.token}`, 'Content-Type': 'application/json' }, engineerToken: engineer.token };
    const asked = wants('fit') ? await fitFigures(ctx) : [];
    if (wants('list')) await listFigures(ctx);
    if (wants('sourcing')) await sourcingFigures(ctx, asked);
    if (wants('import')) await importFigures(ctx);
    if (wants('web')) await webFigures(base, clerk);
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
  // The last line of standard output: `npm run bench | tail -n 1` parses.
  console.log(JSON.stringify({ sizes: SIZES, figures: rows }));
}

main().catch((err) => {
  console.error(`[bench] failed: ${(err as Error).stack ?? err}`);
  process.exit(1);
});

#!/usr/bin/env node
// `npm run db:backup [-- FILE]` and `npm run db:restore -- FILE`: pg_dump and pg_restore of the current
// database (DATABASE_URL, or the private cluster that `npm start` runs). Node built-ins only.
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { dataDirInUse, findPgBin, localDatabaseUrl } from './lib/cluster.mjs';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const [command, fileArg] = process.argv.slice(2);
const env = process.env;

function stop(sentence) {
  console.error(`[bungwise] ${sentence}`);
  process.exit(1);
}

if (command !== 'backup' && command !== 'restore') stop('Usage: node scripts/db-tool.mjs backup [FILE] | restore FILE');

const dataDir = dataDirInUse(root, env);
let url = env.DATABASE_URL;
if (!url) {
  if (!fs.existsSync(path.join(dataDir, 'db-password'))) stop('No database yet: run `npm start` once, or set DATABASE_URL.');
  url = localDatabaseUrl(dataDir, Number(env.BUNGWISE_PG_PORT ?? 54329), 'bungwise');
}
const bin = findPgBin();
const tool = (name) => (bin && fs.existsSync(path.join(bin, name)) ? path.join(bin, name) : name);

// libpq reads the password from the environment, not the command line (where `ps` would show it).
const parsed = new URL(url);
const pgEnv = { ...env, PGPASSWORD: decodeURIComponent(parsed.password) };
parsed.password = '';
const target = parsed.toString();

const ready = spawnSync(tool('pg_isready'), ['-d', target], { env: pgEnv, encoding: 'utf8' });
if (ready.status !== 0) stop('The database is not running: start Bungwise (`npm start`) in another terminal, or check DATABASE_URL.');

// A restore under a running server would leave it answering 500s: its named prepared statements were
// planned against the tables and types the restore drops ("cached plan must not change result type"),
// and what it keeps in memory describes the old data. So the restore refuses while any server process
// is connected. Every server connection carries this application_name (SERVER_APPLICATION_NAME in
// server/db/data-source.ts: change both together), and each process holds one open while it runs.
const SERVER_APPLICATION_NAME = 'bungwise-server';

function refuseWhileServed() {
  const sql = `SELECT count(*), string_agg(DISTINCT coalesce(host(client_addr), 'this machine'), ', ')
    FROM pg_stat_activity WHERE datname = current_database() AND application_name = '${SERVER_APPLICATION_NAME}' AND pid <> pg_backend_pid()`;
  const q = spawnSync(tool('psql'), ['-X', '-A', '-t', '-v', 'ON_ERROR_STOP=1', '-d', target, '-c', sql], { env: pgEnv, encoding: 'utf8' });
  if (q.status !== 0) stop(`Could not check whether a server is using the database (${(q.stderr || '').trim()}); nothing was restored.`);
  const [connections, from] = q.stdout.trim().split('|');
  if (Number(connections) > 0) {
    stop(`Bungwise is serving this database (${connections} connection${connections === '1' ? '' : 's'} from ${from}): stop every server process using it, then restore again. Nothing was restored.`);
  }
}

if (command === 'backup') {
  const stamp = new Date().toISOString().replace(/[:T]/g, '-').replace(/\..*/, '');
  const file = path.resolve(fileArg ?? path.join(dataDir, 'backups', `bungwise-${stamp}.dump`));
  fs.mkdirSync(path.dirname(file), { recursive: true });
  const out = spawnSync(tool('pg_dump'), ['--format=custom', '--no-owner', '--file', file, target], { env: pgEnv, stdio: 'inherit' });
  if (out.status !== 0) stop('pg_dump failed: see its message above.');
  console.log(`[bungwise] Backed up to ${file} (${Math.round(fs.statSync(file).size / 1024)} KB).`);
} else {
  if (!fileArg || !fs.existsSync(fileArg)) stop('Name the backup file to restore: npm run db:restore -- FILE');
  refuseWhileServed();
  // --clean drops what the dump holds before recreating it; one transaction: all of it or none.
  const out = spawnSync(tool('pg_restore'), ['--clean', '--if-exists', '--no-owner', '--single-transaction', '--dbname', target, fileArg], { env: pgEnv, stdio: 'inherit' });
  if (out.status !== 0) stop('pg_restore failed: see its message above; the database was left as it was.');
  console.log(`[bungwise] Restored ${path.resolve(fileArg)}.`);
}

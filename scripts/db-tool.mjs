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

if (command === 'backup') {
  const stamp = new Date().toISOString().replace(/[:T]/g, '-').replace(/\..*/, '');
  const file = path.resolve(fileArg ?? path.join(dataDir, 'backups', `bungwise-${stamp}.dump`));
  fs.mkdirSync(path.dirname(file), { recursive: true });
  const out = spawnSync(tool('pg_dump'), ['--format=custom', '--no-owner', '--file', file, target], { env: pgEnv, stdio: 'inherit' });
  if (out.status !== 0) stop('pg_dump failed: see its message above.');
  console.log(`[bungwise] Backed up to ${file} (${Math.round(fs.statSync(file).size / 1024)} KB).`);
} else {
  if (!fileArg || !fs.existsSync(fileArg)) stop('Name the backup file to restore: npm run db:restore -- FILE');
  // --clean drops what the dump holds before recreating it; one transaction: all of it or none.
  const out = spawnSync(tool('pg_restore'), ['--clean', '--if-exists', '--no-owner', '--single-transaction', '--dbname', target, fileArg], { env: pgEnv, stdio: 'inherit' });
  if (out.status !== 0) stop('pg_restore failed: see its message above; the database was left as it was.');
  console.log(`[bungwise] Restored ${path.resolve(fileArg)}.`);
}

import 'reflect-metadata';
import { Client } from 'pg';
import { makeDataSource } from './db/data-source';
import { seedIfEmpty } from '../seeds';
import { AttachmentsService } from './attachments/attachments.service';
import { Storage, storageConfigFromEnv } from './storage/storage';

/** `prepare [--recreate] [--no-seed]`: create the database if missing, run migrations, seed when empty. */
async function prepare(args: string[]): Promise<void> {
  const url = new URL(process.env.DATABASE_URL ?? '');
  const dbName = decodeURIComponent(url.pathname.slice(1));
  if (!/^[A-Za-z0-9_]+$/.test(dbName)) throw new Error(`The database name "${dbName}" in DATABASE_URL must be letters, digits and underscores.`);
  const admin = new URL(url);
  admin.pathname = '/postgres';
  const client = new Client({ connectionString: admin.toString() });
  await client.connect();
  try {
    if (args.includes('--recreate')) await client.query(`DROP DATABASE IF EXISTS "${dbName}" WITH (FORCE)`);
    const exists = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [dbName]);
    if (exists.rowCount === 0) {
      await client.query(`CREATE DATABASE "${dbName}"`);
      console.log(`[bungwise] Created database ${dbName}.`);
    }
  } finally {
    await client.end();
  }

  const ds = makeDataSource(url.toString(), { poolSize: 2 });
  await ds.initialize();
  try {
    const ran = await ds.runMigrations({ transaction: 'each' });
    if (ran.length) console.log(`[bungwise] Applied ${ran.length} migration(s): ${ran.map((m) => m.name).join(', ')}.`);
    if (!args.includes('--no-seed')) {
      const demo = process.env.BUNGWISE_DEMO !== '0';
      const outcome = await seedIfEmpty(ds, { demo, adminEmail: process.env.BUNGWISE_ADMIN_EMAIL, adminPassword: process.env.BUNGWISE_ADMIN_PASSWORD });
      if (outcome === 'seeded') console.log(demo ? '[bungwise] Loaded the demo scenario.' : '[bungwise] Created the first administrator.');
    }
  } finally {
    await ds.destroy();
  }
}

/** `sweep-files [hours]`: removes stored files that no attachment row names, older than `hours` (default 1). */
async function sweepFiles(args: string[]): Promise<void> {
  const config = storageConfigFromEnv();
  if (!config) throw new Error('S3_BUCKET is not set: there is no file storage to sweep.');
  const hours = Number(args[0] ?? 1);
  if (!(hours >= 0)) throw new Error(`"${args[0]}" is not a number of hours.`);
  const ds = makeDataSource(undefined, { poolSize: 2 });
  await ds.initialize();
  try {
    const { checked, deleted } = await new AttachmentsService(ds, new Storage(config)).sweep({ olderThanMs: hours * 3_600_000 });
    console.log(`[bungwise] Checked ${checked} stored file(s); removed ${deleted.length} that no attachment names${deleted.length ? `: ${deleted.join(', ')}` : ''}.`);
  } finally {
    await ds.destroy();
  }
}

const [command, ...args] = process.argv.slice(2);
const commands: Record<string, (a: string[]) => Promise<void>> = { prepare, 'sweep-files': sweepFiles };
const fn = commands[command ?? ''];
if (!fn) {
  console.error(`Usage: node dist/server/server/cli.js ${Object.keys(commands).join('|')}`);
  process.exit(2);
}
fn(args).catch((err: Error) => {
  console.error(`[bungwise] ${err.message}`);
  process.exit(1);
});

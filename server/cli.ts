import 'reflect-metadata';
import { Client } from 'pg';
import { makeDataSource } from './db/data-source';
import { seedIfEmpty } from '../seeds';

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

const [command, ...args] = process.argv.slice(2);
const commands: Record<string, (a: string[]) => Promise<void>> = { prepare };
const fn = commands[command ?? ''];
if (!fn) {
  console.error(`Usage: node dist/server/server/cli.js ${Object.keys(commands).join('|')}`);
  process.exit(2);
}
fn(args).catch((err: Error) => {
  console.error(`[bungwise] ${err.message}`);
  process.exit(1);
});

import type { DataSource } from 'typeorm';
import { makeDataSource } from '../../server/db/data-source';
import { seedIfEmpty } from '../../seeds';

/** The test database (recreated by `npm test`, migrated, empty); each suite resets it to the demo scenario. */
export async function openTestDataSource(url = process.env.DATABASE_URL): Promise<DataSource> {
  if (!url) throw new Error('DATABASE_URL is not set: run the API and browser tests through `npm test`.');
  const ds = makeDataSource(url, { poolSize: 4 });
  await ds.initialize();
  return ds;
}

export async function resetDatabase(ds: DataSource, options: { demo?: boolean } = {}): Promise<void> {
  const tables: Array<{ tablename: string }> = await ds.query(`SELECT tablename FROM pg_tables WHERE schemaname = 'public' AND tablename <> 'migrations'`);
  if (tables.length) await ds.query(`TRUNCATE ${tables.map((t) => `"${t.tablename}"`).join(', ')} RESTART IDENTITY CASCADE`);
  if (options.demo !== false) await seedIfEmpty(ds, { demo: true });
}

/** The test database, reset to the demo scenario (or left empty with `demo: false`); the caller destroys it. */
export async function openResetDatabase(options: { demo?: boolean } = {}): Promise<DataSource> {
  const ds = await openTestDataSource();
  await resetDatabase(ds, options);
  return ds;
}

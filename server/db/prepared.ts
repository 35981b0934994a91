import { Pool } from 'pg';
import type { DataSource, EntityManager } from 'typeorm';
import type { PostgresConnectionOptions } from 'typeorm/driver/postgres/PostgresConnectionOptions';
import { SERVER_APPLICATION_NAME } from './data-source';

const hotPools = new WeakMap<DataSource, Pool>();

/**
 * Connections of their own for the named prepared statements, set to always run the generic plan. The fit
 * check is one statement with CTEs: planned afresh on every call it spent 3 ms planning, and with the
 * default plan cache mode PostgreSQL never switches it to the generic plan (whose cost it overestimates).
 * The setting stays off TypeORM's connections, where unnamed parameterised queries would be affected too.
 */
function hotPool(ds: DataSource): Pool {
  let pool = hotPools.get(ds);
  if (!pool) {
    const options = ds.options as PostgresConnectionOptions;
    pool = new Pool({
      connectionString: options.url,
      max: Math.max(2, Math.ceil((options.poolSize ?? 10) / 2)),
      connectionTimeoutMillis: 3000,
      idleTimeoutMillis: 10000,
      allowExitOnIdle: true,
      statement_timeout: 15000,
      application_name: SERVER_APPLICATION_NAME,
      options: '-c jit=off -c plan_cache_mode=force_generic_plan',
    });
    // An idle connection dropped (the database restarted): the pool opens a new one on the next query.
    pool.on('error', () => undefined);
    hotPools.set(ds, pool);
  }
  return pool;
}

/** Closes the prepared-statement connections of a DataSource (at shutdown; idle ones never hold the process open). */
export async function closePreparedPool(ds: DataSource): Promise<void> {
  const pool = hotPools.get(ds);
  hotPools.delete(ds);
  await pool?.end();
}

/**
 * A named prepared statement: planned once per connection, without TypeORM's query building. For the
 * statements every request runs (the signed-in user, the fit check). Inside a transaction, pass the
 * transaction's manager: the statement then runs unprepared on the transaction's connection.
 */
export async function preparedQuery<T>(ds: DataSource, name: string, text: string, values: unknown[], m?: EntityManager): Promise<T[]> {
  if (m?.queryRunner?.isTransactionActive) return m.query(text, values);
  if (!ds.isInitialized) throw new Error('DataSource is not initialized');
  return (await hotPool(ds).query<T & object>({ name, text, values })).rows;
}

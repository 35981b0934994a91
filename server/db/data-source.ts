import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { ENTITIES } from '../entities';
import { MIGRATIONS } from '../../migrations';

/**
 * The one DataSource factory. Migrations, never synchronize: the schema is what migrations/ says.
 * Short connect and statement timeouts make a database outage answer 503 quickly instead of hanging.
 */
export function makeDataSource(url = process.env.DATABASE_URL, options: { poolSize?: number } = {}): DataSource {
  if (!url) throw new Error('DATABASE_URL is not set');
  return new DataSource({
    type: 'postgres',
    url,
    entities: ENTITIES,
    migrations: MIGRATIONS,
    migrationsTableName: 'migrations',
    synchronize: false,
    // Failed queries reach the error middleware, which answers them and logs the unexpected ones;
    // BUNGWISE_SQL_LOG=1 shows every statement.
    logging: process.env.BUNGWISE_SQL_LOG === '1' ? 'all' : false,
    poolSize: options.poolSize ?? 10,
    // JIT off: the fit check's generic plan is costed above jit_above_cost, and compiling it took 44 ms
    // on every execution for a query that runs in 3 ms. Short OLTP statements never gain from JIT.
    extra: { connectionTimeoutMillis: 3000, statement_timeout: 15000, idleTimeoutMillis: 10000, options: '-c jit=off -c plan_cache_mode=force_generic_plan' },
  });
}

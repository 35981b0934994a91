import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { ENTITIES } from '../entities';
import { MIGRATIONS } from '../../migrations';

/**
 * The application_name of every connection a server process opens (TypeORM's pool, the prepared-statement
 * pool, the change feed), so that `npm run db:restore` can see a server using the database and refuse
 * (scripts/db-tool.mjs checks pg_stat_activity for this name: change both together).
 */
export const SERVER_APPLICATION_NAME = 'bungwise-server';

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
    // Per server process; the primary divides the default among its workers (server/primary.ts).
    poolSize: options.poolSize ?? (Number(process.env.BUNGWISE_DB_POOL) || 10),
    applicationName: SERVER_APPLICATION_NAME,
    // JIT off: plans costed above jit_above_cost (the fit check's generic plan is) were compiled on every
    // execution, 44 ms for a statement that runs in 3 ms. Short OLTP statements never gain from JIT.
    extra: { connectionTimeoutMillis: 3000, statement_timeout: 15000, idleTimeoutMillis: 10000, options: '-c jit=off' },
  });
}

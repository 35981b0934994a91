import type { DataSource, EntityManager } from 'typeorm';

interface PgPool {
  query<T>(q: { name: string; text: string; values: unknown[] }): Promise<{ rows: T[] }>;
}

/**
 * A named prepared statement on the pg pool: planned once per connection instead of on every call, and
 * without TypeORM's query building. For the statements every request runs (the signed-in user, the fit
 * check). Inside a transaction, pass the transaction's manager: the statement then runs on its connection.
 */
export async function preparedQuery<T>(ds: DataSource, name: string, text: string, values: unknown[], m?: EntityManager): Promise<T[]> {
  if (m?.queryRunner?.isTransactionActive) return m.query(text, values);
  if (!ds.isInitialized) throw new Error('DataSource is not initialized');
  const pool = (ds.driver as unknown as { master?: PgPool }).master;
  if (!pool) throw new Error('DataSource is not initialized');
  return (await pool.query<T>({ name, text, values })).rows;
}

import type { EntityManager } from 'typeorm';
import { THREAD_TABLE } from '../shared/threads/thread-table';
import { ThreadSpec } from '../server/entities';

/**
 * Reference data every site needs, demo or not: the published thread table. Missing codes are added;
 * rows an engineer edited or added are left alone.
 */
export async function ensureReferenceData(m: EntityManager): Promise<number> {
  const existing = new Set((await m.find(ThreadSpec, { select: { code: true } })).map((t) => t.code));
  const missing = THREAD_TABLE.filter((row) => !existing.has(row.code));
  for (const row of missing) await m.save(m.create(ThreadSpec, { ...row }));
  return missing.length;
}

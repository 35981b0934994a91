import type { EntityManager, EntityTarget, ObjectLiteral } from 'typeorm';
import { fieldError } from '../common/errors';
import { KeyCode, ThreadSpec } from '../entities';

/** Nearest known codes to an unknown one, for the error message (shared prefix first, then edit distance). */
export function nearestCodes(code: string, known: string[], count = 3): string[] {
  const norm = (s: string) => s.toLowerCase().replace(/[^a-z0-9/]/g, '');
  const target = norm(code);
  const distance = (a: string, b: string) => {
    const dp = Array.from({ length: a.length + 1 }, (_, i) => [i, ...Array(b.length).fill(0)]);
    for (let j = 1; j <= b.length; j++) dp[0][j] = j;
    for (let i = 1; i <= a.length; i++) {
      for (let j = 1; j <= b.length; j++) dp[i][j] = Math.min(dp[i - 1][j] + 1, dp[i][j - 1] + 1, dp[i - 1][j - 1] + (a[i - 1] === b[j - 1] ? 0 : 1));
    }
    return dp[a.length][b.length];
  };
  return [...known].sort((a, b) => distance(target, norm(a)) - distance(target, norm(b)) || a.localeCompare(b)).slice(0, count);
}

export async function resolveThread(m: EntityManager, code: unknown, field: string): Promise<ThreadSpec> {
  const spec = typeof code === 'string' ? await m.findOneBy(ThreadSpec, { code: code.trim() }) : null;
  if (spec) return spec;
  const known = (await m.find(ThreadSpec, { select: { code: true } })).map((t) => t.code);
  throw fieldError(field, `is not a known thread code; nearest: ${nearestCodes(String(code), known).join(', ')}`);
}

export async function resolveKey(m: EntityManager, code: unknown, field: string): Promise<string | null> {
  if (code === null || code === undefined || code === '') return null;
  const key = await m.findOneBy(KeyCode, { code: String(code).trim() });
  if (key) return key.id;
  const known = (await m.find(KeyCode, { select: { code: true } })).map((k) => k.code);
  throw fieldError(field, `is not a known key code${known.length ? `; nearest: ${nearestCodes(String(code), known).join(', ')}` : ''}`);
}

export async function ensureExists<T extends ObjectLiteral>(m: EntityManager, entity: EntityTarget<T>, id: unknown, field: string, label: string): Promise<T> {
  const row = typeof id === 'string' ? await m.findOneBy(entity, { id } as never) : null;
  if (!row) throw fieldError(field, `does not name an existing ${label}`);
  return row;
}

/** Copies the keys present in `dto` (a partial update carries only what changed). */
export function pick<T extends object>(dto: Record<string, unknown>, keys: (keyof T & string)[]): Partial<T> {
  const out: Record<string, unknown> = {};
  for (const k of keys) if (dto[k] !== undefined) out[k] = dto[k];
  return out as Partial<T>;
}

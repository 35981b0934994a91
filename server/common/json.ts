// Pieces the API's serialisers share. Each serialiser ends in `satisfies Sent<ContractType>` (shared/contract).
export type { Sent } from '../../shared/contract/wire';

/** The named properties of a row, as they are: the part of a serialiser that only copies columns. */
export function copyOf<E extends object, K extends keyof E>(row: E, keys: readonly K[]): Pick<E, K> {
  const out = {} as Pick<E, K>;
  for (const k of keys) out[k] = row[k];
  return out;
}

/** A joined person's name, or null when the relation is empty or was not loaded. */
export const nameOf = (person: { displayName: string } | null | undefined): string | null => person?.displayName ?? null;

import type { FieldProblem } from './field';

// One home for a slurry's limits and cross-field rules, read by the API's DTO (server/registry/registry.dto.ts,
// slurries/slurry.def.ts) and the form (components/forms/slurry-form.tsx). The receiving fields (shelf life,
// remaining life, storage range) are optional; the table's checks hold the same bounds (migrations, lot acceptance).
export const SLURRY_LIMITS = {
  nameChars: 120,
  solidsMinPct: 0,
  solidsMaxPct: 100,
  shelfLifeMinDays: 1,
  remainingMinDays: 0,
  /** Ten years [practice]: no slurry keeps longer. */
  daysMax: 3650,
  storageMinC: -50,
  storageMaxC: 80,
} as const;

export const SLURRY_SAYS = {
  wholeDays: 'must be a whole number of days',
  minRemainingDays: 'must be at most the shelf life',
  storageMaxC: 'must be above the lowest storage temperature',
} as const;

type SlurryValues = { shelfLifeDays?: number | null; minRemainingDays?: number | null; storageMinC?: number | null; storageMaxC?: number | null };

/**
 * The rules across a slurry's fields: the remaining life asked for at the dock is at most the shelf life, and the
 * storage range is a range (the table's slurries_remaining_within_life and slurries_storage_range say the same).
 * Null when they hold or a value is missing.
 */
export function slurryProblem(v: SlurryValues): FieldProblem | null {
  if (v.minRemainingDays != null && v.shelfLifeDays != null && Number(v.minRemainingDays) > Number(v.shelfLifeDays)) return { field: 'minRemainingDays', says: SLURRY_SAYS.minRemainingDays };
  if (v.storageMinC != null && v.storageMaxC != null && Number(v.storageMaxC) <= Number(v.storageMinC)) return { field: 'storageMaxC', says: SLURRY_SAYS.storageMaxC };
  return null;
}

import type { FieldProblem } from './field';

// One home for a dip tube's limits, labels and cross-field rules, read by the API's DTO (server/registry/registry.dto.ts,
// dip-tubes/dip-tube.def.ts), the import (server/imports/row-rules.ts) and the form (components/forms/dip-tube-form.tsx).
// Lengths are mm; the upper bounds reject absurd values [practice].
export const DIP_TUBE_LIMITS = {
  partNumberChars: 60,
  materialChars: 40,
  lengthMaxMm: 3000,
  boreMaxMm: 200,
  odMaxMm: 250,
} as const;

/** Feed only, or feed and return through the one tube. */
export const TUBE_CHANNELS = ['feed', 'feed-return'] as const;

export const DIP_TUBE_SAYS = { boreMm: 'must be smaller than the outside diameter' } as const;

/** The rules across a dip tube's fields: the bore is inside the tube, so below its outside diameter. */
export function dipTubeProblem(v: { boreMm?: number | null; odMm?: number | null }): FieldProblem | null {
  if (v.boreMm == null || v.odMm == null) return null;
  if (Number(v.boreMm) >= Number(v.odMm)) return { field: 'boreMm', says: DIP_TUBE_SAYS.boreMm };
  return null;
}

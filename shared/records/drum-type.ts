import type { FieldProblem } from './field';

// One home for a drum type's limits, labels and cross-field rules: the API's DTO (server/registry/registry.dto.ts
// and drum-types/drum-type.def.ts), the import (server/imports/row-rules.ts) and the form (components/forms/drum-type-form.tsx)
// all read them. Lengths are mm; the upper bounds reject absurd values (a drum is not 3 m deep) [practice].
export const DRUM_TYPE_LIMITS = {
  partNumberChars: 60,
  nameChars: 120,
  unPackagingCodeChars: 40,
  nominalCapacityMaxL: 3000,
  outsideHeightMaxMm: 3000,
  insideDepthMaxMm: 3000,
  outsideDiameterMaxMm: 2000,
  openingsMin: 1,
  openingsMax: 6,
  openingLabelChars: 40,
  openingBoreMaxMm: 500,
} as const;

/** The choices of a drum type's fields. */
export const DRUM_MATERIALS = ['steel', 'plastic', 'fibre', 'aluminium', 'other'] as const;
export const DRUM_HEADS = ['tight', 'open'] as const;
export const OPENING_POSITIONS = ['large', 'small', 'center', 'other'] as const;

export const DRUM_TYPE_LABELS: Record<string, string> = {
  partNumber: 'Part number',
  name: 'Name',
  supplierId: 'Supplier',
  region: 'Region',
  nominalCapacityL: 'Nominal capacity',
  material: 'Material',
  head: 'Head',
  unPackagingCode: 'UN packaging code',
  outsideHeightMm: 'Outside height',
  insideDepthMm: 'Inside depth',
  outsideDiameterMm: 'Outside diameter',
  insideDiameterMm: 'Inside diameter',
  openings: 'Openings',
};

export const OPENING_LABELS: Record<string, string> = { label: 'label', threadCode: 'thread', boreMm: 'bore', keyCode: 'key code', position: 'position' };

export const DRUM_TYPE_SAYS = {
  insideDepthMm: 'must be less than the outside height',
  insideDiameterMm: 'must be less than the outside diameter',
  openingLabel: 'must be different from the other openings',
} as const;

/** The rules across a drum type's fields (each field's own limits are checked first). Null when they hold or a value is missing. */
export function drumTypeProblem(v: { insideDepthMm?: number | null; outsideHeightMm?: number | null; insideDiameterMm?: number | null; outsideDiameterMm?: number | null }): FieldProblem | null {
  if (v.insideDepthMm != null && v.outsideHeightMm != null && Number(v.insideDepthMm) >= Number(v.outsideHeightMm)) return { field: 'insideDepthMm', says: DRUM_TYPE_SAYS.insideDepthMm };
  if (v.insideDiameterMm != null && v.outsideDiameterMm != null && Number(v.insideDiameterMm) >= Number(v.outsideDiameterMm))
    return { field: 'insideDiameterMm', says: DRUM_TYPE_SAYS.insideDiameterMm };
  return null;
}

/** The form's name for a field path such as openings.1.boreMm ("Opening 2 bore"). */
export function drumTypeLabelOf(path: string): string | undefined {
  const m = /^openings\.(\d+)(?:\.(\w+))?$/.exec(path);
  if (m) return m[2] ? (OPENING_LABELS[m[2]] ? `Opening ${Number(m[1]) + 1} ${OPENING_LABELS[m[2]]}` : undefined) : `Opening ${Number(m[1]) + 1}`;
  return DRUM_TYPE_LABELS[path];
}

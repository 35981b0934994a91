import type { FieldProblem } from './field';

// One home for a dispense head's (connector's) limits and cross-field rules, read by the API's DTO
// (server/registry/registry.dto.ts, connectors/connector.def.ts), the import (server/imports/row-rules.ts) and the
// form (components/forms/connector-form.tsx). Lengths are mm; the upper bounds reject absurd values [practice].
export const CONNECTOR_LIMITS = {
  partNumberChars: 60,
  nominalChars: 20,
  wettedMaterialsChars: 200,
  feedBoreMaxMm: 200,
  returnBoreMaxMm: 200,
} as const;

export const RETURN_PATHS = ['none', 'restricted', 'open'] as const;

export const CONNECTOR_SAYS = {
  returnBoreWithout: 'must be empty when the head has no return path',
  returnBoreWith: 'is required when the head has a return path',
} as const;

/**
 * The rules across a head's fields: a return port bore exactly when the head has a return path (the table's
 * connectors_return_consistent check says the same). Null when they hold or the return path is missing.
 */
export function connectorProblem(v: { returnPath?: string | null; returnBoreMm?: number | null }): FieldProblem | null {
  if (v.returnPath == null) return null;
  if (v.returnPath === 'none' && v.returnBoreMm != null) return { field: 'returnBoreMm', says: CONNECTOR_SAYS.returnBoreWithout };
  if (v.returnPath !== 'none' && v.returnBoreMm == null) return { field: 'returnBoreMm', says: CONNECTOR_SAYS.returnBoreWith };
  return null;
}

import type { FieldProblem } from './field';

// One home for a pairing's limits and rules, read by the API's DTO (server/registry/registry.dto.ts,
// pairings/pairing.def.ts) and the form (components/forms/pairing-form.tsx). Approval (four eyes) is the
// review's rule, in server/registry/pairings/pairing.service.ts.
export const PAIRING_LIMITS = { notesChars: 2000 } as const;

export const PAIRING_SAYS = { fixedParts: 'cannot change; retire this pairing and create a new one' } as const;

/** An edit of an existing pairing changes its notes only: the tube and the head are what was reviewed. */
export function pairingEditProblem(change: { dipTubeId?: unknown; connectorId?: unknown }): FieldProblem | null {
  if (change.dipTubeId !== undefined) return { field: 'dipTubeId', says: PAIRING_SAYS.fixedParts };
  if (change.connectorId !== undefined) return { field: 'connectorId', says: PAIRING_SAYS.fixedParts };
  return null;
}

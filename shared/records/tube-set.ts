import type { FieldProblem } from './field';

// One home for a tube set's limits and rules, read by the API's DTO (server/registry/registry.dto.ts) and
// tube-sets/tube-set.def.ts. The rotation's own moves (rinse, standby, change-out) are server/stations' rules.
export const TUBE_SET_LIMITS = { labelChars: 40 } as const;

export const TUBE_SET_SAYS = {
  state: 'changes through the rotation: rinse, standby and change-out',
  stationId: 'cannot change; register a new set at the other station',
} as const;

/** An edit of an existing set may not move it to another state or station; null when the change is allowed. */
export function tubeSetEditProblem(change: { state?: unknown; stationId?: unknown }, existing: { state: string; stationId: string }): FieldProblem | null {
  if (change.state !== undefined && change.state !== existing.state) return { field: 'state', says: TUBE_SET_SAYS.state };
  if (change.stationId !== undefined && change.stationId !== existing.stationId) return { field: 'stationId', says: TUBE_SET_SAYS.stationId };
  return null;
}

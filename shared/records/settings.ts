import { isTimeZone } from '../dates';
import type { FieldProblem } from './field';

// One home for the site settings' limits and cross-field rules, read by the API's DTO (server/registry/registry.dto.ts)
// and server/settings/settings.service.ts. Clearances are mm; the bounds reject absurd values [practice].
export const SETTINGS_LIMITS = {
  siteNameChars: 120,
  /** Each number's range, From and UpTo both allowed. */
  tipClearanceMinFromMm: 0,
  tipClearanceMaxFromMm: 0.1,
  tipClearanceUpToMm: 500,
  threadMatchToleranceUpToMm: 10,
  laminarLimitFrom: 100,
  laminarLimitUpTo: 10000,
  returnVelocityRatioFrom: 1,
  returnVelocityRatioUpTo: 100,
  timeZoneChars: 64,
} as const;

export const SETTINGS_SAYS = {
  timeZone: 'must be a time zone name, like Europe/Berlin or America/Phoenix',
  tipClearanceMaxMm: 'must be more than the minimum clearance',
} as const;

/**
 * The rules across the settings: a time zone the runtime knows (checked only when given), and a clearance window
 * whose maximum is above its minimum (the table's site_settings_clearance_window says the same).
 */
export function settingsProblem(v: { timeZone?: string; tipClearanceMinMm: number; tipClearanceMaxMm: number }): FieldProblem | null {
  if (v.timeZone !== undefined && !isTimeZone(v.timeZone)) return { field: 'timeZone', says: SETTINGS_SAYS.timeZone };
  if (v.tipClearanceMaxMm <= v.tipClearanceMinMm) return { field: 'tipClearanceMaxMm', says: SETTINGS_SAYS.tipClearanceMaxMm };
  return null;
}

// One home for a dispense station's limits, read by the API's DTO (server/registry/registry.dto.ts) and the form
// (components/forms/station-form.tsx). A station has no rule across its fields.
export const STATION_LIMITS = {
  nameChars: 120,
  bayChars: 60,
  /** The smallest flow the API takes; the form asks for more than 0. */
  flowMinLpm: 0.01,
  /** A recirculation loop, not a transfer pump [practice]. */
  flowMaxLpm: 2000,
} as const;

export const TAPPINGS = ['two-opening', 'one-opening'] as const;
export const AGITATIONS = ['pump', 'mechanical'] as const;

// One home for a dispense station's limits, read by the API's DTO (server/registry/registry.dto.ts) and the form
// (components/forms/station-form.tsx). A station has no rule across its fields.
export const STATION_LIMITS = {
  nameChars: 120,
  bayChars: 60,
  /** The smallest flow the API takes; the form asks for more than 0. */
  flowMinLpm: 0.01,
  /** A recirculation loop, not a transfer pump [practice]. */
  flowMaxLpm: 2000,
  /** The transfer line to the distribution loop (optional): length m, bore mm, absolute roughness µm. */
  lineLengthMaxM: 1000,
  lineBoreMaxMm: 200,
  lineRoughnessMaxUm: 5000,
} as const;

/** Drawn stainless tubing and smooth plastic lines are about 1.5 µm rough [practice; handbook roughness tables]. */
export const SMOOTH_LINE_ROUGHNESS_UM = 1.5;

export const TAPPINGS = ['two-opening', 'one-opening'] as const;
export const AGITATIONS = ['pump', 'mechanical'] as const;

// The units the API and the screens speak; conversions live in shared/units.ts. Stored lengths are mm, flows m^3/s.

export const LENGTH_UNITS = ['mm', 'in'] as const;
export const VOLUME_UNITS = ['L', 'gal'] as const;
export const FLOW_UNITS = ['L/min', 'gal/min', 'm3/h'] as const;

export type LengthUnit = (typeof LENGTH_UNITS)[number];
/** 'gal' is the US liquid gallon. */
export type VolumeUnit = (typeof VOLUME_UNITS)[number];
/** 'gal/min' is US gallons per minute. */
export type FlowUnit = (typeof FLOW_UNITS)[number];

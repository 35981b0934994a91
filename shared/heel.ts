// What the dip tube leaves in the drum and how long the rest lasts. The bottom of the drum is taken as a
// flat cylinder of the inside diameter: V = pi/4 * D^2 * h [derived, ../shared/REFERENCES.md "Drum geometry
// at the bottom"]. A real drum's chime and a domed bottom change this by a litre or so [practice].

/** Volume of an upright cylinder of inside diameter D up to height h, in litres (mm in). */
export function cylinderVolumeL(insideDiameterMm: number, heightMm: number): number {
  if (!Number.isFinite(insideDiameterMm) || insideDiameterMm <= 0) throw new RangeError(`insideDiameterMm must be a positive number, got ${insideDiameterMm}`);
  if (!Number.isFinite(heightMm) || heightMm < 0) throw new RangeError(`heightMm must be zero or more, got ${heightMm}`);
  return ((Math.PI / 4) * insideDiameterMm ** 2 * heightMm) / 1e6;
}

/** The heel: what stays below the tube's tip, litres. */
export function heelVolumeL(insideDiameterMm: number, tipClearanceMm: number): number {
  return cylinderVolumeL(insideDiameterMm, tipClearanceMm);
}

export interface DrumRun {
  heelL: number;
  /** Fill volume less the heel, never below zero. */
  usableL: number;
  /** Time to draw the usable volume at the given flow, minutes; null without a flow. */
  runMinutes: number | null;
}

/** Heel, usable volume and run time of one drum at a station's flow (L/min). */
export function drumRun(input: { insideDiameterMm: number; tipClearanceMm: number; fillL: number; flowLpm?: number | null }): DrumRun {
  const heelL = heelVolumeL(input.insideDiameterMm, input.tipClearanceMm);
  const usableL = Math.max(0, input.fillL - heelL);
  const flow = input.flowLpm;
  if (flow != null && (!Number.isFinite(flow) || flow <= 0)) throw new RangeError(`flowLpm must be a positive number, got ${flow}`);
  return { heelL, usableL, runMinutes: flow == null ? null : usableL / flow };
}

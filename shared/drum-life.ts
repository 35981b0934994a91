// A drum's life at the station, from the moment it goes online: how long it recirculates before it may feed
// the loop, when it runs dry, and whether the standby will be ready by then.
// Turnovers N = Q * t / V [derived, ../shared/REFERENCES.md "Recirculation"]: a 200 L drum recirculated at
// 20 L/min turns over once every 10 min. How many turnovers or minutes a slurry needs comes from its supplier
// [practice]; the heel and run time come from shared/heel.ts (V = pi/4 * D^2 * h).

import { requireNonNegative, requirePositive as positive } from './flow';
import { drumRun, type DrumRun } from './heel';

/** A slurry's recirculation requirement before use; either or both may be set, the longer wins. */
export interface RecirculationNeed {
  minTurnovers?: number | null;
  minMinutes?: number | null;
}

/** Turnovers after recirculating a volume (L) at a flow (L/min) for a number of minutes. */
export function turnovers(flowLpm: number, minutes: number, volumeL: number): number {
  positive('flowLpm', flowLpm);
  positive('volumeL', volumeL);
  requireNonNegative('minutes', minutes);
  return (flowLpm * minutes) / volumeL;
}

/** Minutes of recirculation the need asks for, at this flow and drum volume; 0 when the slurry asks for none. */
export function recirculationMinutes(need: RecirculationNeed, flowLpm: number, volumeL: number): number {
  positive('flowLpm', flowLpm);
  positive('volumeL', volumeL);
  const byTurnovers = need.minTurnovers != null ? (need.minTurnovers * volumeL) / flowLpm : 0;
  return Math.max(byTurnovers, need.minMinutes ?? 0);
}

export interface DrumClock extends DrumRun {
  onlineAt: string;
  recirculationMinutes: number;
  /** When the drum may feed the loop (ISO time). */
  readyAt: string;
  /** When the usable volume is drawn (ISO time); null without a flow. */
  runsDryAt: string | null;
}

const MS_PER_MIN = 60_000;

/**
 * The clock of one drum that went online at `onlineAt`: ready to feed after its recirculation, dry after its
 * usable volume at the station's flow. The same flow serves both (the recirculation and the draw run through one pump).
 */
export function drumClock(input: { onlineAt: Date; fillL: number; insideDiameterMm: number; tipClearanceMm: number; flowLpm: number; need: RecirculationNeed }): DrumClock {
  positive('fillL', input.fillL);
  const run = drumRun({ insideDiameterMm: input.insideDiameterMm, tipClearanceMm: input.tipClearanceMm, fillL: input.fillL, flowLpm: input.flowLpm });
  const recirc = recirculationMinutes(input.need, input.flowLpm, input.fillL);
  const start = input.onlineAt.getTime();
  if (!Number.isFinite(start)) throw new RangeError('onlineAt must be a valid time');
  const readyMs = start + recirc * MS_PER_MIN;
  return {
    ...run,
    onlineAt: input.onlineAt.toISOString(),
    recirculationMinutes: recirc,
    readyAt: new Date(readyMs).toISOString(),
    runsDryAt: run.runMinutes == null ? null : new Date(readyMs + run.runMinutes * MS_PER_MIN).toISOString(),
  };
}

export type StandbyReadiness =
  /** The standby will have recirculated by the time the online drum runs dry. */
  | { status: 'ready-in-time'; startBy: string }
  /** The standby must go online (start recirculating) by `startBy`, which has passed. */
  | { status: 'late'; startBy: string; shortMinutes: number }
  | { status: 'unknown' };

/** Whether a standby drum that needs `standbyRecirculationMinutes` can be ready when the online drum runs dry. */
export function standbyReadiness(online: Pick<DrumClock, 'runsDryAt'>, standbyRecirculationMinutes: number, now: Date): StandbyReadiness {
  if (online.runsDryAt == null || !Number.isFinite(standbyRecirculationMinutes)) return { status: 'unknown' };
  const startByMs = Date.parse(online.runsDryAt) - standbyRecirculationMinutes * MS_PER_MIN;
  const startBy = new Date(startByMs).toISOString();
  if (now.getTime() <= startByMs) return { status: 'ready-in-time', startBy };
  return { status: 'late', startBy, shortMinutes: (now.getTime() - startByMs) / MS_PER_MIN };
}

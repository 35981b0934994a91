// Identifies a thread from what a person can measure at the dock: a caliper reading across the crests,
// a thread-gauge count, a flank-angle gauge and (if taken) a taper check. Near-identical threads from
// different standards are the trap here, so the answer says when the measurements cannot separate them.

import { MM_PER_IN } from '../units';
import { FAMILY_SIDES, THREAD_TABLE, type ThreadFamily, type ThreadForm, type ThreadSide, type ThreadSpecRow } from './thread-table';

export interface ThreadMeasurement {
  /** Caliper reading across the crests; on a tapered thread, at the large end. */
  majorDiameterMm: number;
  pitchMm?: number;
  threadsPerInch?: number;
  flankAngleDeg?: number;
  /** Result of measuring the diameter at two points along the thread, when done. */
  taper?: ThreadForm;
  /** The side the measured thread is on, when known (a drum opening's is internal): rows never made on it are left out. */
  side?: ThreadSide;
}

export interface IdentifyOptions {
  /** Floor of the diameter tolerance, mm. */
  diameterToleranceMm?: number;
  /** Diameter tolerance as a percentage of the row's major diameter; the larger of the two applies. */
  diameterTolerancePct?: number;
  /** Pitch tolerance as a percentage of the row's pitch. */
  pitchTolerancePct?: number;
  /** Flank-angle tolerance, degrees. */
  flankToleranceDeg?: number;
}

// Diameter: max(0.6 mm, 2 %). A worn or tapered male thread read with a caliper is easily half a
// millimetre off, and the 1:16 NPT taper alone moves the reading about 1 mm along a 2 in thread; at
// that tolerance G 2 (59.614 mm) and 2 in NPS/NPT (60.325 mm) overlap, as they do in real life, while
// G 2 and a 56 mm buttress stay apart.
// Pitch: 1.5 %, a third of the 4.3 % gap between 11 and 11.5 threads per inch, the closest pair.
// Flank: 2.5 deg, half the gap between 55 and 60 deg.
export const DEFAULT_IDENTIFY_OPTIONS: Required<IdentifyOptions> = {
  diameterToleranceMm: 0.6,
  diameterTolerancePct: 2,
  pitchTolerancePct: 1.5,
  flankToleranceDeg: 2.5,
};

export interface ThreadMatch {
  code: string;
  standard: string;
  family: ThreadFamily;
  nominalLabel: string;
  form: ThreadForm;
  majorDiameterMm: number;
  pitchMm: number;
  threadsPerInch: number;
  flankAngleDeg: number;
  /** |measured - table| major diameter, mm. */
  deltaMm: number;
  /** |measured - table| pitch, mm; present when a pitch or count was given. */
  pitchDeltaMm?: number;
  /** |measured - table| flank angle, deg; present when an angle was given. */
  flankDeltaDeg?: number;
}

export interface ThreadIdentification {
  /** Candidates best first; empty when nothing in the table fits. */
  matches: ThreadMatch[];
  /** True when more than one candidate fits what was measured. */
  ambiguous: boolean;
  /** What to do next, in plain words. */
  advice: string;
}

function positiveOrThrow(name: string, value: number | undefined): void {
  if (value === undefined) return;
  if (!Number.isFinite(value) || value <= 0) {
    throw new RangeError(`${name} must be a positive number, got ${String(value)}`);
  }
}

/** Tolerance on major diameter for a table row, mm. */
export function diameterToleranceFor(row: Pick<ThreadSpecRow, 'majorDiameterMm'>, opts: IdentifyOptions = {}): number {
  const o = { ...DEFAULT_IDENTIFY_OPTIONS, ...opts };
  return Math.max(o.diameterToleranceMm, (o.diameterTolerancePct / 100) * row.majorDiameterMm);
}

const round3 = (x: number): number => Math.round(x * 1000) / 1000;

function formatTpi(tpi: number): string {
  return String(Math.round(tpi * 100) / 100);
}

export function identifyThread(input: ThreadMeasurement, table: readonly ThreadSpecRow[] = THREAD_TABLE, opts: IdentifyOptions = {}): ThreadIdentification {
  positiveOrThrow('majorDiameterMm', input.majorDiameterMm);
  positiveOrThrow('pitchMm', input.pitchMm);
  positiveOrThrow('threadsPerInch', input.threadsPerInch);
  positiveOrThrow('flankAngleDeg', input.flankAngleDeg);
  const o = { ...DEFAULT_IDENTIFY_OPTIONS, ...opts };

  // A direct pitch reading wins over a count; both name the same quantity.
  const measuredPitch = input.pitchMm ?? (input.threadsPerInch !== undefined ? MM_PER_IN / input.threadsPerInch : undefined);
  const notes: string[] = [];
  if (input.pitchMm !== undefined && input.threadsPerInch !== undefined) {
    const fromCount = MM_PER_IN / input.threadsPerInch;
    if (Math.abs(fromCount - input.pitchMm) > (o.pitchTolerancePct / 100) * input.pitchMm) {
      notes.push(`The pitch (${input.pitchMm} mm) and the count (${input.threadsPerInch} per inch) you entered disagree; the pitch was used, so recount.`);
    }
  }

  const matches: ThreadMatch[] = [];
  for (const row of table) {
    const deltaMm = Math.abs(input.majorDiameterMm - row.majorDiameterMm);
    if (deltaMm > diameterToleranceFor(row, o)) continue;

    let pitchDeltaMm: number | undefined;
    if (measuredPitch !== undefined) {
      pitchDeltaMm = Math.abs(measuredPitch - row.pitchMm);
      if (pitchDeltaMm > (o.pitchTolerancePct / 100) * row.pitchMm) continue;
    }

    let flankDeltaDeg: number | undefined;
    if (input.flankAngleDeg !== undefined) {
      flankDeltaDeg = Math.abs(input.flankAngleDeg - row.flankAngleDeg);
      if (flankDeltaDeg > o.flankToleranceDeg) continue;
    }

    if (input.taper !== undefined && input.taper !== row.form) continue;
    if (input.side !== undefined && !FAMILY_SIDES[row.family].includes(input.side)) continue;

    matches.push({
      code: row.code,
      standard: row.standard,
      family: row.family,
      nominalLabel: row.nominalLabel,
      form: row.form,
      majorDiameterMm: row.majorDiameterMm,
      pitchMm: row.pitchMm,
      threadsPerInch: row.threadsPerInch,
      flankAngleDeg: row.flankAngleDeg,
      deltaMm,
      ...(pitchDeltaMm !== undefined ? { pitchDeltaMm } : {}),
      ...(flankDeltaDeg !== undefined ? { flankDeltaDeg } : {}),
    });
  }

  // Rounded to 0.001 mm so rows with the same published size tie and keep table order.
  // Array.prototype.sort is stable, so equal rows keep table order.
  matches.sort((a, b) => round3(a.deltaMm) - round3(b.deltaMm) || (a.pitchDeltaMm ?? 0) - (b.pitchDeltaMm ?? 0) || (a.flankDeltaDeg ?? 0) - (b.flankDeltaDeg ?? 0));

  const ambiguous = matches.length > 1;
  const advice = [...notes, adviceFor(input, matches, o)].join(' ');
  return { matches, ambiguous, advice };
}

/** For each value, the matches that have it: "11.5 for 2 in NPS or 2 in NPT, 11 for G 2". */
function whichHas<V>(values: Set<V>, of: (m: ThreadMatch) => V, say: (v: V) => string, matches: ThreadMatch[]): string {
  const labelsWith = (v: V) => matches.filter((m) => of(m) === v).map((m) => m.nominalLabel);
  return [...values].map((v) => `${say(v)} for ${labelsWith(v).join(' or ')}`).join(', ');
}

function adviceFor(input: ThreadMeasurement, matches: ThreadMatch[], o: Required<IdentifyOptions>): string {
  if (matches.length === 0) {
    return (
      `No thread in the table fits ${input.majorDiameterMm} mm${input.pitchMm || input.threadsPerInch ? ' at that pitch' : ''}. ` +
      'Measure the diameter again across the thread crests with a caliper (at the large end if the thread narrows), ' +
      'count threads per inch with a thread gauge, and if it still does not fit, ask for this thread to be added to the table.'
    );
  }

  const steps: string[] = [];
  const tpis = new Set(matches.map((m) => m.threadsPerInch));
  const flanks = new Set(matches.map((m) => m.flankAngleDeg));
  const forms = new Set(matches.map((m) => m.form));

  if (matches.length === 1) {
    const m = matches[0]!;
    const checks: string[] = [];
    if (input.pitchMm === undefined && input.threadsPerInch === undefined) {
      checks.push(`count threads per inch with a thread gauge (expect ${formatTpi(m.threadsPerInch)})`);
    }
    if (input.flankAngleDeg === undefined) {
      checks.push(`check the flank angle with a gauge (expect ${m.flankAngleDeg} degrees)`);
    }
    if (input.taper === undefined && m.family !== 'buttress') {
      checks.push(`check for taper by measuring the diameter at two points (expect ${m.form === 'tapered' ? 'a taper' : 'no taper'})`);
    }
    const confirm = checks.length > 0 ? ` To be sure, ${checks.join('; ')}.` : '';
    return `This is ${m.nominalLabel} (${m.standard}).${confirm}`;
  }

  if (tpis.size > 1) {
    steps.push(`Count threads per inch with a thread gauge: ${whichHas(tpis, (m) => m.threadsPerInch, formatTpi, matches)}.`);
  }
  if (flanks.size > 1) {
    steps.push(
      `Check the flank angle with a thread gauge: ${whichHas(
        flanks,
        (m) => m.flankAngleDeg,
        (deg) => `${deg} degrees`,
        matches,
      )}.`,
    );
  }
  if (forms.size > 1) {
    // 1:16 taper on diameter (ASME B1.20.1 for NPT, ISO 7-1 for R and Rc): 25 mm along changes it by about 1.6 mm.
    const tapered = matches.filter((m) => m.form === 'tapered').map((m) => m.nominalLabel);
    steps.push(
      `Check for taper by measuring the diameter at two points about 25 mm apart along the thread: a tapered thread (${tapered.join(' or ')}) changes by about 1.6 mm, a parallel one does not.`,
    );
  }
  if (steps.length === 0) {
    steps.push('These cannot be told apart by measuring; compare with a fitting whose thread is known.');
  }
  const names = matches.map((m) => m.nominalLabel).join(', ');
  const tol = diameterToleranceFor(matches[0]!, o).toFixed(1);
  return `More than one thread fits what you measured (within ${tol} mm): ${names}. ${steps.join(' ')}`;
}

/** Anything that carries a thread spec code. */
export type ThreadCodeLike = string | { code: string } | { threadCode: string | null } | null | undefined;

function codeOf(x: ThreadCodeLike): string | null {
  if (x === null || x === undefined) return null;
  if (typeof x === 'string') return x.trim() || null;
  if ('code' in x) return x.code.trim() || null;
  return x.threadCode?.trim() || null;
}

/**
 * The one rule for "do these threads match": same spec code. Never compare nominal sizes: 2 in NPS and
 * G 2 share a nominal size and do not mate. An unknown (null or empty) code matches nothing.
 */
export function threadSpecEquals(a: ThreadCodeLike, b: ThreadCodeLike): boolean {
  const ca = codeOf(a);
  const cb = codeOf(b);
  return ca !== null && cb !== null && ca === cb;
}

// Pass-through rule: the tube must go through the opening it screws into. The clear passage of a threaded
// opening is the smaller of its recorded bore and the minor diameter of its internal thread.

import { findThreadSpec, type ThreadSpecRow } from '../threads/thread-table';
import { formatLength, mmToIn } from '../units';
import { tubeOpening, type RuleFn } from './rule-kit';
import type { RuleResult } from './types';

// Basic profile heights, as a fraction of the pitch: 55 degree form (ISO 228-1 / ISO 7-1) h = 0.640327 P
// [mem: ISO 228-1 basic profile]; 60 degree pipe thread (ASME B1.20.1) h = 0.800 P [pub, ../shared/REFERENCES.md].
const PROFILE_HEIGHT: Readonly<Record<number, number>> = { 55: 0.640327, 60: 0.8 };

// A tube that clears the passage by less than this rubs the thread crests on the way in [practice].
export const PASS_THROUGH_MARGIN_MM = 1;

/**
 * Minor diameter of a thread, mm: major - 2h. For a tapered thread the major diameter in the table is the
 * large end, so this is the passage at the face; deeper in the taper (1:16) narrows it [derived].
 * Null for forms without a known profile (buttress).
 */
export function threadMinorDiameterMm(row: Pick<ThreadSpecRow, 'majorDiameterMm' | 'pitchMm' | 'flankAngleDeg'>): number | null {
  const h = PROFILE_HEIGHT[row.flankAngleDeg];
  return h === undefined ? null : row.majorDiameterMm - 2 * h * row.pitchMm;
}

const both = (mm: number) => `${formatLength(mm, 'mm')} (${formatLength(mm, 'in', 3)})`;

export const checkPassThrough: RuleFn = ({ drum, tube }) => {
  const opening = tubeOpening(drum, tube);
  if (!opening) return { rule: 'pass-through', reason: 'not checked: no opening takes the tube’s thread' };
  if (tube.odMm == null) return { rule: 'pass-through', reason: 'not checked: the tube’s outside diameter is not recorded' };
  const spec = opening.threadCode ? findThreadSpec(opening.threadCode) : undefined;
  const minorMm = spec ? threadMinorDiameterMm(spec) : null;
  const boreMm = opening.boreMm ?? null;
  if (boreMm === null && minorMm === null) return { rule: 'pass-through', reason: 'not checked: neither the opening’s bore nor its thread’s minor diameter is known' };

  const byThread = minorMm !== null && (boreMm === null || minorMm < boreMm);
  const passageMm = byThread ? minorMm! : boreMm!;
  const passage = byThread ? `the minor diameter of its ${spec!.nominalLabel} thread, ${both(passageMm)}` : `its bore, ${both(passageMm)}`;
  const numbers: Record<string, number> = { tubeOdMm: tube.odMm, tubeOdIn: mmToIn(tube.odMm), passageMm, passageIn: mmToIn(passageMm) };
  if (boreMm !== null) numbers.boreMm = boreMm;
  if (minorMm !== null) numbers.threadMinorMm = minorMm;
  const clearanceMm = passageMm - tube.odMm;
  const result = (outcome: RuleResult['outcome'], message: string): RuleResult => ({ rule: 'pass-through', outcome, message, numbers });
  if (clearanceMm <= 0) return result('fail', `The tube does not pass the opening: its outside diameter is ${both(tube.odMm)}, the opening’s passage is ${passage}.`);
  if (clearanceMm < PASS_THROUGH_MARGIN_MM) return result('caution', `The tube passes the opening with only ${both(clearanceMm)} to spare: outside diameter ${both(tube.odMm)}, passage ${passage}.`);
  return result('pass', `The tube (outside diameter ${both(tube.odMm)}) passes the opening: ${passage}.`);
};

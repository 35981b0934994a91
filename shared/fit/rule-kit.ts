// What every fit rule is built from: its type, the three outcomes and "not checked", and the readings of a
// drum's openings that several rules share. A rule lives in its own function (rules.ts, or a file of its own)
// and is listed in registry.ts.

import { threadSpecEquals } from '../threads/identify';
import { findThreadSpec } from '../threads/thread-table';
import type { RuleName } from './registry';
import type { CandidateInput, DrumInput, DrumOpening, FitSettings, RuleNotChecked, RuleResult, TubeInput } from './types';

export type RuleCheck = RuleResult | RuleNotChecked;
export type RuleFn = (input: CandidateInput, settings: FitSettings) => RuleCheck;

export function isNotChecked(check: RuleCheck): check is RuleNotChecked {
  return !('outcome' in check);
}

export const pass = (rule: RuleName, message: string, numbers?: Record<string, number>): RuleResult => (numbers ? { rule, outcome: 'pass', message, numbers } : { rule, outcome: 'pass', message });
export const caution = (rule: RuleName, message: string, numbers?: Record<string, number>): RuleResult =>
  numbers ? { rule, outcome: 'caution', message, numbers } : { rule, outcome: 'caution', message };
export const fail = (rule: RuleName, message: string, numbers?: Record<string, number>): RuleResult => (numbers ? { rule, outcome: 'fail', message, numbers } : { rule, outcome: 'fail', message });
export const notChecked = (rule: RuleName, reason: string): RuleNotChecked => ({ rule, reason });

export const round = (x: number, digits: number): number => Math.round(x * 10 ** digits) / 10 ** digits;

/** How a person would say the thread: 'G 2', '3/4 in NPT', or the raw code if it is not in the table. */
export function describeThread(code: string | null): string {
  if (code === null || code.trim() === '') return 'an unknown thread';
  return findThreadSpec(code)?.nominalLabel ?? code;
}

export function openingName(opening: DrumOpening, index: number): string {
  return opening.label?.trim() || `opening ${index + 1}`;
}

/** Openings the tube screws into: same thread spec code (never the same nominal size). */
export function usableOpenings(drum: DrumInput, tube: Pick<TubeInput, 'threadCode'>): DrumOpening[] {
  return drum.openings.filter((o) => threadSpecEquals(o.threadCode, tube.threadCode));
}

/** The opening the tube goes into: a usable one whose key agrees with the tube if any, else the first usable. */
export function tubeOpening(drum: DrumInput, tube: Pick<TubeInput, 'threadCode' | 'keyCode'>): DrumOpening | undefined {
  const usable = usableOpenings(drum, tube);
  return usable.find((o) => o.keyCode !== null && o.keyCode === tube.keyCode) ?? usable[0];
}

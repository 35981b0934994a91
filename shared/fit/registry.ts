// The fit rules, listed once: each rule's name (what results carry), the label a screen shows, whether it
// judges the drum (a preview without a drum type lists it as not checked) and its function. Results are listed
// in this order. Adding a rule: write its function (in a file of its own, from rule-kit.ts) and add it here.

import { checkApproval, checkFoam, checkKey, checkOpenings, checkPorts, checkReach, checkRinse, checkTapping, checkThread } from './rules';
import type { RuleFn } from './rule-kit';
import { checkPassThrough } from './pass-through';
import { checkTightHeadOpenings } from './tight-head';

export const RULE_NAMES = ['thread', 'key', 'reach', 'pass-through', 'tapping', 'ports', 'foam', 'openings', 'approval', 'rinse', 'tight-head'] as const;
export type RuleName = (typeof RULE_NAMES)[number];

/** The parts of a candidate that differ between the pairs a search judges; every other input is the same for all of them. */
export type CandidatePart = 'tube' | 'connector' | 'station';

interface RuleEntry {
  label: string;
  judgesDrum: boolean;
  /**
   * Which of the tube, the head and the station the rule reads (besides the drum, slurry, pairing, tube set and
   * settings). The search over hypothetical pairs (shared/fit/pair-search.ts) judges a tube-only rule once per
   * tube, not once per pair; tests/unit/pair-search.test.ts fails when a rule reads a part it does not list.
   */
  reads: readonly CandidatePart[];
  check: RuleFn;
}

// A record keyed by name: the compiler refuses a name without its entry, or an entry without its name.
const RULES: Record<RuleName, RuleEntry> = {
  thread: { label: 'Thread', judgesDrum: true, reads: ['tube'], check: checkThread },
  key: { label: 'Keying', judgesDrum: false, reads: ['tube', 'connector'], check: checkKey },
  reach: { label: 'Reach to bottom', judgesDrum: true, reads: ['tube'], check: checkReach },
  'pass-through': { label: 'Passes the opening', judgesDrum: true, reads: ['tube'], check: checkPassThrough },
  tapping: { label: 'Tapping', judgesDrum: false, reads: ['connector', 'station'], check: checkTapping },
  ports: { label: 'Feed and return ports', judgesDrum: false, reads: ['connector', 'station'], check: checkPorts },
  foam: { label: 'Foaming', judgesDrum: false, reads: ['station'], check: checkFoam },
  openings: { label: 'Openings', judgesDrum: true, reads: ['tube', 'station'], check: checkOpenings },
  approval: { label: 'Approval', judgesDrum: false, reads: [], check: checkApproval },
  rinse: { label: 'Rinse', judgesDrum: false, reads: [], check: checkRinse },
  'tight-head': { label: 'Tight-head openings', judgesDrum: true, reads: [], check: checkTightHeadOpenings },
};

/** Every rule, in the order results are listed. */
export const FIT_RULES: ReadonlyArray<RuleEntry & { name: RuleName }> = RULE_NAMES.map((name) => ({ name, ...RULES[name] }));

/** What a screen calls each rule. */
export const FIT_RULE_LABELS: Readonly<Record<RuleName, string>> = Object.fromEntries(FIT_RULES.map((r) => [r.name, r.label])) as Record<RuleName, string>;

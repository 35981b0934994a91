// The fit rules, listed once: each rule's name (what results carry), the label a screen shows, whether it
// judges the drum (a preview without a drum type lists it as not checked) and its function. Results are listed
// in this order. Adding a rule: write its function (in a file of its own, from rule-kit.ts) and add it here.

import { checkApproval, checkFoam, checkKey, checkOpenings, checkPorts, checkReach, checkRinse, checkTapping, checkThread } from './rules';
import type { RuleFn } from './rule-kit';
import { checkPassThrough } from './pass-through';
import { checkTightHeadOpenings } from './tight-head';

export const RULE_NAMES = ['thread', 'key', 'reach', 'pass-through', 'tapping', 'ports', 'foam', 'openings', 'approval', 'rinse', 'tight-head'] as const;
export type RuleName = (typeof RULE_NAMES)[number];

interface RuleEntry {
  label: string;
  judgesDrum: boolean;
  check: RuleFn;
}

// A record keyed by name: the compiler refuses a name without its entry, or an entry without its name.
const RULES: Record<RuleName, RuleEntry> = {
  thread: { label: 'Thread', judgesDrum: true, check: checkThread },
  key: { label: 'Keying', judgesDrum: false, check: checkKey },
  reach: { label: 'Reach to bottom', judgesDrum: true, check: checkReach },
  'pass-through': { label: 'Passes the opening', judgesDrum: true, check: checkPassThrough },
  tapping: { label: 'Tapping', judgesDrum: false, check: checkTapping },
  ports: { label: 'Feed and return ports', judgesDrum: false, check: checkPorts },
  foam: { label: 'Foaming', judgesDrum: false, check: checkFoam },
  openings: { label: 'Openings', judgesDrum: true, check: checkOpenings },
  approval: { label: 'Approval', judgesDrum: false, check: checkApproval },
  rinse: { label: 'Rinse', judgesDrum: false, check: checkRinse },
  'tight-head': { label: 'Tight-head openings', judgesDrum: true, check: checkTightHeadOpenings },
};

/** Every rule, in the order results are listed. */
export const FIT_RULES: ReadonlyArray<RuleEntry & { name: RuleName }> = RULE_NAMES.map((name) => ({ name, ...RULES[name] }));

/** What a screen calls each rule. */
export const FIT_RULE_LABELS: Readonly<Record<RuleName, string>> = Object.fromEntries(FIT_RULES.map((r) => [r.name, r.label])) as Record<RuleName, string>;

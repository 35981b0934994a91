// Runs every rule on one drum + tube + head candidate and folds the results into a verdict.

import { handlingCautions } from './handling';
import { FIT_RULES } from './registry';
import { isNotChecked, resolveSettings } from './rules';
import type { CandidateEvaluation, CandidateInput, RuleNotChecked, RuleOutcome, RuleResult, Verdict } from './types';

const VERDICT_OF: Record<RuleOutcome, Verdict> = { pass: 'fits', caution: 'caution', fail: 'no-fit' };
// Higher is worse.
const SEVERITY: Record<Verdict, number> = { fits: 0, caution: 1, 'no-fit': 2 };

/** The worst rule decides: any fail is no-fit, else any caution is caution, else fits. */
export function verdictOf(rules: ReadonlyArray<Pick<RuleResult, 'outcome'>>): Verdict {
  let worst: Verdict = 'fits';
  for (const r of rules) {
    const v = VERDICT_OF[r.outcome];
    if (SEVERITY[v] > SEVERITY[worst]) worst = v;
  }
  return worst;
}

export function evaluateCandidate(input: CandidateInput): CandidateEvaluation {
  const settings = resolveSettings(input.settings);
  const rules: RuleResult[] = [];
  const notChecked: RuleNotChecked[] = [];
  for (const { check } of FIT_RULES) {
    const result = check(input, settings);
    if (isNotChecked(result)) notChecked.push(result);
    else rules.push(result);
  }
  return {
    verdict: verdictOf(rules),
    rules,
    notChecked,
    // Fitting a tube always means handling slurry; a chosen station means a pumped line as well.
    handling: handlingCautions({ handlesSlurry: true, pressurised: Boolean(input.station) }),
  };
}

/** A drum's verdict is its best candidate's; with no candidate at all, nothing fits. */
export function drumVerdict(candidates: ReadonlyArray<Pick<CandidateEvaluation, 'verdict'> | Verdict>): Verdict {
  let best: Verdict | null = null;
  for (const c of candidates) {
    const v = typeof c === 'string' ? c : c.verdict;
    if (best === null || SEVERITY[v] < SEVERITY[best]) best = v;
  }
  return best ?? 'no-fit';
}

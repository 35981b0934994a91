// The words a check answers with: one list each, read by the server's DTOs, entities and serialisers, the
// shared rules and the screens.

/** A hardware fit check's verdict (one candidate, or the best of them). */
export const FIT_VERDICTS = ['fits', 'caution', 'no-fit'] as const;
export type Verdict = (typeof FIT_VERDICTS)[number];

/** One rule's outcome within a check. */
export const RULE_OUTCOMES = ['pass', 'caution', 'fail'] as const;
export type RuleOutcome = (typeof RULE_OUTCOMES)[number];

/** The lot's one decision at the dock (shared/dock/verdict.ts folds fit and acceptance into it). */
export const LOT_DECISIONS = ['accept', 'caution', 'hold', 'quarantine'] as const;
export type LotDecision = (typeof LOT_DECISIONS)[number];

import type { RuleOutcome } from '../contract/verdicts';
// Inputs and outputs of the lot acceptance rules: whether a lot's slurry may be received, beside whether the
// site's hardware fits its drums (shared/fit). Plain objects, complete: the server, the phone (offline) and
// the tests pass everything a rule reads, "today" included.
import type { Role } from '../contract/roles';
import type { IsoDate } from '../dates';

export const ACCEPTANCE_RULE_NAMES = ['shelf-life', 'temperature', 'certificate'] as const;
export type AcceptanceRuleName = (typeof ACCEPTANCE_RULE_NAMES)[number];

export const TEMPERATURE_INDICATORS = ['not-fitted', 'intact', 'tripped', 'froze'] as const;
export type TemperatureIndicator = (typeof TEMPERATURE_INDICATORS)[number];

export const TEMPERATURE_INDICATOR_LABELS: Record<TemperatureIndicator, string> = {
  'not-fitted': 'None fitted',
  intact: 'Intact',
  tripped: 'Tripped',
  froze: 'Shows frozen',
};

/** What a slurry's registry record says about receiving it; every field may be unknown (null). */
export interface SlurryAcceptance {
  name?: string;
  shelfLifeDays: number | null;
  minRemainingDays: number | null;
  storageMinC: number | null;
  storageMaxC: number | null;
  certificateRequired: boolean;
}

export interface LotAcceptanceInput {
  /** The site's local date. */
  today: IsoDate;
  productionDate: IsoDate | null;
  expiryDate: IsoDate | null;
  /** null: not recorded (an API caller that does not say); the dock form always asks. */
  temperatureIndicator: TemperatureIndicator | null;
  /** Whether a file marked as the certificate of analysis is attached to the check. */
  certificateAttached: boolean;
  /** The slurry as registered; null when the clerk did not say which slurry arrived. */
  slurry: SlurryAcceptance | null;
}

/** What a failed rule does to the lot. */
export type LotAction = 'hold' | 'quarantine';

/** How a hold is lifted: an engineer releases it with a comment, or attaching the certificate lifts it. */
export type ReleasePath = 'engineer' | 'certificate';

export interface AcceptanceResult {
  rule: AcceptanceRuleName;
  outcome: RuleOutcome;
  /** One plain sentence a clerk understands. */
  message: string;
  /** For a fail: hold or quarantine, the clause the verdict sentence uses, and who lifts it. */
  action?: LotAction;
  headline?: string;
  release?: ReleasePath;
  releasedBy?: readonly Role[];
  numbers?: Record<string, number>;
}

export interface AcceptanceNotChecked {
  rule: AcceptanceRuleName;
  reason: string;
}

export interface AcceptanceEvaluation {
  rules: AcceptanceResult[];
  notChecked: AcceptanceNotChecked[];
}

// Inputs and outputs of the fit check. Plain objects so the server can pass entities and the client can
// pass form state; all lengths in mm.
import type { RuleOutcome, Verdict } from '../contract/verdicts';

import type { DrumHead } from '../packaging-code';
import type { RuleName } from './registry';

export type { RuleOutcome, Verdict } from '../contract/verdicts';

export interface RuleResult {
  rule: RuleName;
  outcome: RuleOutcome;
  /** One plain sentence a dock clerk understands. */
  message: string;
  numbers?: Record<string, number>;
}

/** A rule that could not be checked because its input was not given (e.g. no station chosen). */
export interface RuleNotChecked {
  rule: RuleName;
  reason: string;
}

export interface DrumOpening {
  label?: string;
  threadCode: string | null;
  keyCode: string | null;
  boreMm?: number | null;
}

export interface DrumInput {
  insideDepthMm: number;
  openings: DrumOpening[];
  /** Tight head (bungs in a fixed top) or open head (removable lid); null or absent when not recorded (a drum described at the dock). */
  head?: DrumHead | null;
}

export type TubeChannels = 'feed' | 'feed-return';

export interface TubeInput {
  id?: string;
  partNumber?: string;
  threadCode: string;
  lengthMm: number;
  keyCode: string | null;
  channels: TubeChannels;
  /** Outside diameter of the tube, mm; when unknown the pass-through rule is not checked. */ odMm?: number | null;
}

export type Tapping = 'two-opening' | 'one-opening';
export type ReturnPath = 'none' | 'restricted' | 'open';

export interface ConnectorInput {
  id?: string;
  partNumber?: string;
  keyCode: string | null;
  feedBoreMm: number;
  feedNominal?: string;
  returnBoreMm: number | null;
  returnNominal?: string | null;
  returnPath: ReturnPath;
  suitedTo: Tapping | 'both';
}

export interface StationInput {
  tapping: Tapping;
  agitation: 'pump' | 'mechanical';
  /** Recirculation flow, L/min, when known. */
  flowLpm?: number;
}

export interface SlurryInput {
  foams: boolean;
  shearSensitive: boolean;
}

export type PairingStatus = 'draft' | 'approved' | 'retired';

export interface PairingInput {
  status: PairingStatus;
}

export interface TubeSetInput {
  lastRinsedAt: Date | string | null;
  lastUsedAt: Date | string | null;
}

export interface FitSettings {
  /** Smallest gap between tube tip and drum bottom, mm. */
  tipClearanceMinMm: number;
  /** Largest gap between tube tip and drum bottom, mm. */
  tipClearanceMaxMm: number;
  /** Diameter tolerance floor for identifying a measured thread, mm; the fit check itself matches on code. */
  threadMatchToleranceMm: number;
  /** Reynolds number below which flow is laminar. */
  laminarLimit: number;
  /** Largest return/feed velocity ratio (Df/Dr)^2 allowed in one-opening tapping. */
  maxReturnVelocityRatio: number;
}

export interface CandidateInput {
  drum: DrumInput;
  tube: TubeInput;
  connector: ConnectorInput;
  station?: StationInput | null;
  slurry?: SlurryInput | null;
  /** The pairing record of this tube and connector; null or absent means there is none. */
  pairing?: PairingInput | null;
  tubeSet?: TubeSetInput | null;
  /** Partial settings are merged over DEFAULT_SETTINGS. */
  settings?: Partial<FitSettings>;
}

export type HandlingTopic = 'ppe' | 'sds' | 'spills' | 'pressure' | 'codes';

export interface HandlingCaution {
  topic: HandlingTopic;
  message: string;
}

export interface CandidateEvaluation {
  verdict: Verdict;
  /** Rules that were checked, in RULE_NAMES order (registry.ts). */
  rules: RuleResult[];
  /** Rules left out because their input was missing; they do not affect the verdict. */
  notChecked: RuleNotChecked[];
  /** Chemical-handling cautions to show beside the verdict. */
  handling: HandlingCaution[];
}

// The live fit preview of a tube and head while a pairing is edited: the shared fit rules (the same the
// server runs at the dock), given whatever the engineer has picked so far.
import type { ConnectorRecord, DipTubeRecord, DrumTypeRecord, PairingStatus } from '@/shared/contract/records';
import {
  evaluateCandidate,
  FIT_RULES,
  isNotChecked,
  resolveSettings,
  verdictOf,
  type CandidateInput,
  type FitSettings,
  type RuleName,
  type RuleNotChecked,
  type RuleResult,
  type StationInput,
  type Verdict,
} from '@/shared/fit';

export interface FitPreviewInput {
  drum: Pick<DrumTypeRecord, 'insideDepthMm' | 'openings'> | null;
  tube: Pick<DipTubeRecord, 'threadCode' | 'lengthMm' | 'keyCode' | 'channels'>;
  connector: Pick<ConnectorRecord, 'keyCode' | 'feedBoreMm' | 'feedNominal' | 'returnBoreMm' | 'returnNominal' | 'returnPath' | 'suitedTo'>;
  station: StationInput | null;
  status: PairingStatus;
  settings: Partial<FitSettings>;
}

export interface FitPreviewResult {
  verdict: Verdict;
  rules: RuleResult[];
  notChecked: RuleNotChecked[];
}

/** Rules that read the drum; without a drum type they are listed as not checked. */
const DRUM_RULES: ReadonlySet<RuleName> = new Set<RuleName>(['thread', 'reach', 'openings']);

export function previewFit(input: FitPreviewInput): FitPreviewResult {
  const candidate: CandidateInput = {
    drum: input.drum ? { insideDepthMm: input.drum.insideDepthMm, openings: input.drum.openings } : { insideDepthMm: 0, openings: [] },
    tube: { threadCode: input.tube.threadCode ?? '', lengthMm: input.tube.lengthMm, keyCode: input.tube.keyCode, channels: input.tube.channels },
    connector: { ...input.connector },
    station: input.station,
    // A pairing being drafted is not approved yet: the approval rule says so.
    pairing: { status: input.status },
    settings: input.settings,
  };
  if (input.drum) {
    const { verdict, rules, notChecked } = evaluateCandidate(candidate);
    return { verdict, rules, notChecked };
  }
  const settings = resolveSettings(input.settings);
  const rules: RuleResult[] = [];
  const notChecked: RuleNotChecked[] = [];
  for (const { name, check } of FIT_RULES) {
    if (DRUM_RULES.has(name)) {
      notChecked.push({ rule: name, reason: 'not checked: no drum type chosen' });
      continue;
    }
    const result = check(candidate, settings);
    if (isNotChecked(result)) notChecked.push(result);
    else rules.push(result);
  }
  return { verdict: verdictOf(rules), rules, notChecked };
}

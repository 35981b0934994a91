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
  type RuleNotChecked,
  type RuleResult,
  type StationInput,
  type Verdict,
} from '@/shared/fit';

export interface FitPreviewInput {
  drum: Pick<DrumTypeRecord, 'insideDepthMm' | 'head' | 'openings'> | null;
  tube: Pick<DipTubeRecord, 'threadCode' | 'lengthMm' | 'keyCode' | 'channels'> & Partial<Pick<DipTubeRecord, 'odMm'>>;
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

export function previewFit(input: FitPreviewInput): FitPreviewResult {
  const candidate: CandidateInput = {
    drum: input.drum ? { insideDepthMm: input.drum.insideDepthMm, head: input.drum.head, openings: input.drum.openings } : { insideDepthMm: 0, openings: [] },
    tube: { threadCode: input.tube.threadCode ?? '', lengthMm: input.tube.lengthMm, keyCode: input.tube.keyCode, channels: input.tube.channels, odMm: input.tube.odMm ?? null },
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
  // Rules that judge the drum are listed as not checked without a drum type.
  for (const { name, judgesDrum, check } of FIT_RULES) {
    if (judgesDrum) {
      notChecked.push({ rule: name, reason: 'not checked: no drum type chosen' });
      continue;
    }
    const result = check(candidate, settings);
    if (isNotChecked(result)) notChecked.push(result);
    else rules.push(result);
  }
  return { verdict: verdictOf(rules), rules, notChecked };
}

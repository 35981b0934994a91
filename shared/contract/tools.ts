// The calculators' answers (/tools/...): the shared computations, with what the server adds.
import type { PortFlowResult } from '../flow';
import type { PackagingFinding, ParsedPackagingCode } from '../packaging-code';
import type { PackagingMark } from '../packaging-mark';
import type { LengthRecommendation } from '../recommend-length';
import type { FlowUnit } from './units';

/** GET /tools/packaging-codes/:code: the code, and the rest of the mark when a whole mark was given. */
export type PackagingCodeAnswer = ParsedPackagingCode & { mark: PackagingMark | null };

/** POST /tools/flow: the shared computation plus the flow echoed in the other units and the site's laminar limit. */
export interface FlowAnswer extends PortFlowResult {
  flow: { value: number; unit: FlowUnit };
  flowGpm: number;
  flowM3h: number;
  laminarLimit: number;
}

/** GET /tools/drum-types/:id/checks. */
export interface DrumTypeChecks {
  recommendedLength: LengthRecommendation;
  packaging: PackagingFinding[];
}

// The dock check (lot) as the API answers it: GET/POST /receiving-checks, hold, release.
import type { TemperatureIndicator } from '../acceptance/types';
import type { LotDecision, LotVerdict } from '../dock/verdict';
import type { LotStatus } from './lot-status';
import type { FitCheckResult } from './records';
import type { ChangeOutRecord } from './stations';
import type { Verdict } from './verdicts';

/** A drum described at the dock instead of picked from the registry. */
export interface DrumDescription {
  insideDepthMm: number;
  openings: Array<{ label?: string; threadCode: string; keyCode?: string | null }>;
}

/** What the phone decided offline, sent with a queued check and kept beside the server's verdict. */
export interface ProvisionalVerdict {
  decision: string;
  verdict: string;
  sentence: string;
  revision: string;
  madeAt: string;
}

/** One recorded dock check (GET /receiving-checks/:id, POST /receiving-checks). */
export interface ReceivingCheckRecord {
  id: string;
  version: number;
  lotNumber: string;
  supplierId: string | null;
  supplierName: string | null;
  slurryId: string | null;
  slurryName: string | null;
  drumCount: number;
  drumTypeId: string | null;
  drumTypeName: string | null;
  drumTypePartNumber: string | null;
  drumDescription: DrumDescription | null;
  stationId: string | null;
  stationName: string | null;
  productionDate: string | null;
  expiryDate: string | null;
  temperatureIndicator: TemperatureIndicator | null;
  /** The hardware verdict alone. */
  verdict: Verdict;
  /** The combined decision (hardware and lot acceptance). */
  decision: LotDecision;
  /** The decision with its sentence; null for checks stored before lot acceptance. */
  lotVerdict: LotVerdict | null;
  /** The phone's own verdict, for a check made offline; null otherwise. */
  provisional: ProvisionalVerdict | null;
  result: FitCheckResult;
  checkedById: string;
  checkedByName: string | null;
  checkedAt: string;
  status: LotStatus;
  holdReason: string | null;
  heldByRules: boolean;
  heldByName: string | null;
  heldAt: string | null;
  releasedByName: string | null;
  releasedAt: string | null;
  releaseComment: string | null;
}

/** A row of the history list (GET /receiving-checks): the stored result is cut down to its summary. */
export type ReceivingCheckRow = Omit<ReceivingCheckRecord, 'result' | 'lotVerdict'> & { result: { summary: string }; lotVerdict: Pick<LotVerdict, 'decision' | 'sentence'> | null };

export interface ReceivingCheckDetail extends ReceivingCheckRecord {
  /** Every piece of hardware that touched this lot, in order. */
  changeOuts: ChangeOutRecord[];
}

import type { ReceivingCheck } from '../entities';
import type { DrumDescription, ProvisionalVerdict, ReceivingCheckRecord, ReceivingCheckRow } from '../../shared/contract/receiving';
import type { FitCheckResult } from '../../shared/contract/records';
import { copyOf, nameOf, type Sent } from '../common/json';

const COLUMNS = [
  'id',
  'version',
  'lotNumber',
  'supplierId',
  'slurryId',
  'drumCount',
  'drumTypeId',
  'stationId',
  'productionDate',
  'expiryDate',
  'temperatureIndicator',
  'verdict',
  'decision',
] as const;
const HOLD_COLUMNS = ['checkedById', 'status', 'holdReason', 'heldByRules', 'heldAt', 'releasedAt', 'releaseComment'] as const;

/** The columns and joined names a dock check answers with; the jsonb columns are added by the two shapes below. */
const recordBase = (r: ReceivingCheck) => ({
  ...copyOf(r, COLUMNS),
  ...copyOf(r, HOLD_COLUMNS),
  supplierName: r.supplier?.name ?? null,
  slurryName: r.slurry?.name ?? null,
  drumTypeName: r.drumType?.name ?? null,
  drumTypePartNumber: r.drumType?.partNumber ?? null,
  stationName: r.station?.name ?? null,
  checkedByName: nameOf(r.checkedBy),
  heldByName: nameOf(r.heldBy),
  releasedByName: nameOf(r.releasedBy),
  checkedAt: r.createdAt,
  // jsonb, as written by the dock check.
  drumDescription: r.drumDescription as DrumDescription | null,
  provisional: r.provisional as ProvisionalVerdict | null,
});

/** A dock check as the API answers it. */
export const receivingJson = (r: ReceivingCheck) => ({ ...recordBase(r), lotVerdict: r.acceptance, result: r.result as unknown as FitCheckResult }) satisfies Sent<ReceivingCheckRecord>;

/** A row of the history list: the stored result is large; the list needs only the verdict, the summary and the sentence. */
export const receivingRowJson = (r: ReceivingCheck) =>
  ({
    ...recordBase(r),
    lotVerdict: r.acceptance ? { decision: r.acceptance.decision, sentence: r.acceptance.sentence } : null,
    result: { summary: (r.result as { summary?: string }).summary ?? '' },
  }) satisfies Sent<ReceivingCheckRow>;

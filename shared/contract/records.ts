// The JSON shapes the registry API answers with, shared by the server's serialisers and the client.
import type { ThreadSpecRow } from '../threads/thread-table';
import type { RuleOutcome, Verdict } from './verdicts';
import type { SlurryProperties } from '../records/slurry';

export type Region = 'NA' | 'EU' | 'JP' | 'TW' | 'KR' | 'CN' | 'SG' | 'other';
export const REGION_LABELS: Record<Region, string> = {
  NA: 'North America',
  EU: 'Europe',
  JP: 'Japan',
  TW: 'Taiwan',
  KR: 'Korea',
  CN: 'China',
  SG: 'Singapore',
  other: 'Other',
};

export interface Stamped {
  id: string;
  version: number;
  createdAt: string;
  updatedAt: string;
}

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export interface ListParams {
  q?: string;
  sort?: string;
  order?: 'asc' | 'desc';
  page?: number;
  pageSize?: number;
  region?: string;
  thread?: string;
  key?: string;
  status?: string;
  supplierId?: string;
  stationId?: string;
}

export interface SupplierRecord extends Stamped {
  name: string;
  region: Region;
  contactEmail: string | null;
  notes: string | null;
  /** Detail only: how many records of each kind name this supplier. */
  drumTypes?: number;
  dipTubes?: number;
  connectors?: number;
}

/** A thread spec as stored: a row of the thread table (family includes ISO 7-1's R, Rc and Rp). */
export interface ThreadSpecRecord extends Stamped, ThreadSpecRow {}

export interface KeyCodeRecord extends Stamped {
  code: string;
  label: string;
  marking: string | null;
}

export interface OpeningRecord {
  id?: string;
  label: string;
  threadCode: string | null;
  boreMm: number;
  keyCode: string | null;
  position: 'large' | 'small' | 'center' | 'other';
}

export interface DrumTypeRecord extends Stamped {
  supplierId: string;
  supplierName: string | null;
  region: Region;
  name: string;
  partNumber: string;
  nominalCapacityL: number;
  material: 'steel' | 'plastic' | 'fibre' | 'aluminium' | 'other';
  head: 'tight' | 'open';
  unPackagingCode: string | null;
  outsideHeightMm: number;
  insideDepthMm: number;
  outsideDiameterMm: number;
  /** For the heel and run time; null when not registered. */
  insideDiameterMm: number | null;
  openings: OpeningRecord[];
  /** Detail only. */
  pairings?: Array<{ id: string; status: PairingStatus; dipTubeId: string; dipTubePartNumber?: string; threadCode?: string; connectorId: string; connectorPartNumber?: string }>;
  slurries?: Array<{ id: string; name: string }>;
}

export interface DipTubeRecord extends Stamped {
  partNumber: string;
  supplierId: string;
  supplierName: string | null;
  threadCode: string | null;
  lengthMm: number;
  boreMm: number;
  odMm: number;
  material: string;
  keyCode: string | null;
  channels: 'feed' | 'feed-return';
  fitsDrumTypes?: Array<{ id: string; name: string; partNumber: string; insideDepthMm: number }>;
  pairings?: Array<{ id: string; status: PairingStatus; connectorId: string; connectorPartNumber?: string }>;
}

export interface ConnectorRecord extends Stamped {
  partNumber: string;
  supplierId: string;
  supplierName: string | null;
  keyCode: string | null;
  feedBoreMm: number;
  feedNominal: string;
  returnBoreMm: number | null;
  returnNominal: string | null;
  returnPath: 'none' | 'restricted' | 'open';
  suitedTo: 'two-opening' | 'one-opening' | 'both';
  wettedMaterials: string;
  stations?: Array<{ id: string; name: string; bay: string; tapping: string }>;
  pairings?: Array<{ id: string; status: PairingStatus; dipTubeId: string; dipTubePartNumber?: string }>;
}

export type PairingStatus = 'draft' | 'approved' | 'retired';

export interface PairingReviewRecord {
  id: string;
  decision: 'approved' | 'rejected' | 'retired';
  comment: string;
  reviewerId: string;
  reviewerName: string | null;
  at: string;
}

export interface PairingRecord extends Stamped {
  dipTubeId: string;
  dipTubePartNumber: string | null;
  threadCode: string | null;
  connectorId: string;
  connectorPartNumber: string | null;
  status: PairingStatus;
  authorId: string;
  authorName: string | null;
  approverId: string | null;
  approverName: string | null;
  approvedAt: string | null;
  notes: string | null;
  reviews?: PairingReviewRecord[];
}

export interface SlurryRecord extends Stamped, SlurryProperties {
  name: string;
  supplierId: string;
  supplierName: string | null;
  region: Region;
  drumTypeId: string;
  drumTypeName: string | null;
  foams: boolean;
  shearSensitive: boolean;
  solidsWtPct: number;
  shelfLifeDays: number | null;
  minRemainingDays: number | null;
  storageMinC: number | null;
  storageMaxC: number | null;
  certificateRequired: boolean;
}

export interface StationRecord extends Stamped {
  name: string;
  bay: string;
  tapping: 'two-opening' | 'one-opening';
  agitation: 'pump' | 'mechanical';
  connectorId: string | null;
  connectorPartNumber: string | null;
  flowLpm: number;
  /** The transfer line to the loop (pressure drop); null when not registered. */
  lineLengthM: number | null;
  lineBoreMm: number | null;
  lineRoughnessUm: number | null;
  tubeSets?: Array<{ id: string; label: string; state: TubeSetState; dipTubePartNumber: string | null; lastRinsedAt: string | null; lastUsedAt: string | null }>;
}

export type TubeSetState = 'online' | 'standby' | 'cleaning' | 'ready';

export interface TubeSetRecord extends Stamped {
  stationId: string;
  stationName: string | null;
  label: string;
  dipTubeId: string;
  dipTubePartNumber: string | null;
  state: TubeSetState;
  lastRinsedAt: string | null;
  lastRinsedById: string | null;
  lastRinsedByName: string | null;
  lastUsedAt: string | null;
  /** The lot and drum the set is in (standby or online); null once it comes out. */
  currentLotNumber: string | null;
  currentDrumSerial: string | null;
}

export interface SettingsRecord {
  id: string;
  version: number;
  siteName: string;
  tipClearanceMinMm: number;
  tipClearanceMaxMm: number;
  threadMatchToleranceMm: number;
  laminarLimit: number;
  maxReturnVelocityRatio: number;
  /** IANA zone of the site: its local date is "today" for lot expiry. */
  timeZone: string;
  updatedAt: string;
}

export interface FitRuleRecord {
  rule: string;
  outcome: RuleOutcome;
  message: string;
  numbers?: Record<string, number>;
}

export interface FitCandidateRecord {
  dipTubeId: string;
  dipTubePartNumber: string;
  connectorId: string;
  connectorPartNumber: string;
  /** Absent in checks stored before they were added. */
  dipTubeThreadCode?: string;
  dipTubeLengthMm?: number;
  pairingId: string | null;
  pairingStatus: PairingStatus | null;
  installedAtStation: boolean;
  verdict: Verdict;
  rules: FitRuleRecord[];
  notChecked: Array<{ rule: string; reason: string }>;
}

export interface FitCheckResult {
  verdict: Verdict;
  summary: string;
  drum: {
    id: string | null;
    name: string | null;
    partNumber: string | null;
    insideDepthMm: number;
    openings: Array<{ label?: string; threadCode: string | null; keyCode: string | null; boreMm?: number | null }>;
  };
  station: { id?: string; name?: string; tapping: string; agitation: string; flowLpm?: number } | null;
  slurry: { id: string; name: string; foams: boolean; shearSensitive: boolean } | null;
  tubeSet: { id: string; label: string; dipTubeId: string; lastRinsedAt: string | null; lastUsedAt: string | null } | null;
  settings: { tipClearanceMinMm: number; tipClearanceMaxMm: number; threadMatchToleranceMm: number; laminarLimit: number; maxReturnVelocityRatio: number };
  candidates: FitCandidateRecord[];
  candidateCount: number;
  cautions: Array<{ topic: string; message: string }>;
}

/** One thing to order: registered parts by part number, an approval, or a specification to buy to. */
export interface OrderLine {
  kind: 'dip-tube' | 'connector' | 'approval' | 'spec';
  id?: string;
  partNumber?: string;
  description: string;
  note?: string;
  count: number;
}

/** What one station needs to run a drum type (a sourcing plan's impact, a held lot's warning). */
export interface StationNeed {
  stationId: string;
  stationName: string;
  verdict: Verdict;
  summary: string;
  order: OrderLine[];
}

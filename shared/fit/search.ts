// The candidate search and the ranked answer of a fit check, as pure functions: the server reads the pool
// with one SQL statement (server/fit/fit-check.service.ts) and the phone picks it from its kept registry
// snapshot with `selectPool`; both then call `judgeDrum`, so a verdict worked out offline is the server's.
import { drumVerdict, evaluateCandidate } from './evaluate';
import { handlingCautions } from './handling';
import { describeThread } from './rules';
import type { CandidateEvaluation, ConnectorInput, DrumInput, FitSettings, PairingStatus, SlurryInput, StationInput, TubeInput, TubeSetInput, Verdict } from './types';

/** Candidates considered per check: enough for any real drum position, bounded for a large registry. */
export const POOL_LIMIT = 60;
/** Candidates listed in an answer (the count says how many were judged). */
export const ANSWER_LIMIT = 20;
/** Tubes per thread taken from inside the reach window, and either side of it (so a near miss can say why). */
export const TUBES_IN_WINDOW = 20;
export const TUBES_NEAR_MISS = 3;

/** One candidate pairing as a flat row (the SQL's column names, so the server reads it without mapping). */
export interface PoolRow {
  pairing_id: string;
  status: PairingStatus;
  dip_tube_id: string;
  tube_part: string;
  thread_code: string;
  length_mm: number;
  tube_key: string | null;
  channels: TubeInput['channels'];
  tube_od_mm?: number | null;
  connector_id: string;
  head_part: string;
  head_key: string | null;
  feed_bore_mm: number;
  feed_nominal: string;
  return_bore_mm: number | null;
  return_nominal: string | null;
  return_path: ConnectorInput['returnPath'];
  suited_to: ConnectorInput['suitedTo'];
}

export interface FitCandidate extends CandidateEvaluation {
  dipTubeId: string;
  dipTubePartNumber: string;
  connectorId: string;
  connectorPartNumber: string;
  dipTubeThreadCode: string;
  dipTubeLengthMm: number;
  pairingId: string | null;
  pairingStatus: PairingStatus | null;
  installedAtStation: boolean;
}

/** A drum to judge: a registered drum type (id, name, part number) or one described at the dock (nulls). */
export interface JudgedDrum {
  id: string | null;
  name: string | null;
  partNumber: string | null;
  input: DrumInput;
}

export interface JudgedStation {
  id: string;
  name: string;
  connectorId: string | null;
}

export interface JudgedTubeSet {
  id: string;
  label: string;
  dipTubeId: string;
  lastRinsedAt: string | null;
  lastUsedAt: string | null;
}

export interface JudgeArgs {
  drum: JudgedDrum;
  pool: readonly PoolRow[];
  /** The station's tapping and flow (a registered station, or one described), or null for none. */
  station: StationInput | null;
  /** The registered station, when one was named. */
  stationRow: JudgedStation | null;
  slurry: { id?: string; name: string; foams: boolean; shearSensitive: boolean } | null;
  tubeSet: JudgedTubeSet | null;
  settings: FitSettings;
}

const SEVERITY: Record<Verdict, number> = { fits: 0, caution: 1, 'no-fit': 2 };
const STATUS_RANK: Record<PairingStatus, number> = { approved: 0, draft: 1, retired: 2 };

export const tubeInputOf = (p: PoolRow): TubeInput => ({
  id: p.dip_tube_id,
  partNumber: p.tube_part,
  threadCode: p.thread_code,
  lengthMm: p.length_mm,
  keyCode: p.tube_key,
  channels: p.channels,
  odMm: p.tube_od_mm ?? null,
});

export const connectorInputOf = (p: PoolRow): ConnectorInput => ({
  id: p.connector_id,
  partNumber: p.head_part,
  keyCode: p.head_key,
  feedBoreMm: p.feed_bore_mm,
  feedNominal: p.feed_nominal,
  returnBoreMm: p.return_bore_mm,
  returnNominal: p.return_nominal,
  returnPath: p.return_path,
  suitedTo: p.suited_to,
});

/** Best first: the verdict, then the head already at the station, then approval, then the tube's part number. */
export function rankCandidates(candidates: FitCandidate[]): FitCandidate[] {
  return candidates.sort(
    (a, b) =>
      SEVERITY[a.verdict] - SEVERITY[b.verdict] ||
      Number(b.installedAtStation) - Number(a.installedAtStation) ||
      STATUS_RANK[a.pairingStatus ?? 'retired'] - STATUS_RANK[b.pairingStatus ?? 'retired'] ||
      a.dipTubePartNumber.localeCompare(b.dipTubePartNumber),
  );
}

function summaryOf(verdict: Verdict, drum: JudgedDrum, best: FitCandidate | undefined, count: number): string {
  const what = drum.name ? `${drum.name} (${drum.partNumber})` : 'This drum';
  if (!best) {
    const threads = drum.input.openings.map((o) => describeThread(o.threadCode)).join(', ');
    return `${what}: no registered tube and head pairing threads into its openings (${threads}). Order hardware for this drum design before it is tapped.`;
  }
  const pair = `tube ${best.dipTubePartNumber} with head ${best.connectorPartNumber}`;
  if (verdict === 'fits') return `${what} fits: use ${pair} (approved pairing).`;
  const firstProblem = best.rules.find((r) => r.outcome !== 'pass');
  if (verdict === 'caution') return `${what}: caution with ${pair}. ${firstProblem?.message ?? ''}`.trim();
  return `${what} does not fit any of the ${count} pairing(s) checked. Closest: ${pair}. ${firstProblem?.message ?? ''}`.trim();
}

/** What every candidate of one check shares: the drum, the station, the slurry, the tube set and the settings. */
export type CandidateContext = Omit<JudgeArgs, 'pool'>;

/** One pool row judged by every rule, as a candidate of the answer. */
export function judgeCandidate(p: PoolRow, { drum, station, stationRow, slurry, tubeSet, settings }: CandidateContext): FitCandidate {
  const slurryInput: SlurryInput | null = slurry ? { foams: slurry.foams, shearSensitive: slurry.shearSensitive } : null;
  const tubeSetInput: TubeSetInput | null = tubeSet ? { lastRinsedAt: tubeSet.lastRinsedAt, lastUsedAt: tubeSet.lastUsedAt } : null;
  return {
    dipTubeId: p.dip_tube_id,
    dipTubePartNumber: p.tube_part,
    connectorId: p.connector_id,
    connectorPartNumber: p.head_part,
    dipTubeThreadCode: p.thread_code,
    dipTubeLengthMm: p.length_mm,
    pairingId: p.pairing_id,
    pairingStatus: p.status,
    installedAtStation: !!stationRow && stationRow.connectorId === p.connector_id,
    ...evaluateCandidate({
      drum: drum.input,
      tube: tubeInputOf(p),
      connector: connectorInputOf(p),
      station,
      slurry: slurryInput,
      pairing: { status: p.status },
      tubeSet: tubeSet && tubeSet.dipTubeId === p.dip_tube_id ? tubeSetInput : null,
      settings,
    }),
  };
}

/** Every candidate of the pool judged by every rule, ranked, and the answer a fit check gives. */
export function judgeDrum(args: JudgeArgs) {
  const { drum, pool, station, stationRow, slurry, tubeSet, settings } = args;
  const slurryInput: SlurryInput | null = slurry ? { foams: slurry.foams, shearSensitive: slurry.shearSensitive } : null;
  const candidates = rankCandidates(pool.map((p) => judgeCandidate(p, args)));
  const verdict = drumVerdict(candidates);
  return {
    verdict,
    summary: summaryOf(verdict, drum, candidates[0], candidates.length),
    drum: { id: drum.id, name: drum.name, partNumber: drum.partNumber, ...drum.input },
    station: (stationRow ? { id: stationRow.id, name: stationRow.name, ...station } : station) as (StationInput & { id?: string; name?: string }) | null,
    slurry: slurry ? { ...slurry, ...slurryInput } : null,
    tubeSet: tubeSet ? { id: tubeSet.id, label: tubeSet.label, dipTubeId: tubeSet.dipTubeId, lastRinsedAt: tubeSet.lastRinsedAt, lastUsedAt: tubeSet.lastUsedAt } : null,
    settings,
    candidates: candidates.slice(0, ANSWER_LIMIT).map(({ handling: _h, ...c }) => c),
    candidateCount: candidates.length,
    // Handling and pressure cautions go with every answer that involves hardware at a drum.
    cautions: handlingCautions({ handlesSlurry: true, pressurised: !!station }),
  };
}

export type FitAnswer = ReturnType<typeof judgeDrum>;

/** What `selectPool` reads: every tube by thread and length, every pairing that is not retired as a row. */
export interface PoolSource {
  tubes: ReadonlyArray<{ id: string; threadCode: string; lengthMm: number }>;
  pairings: readonly PoolRow[];
}

const byPool = (a: PoolRow, b: PoolRow) => Number(a.status !== 'approved') - Number(b.status !== 'approved') || cmp(a.tube_part, b.tube_part) || cmp(a.head_part, b.head_part);
// The database's "C"-like byte order for part numbers (ASCII), which is also what the SQL's ORDER BY gives.
const cmp = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

/** What the search reads of the drum: its inside depth and the threads of its openings. */
export interface PoolDrum {
  insideDepthMm: number;
  threadCodes: readonly string[];
}

/**
 * The tubes worth judging for a drum: for each of its threads, the 20 shortest inside the reach window (inside
 * depth less the site's largest and smallest tip clearance) and the 3 nearest either side, so a near miss can say why.
 */
export function selectTubes(tubes: PoolSource['tubes'], drum: PoolDrum, settings: FitSettings): Set<string> {
  const lo = drum.insideDepthMm - settings.tipClearanceMaxMm;
  const hi = drum.insideDepthMm - settings.tipClearanceMinMm;
  const tubeIds = new Set<string>();
  for (const code of new Set(drum.threadCodes)) {
    const ofThread = tubes.filter((t) => t.threadCode === code);
    const inside = ofThread.filter((t) => t.lengthMm >= lo && t.lengthMm <= hi).sort((a, b) => a.lengthMm - b.lengthMm);
    const below = ofThread.filter((t) => t.lengthMm < lo).sort((a, b) => b.lengthMm - a.lengthMm);
    const above = ofThread.filter((t) => t.lengthMm > hi).sort((a, b) => a.lengthMm - b.lengthMm);
    for (const t of [...inside.slice(0, TUBES_IN_WINDOW), ...below.slice(0, TUBES_NEAR_MISS), ...above.slice(0, TUBES_NEAR_MISS)]) tubeIds.add(t.id);
  }
  return tubeIds;
}

/**
 * The candidate pool, as the server's SQL picks it: the tubes `selectTubes` picks; their pairings that are not retired, approved first, at most 60; then the pairings of the
 * station's installed head, at most 60 more.
 */
export function selectPool(src: PoolSource, drum: PoolDrum, installedConnectorId: string | null, settings: FitSettings): PoolRow[] {
  const tubeIds = selectTubes(src.tubes, drum, settings);
  const live = src.pairings.filter((p) => p.status !== 'retired');
  const byTube = live
    .filter((p) => tubeIds.has(p.dip_tube_id))
    .sort(byPool)
    .slice(0, POOL_LIMIT);
  const taken = new Set(byTube.map((p) => p.pairing_id));
  const byHead = installedConnectorId
    ? live
        .filter((p) => p.connector_id === installedConnectorId && !taken.has(p.pairing_id))
        .sort(byPool)
        .slice(0, POOL_LIMIT)
    : [];
  return [...byTube, ...byHead];
}

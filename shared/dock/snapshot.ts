// What a phone keeps to judge a lot with no network (GET /api/dock-snapshot), and the judgement itself: the
// same candidate pool, fit rules, ranking and lot decision the server uses, over the kept registry.
import type { SlurryAcceptance, TemperatureIndicator } from '../acceptance/types';
import { localDate } from '../dates';
import type { FitSettings, StationInput } from '../fit/types';
import { judgeDrum, selectPool, type FitAnswer, type JudgedDrum, type JudgedTubeSet, type PoolRow } from '../fit/search';
import type { Region } from '../contract/records';
import type { DrumHead } from '../packaging-code';
import { decideLot, type LotVerdict } from './verdict';

export interface SnapshotDrumType {
  id: string;
  name: string;
  partNumber: string;
  supplierName: string | null;
  insideDepthMm: number;
  /** Absent from a snapshot kept before it was sent: the rules then take the head as not recorded (no buster change, so queued checks survive). */
  head?: DrumHead;
  openings: Array<{ label: string; threadCode: string; keyCode: string | null; boreMm: number | null }>;
}

export interface SnapshotStation {
  id: string;
  name: string;
  bay: string;
  tapping: StationInput['tapping'];
  agitation: StationInput['agitation'];
  flowLpm: number;
  connectorId: string | null;
  connectorPartNumber: string | null;
  /** The set that would go into the next drum: the first clean and ready one by label. */
  readyTubeSet: JudgedTubeSet | null;
}

export interface SnapshotSlurry {
  id: string;
  name: string;
  supplierId: string;
  supplierName: string | null;
  region: Region;
  /** The drum type it usually arrives in (the dock form fills it in). */
  drumTypeId: string | null;
  drumTypeName: string | null;
  foams: boolean;
  shearSensitive: boolean;
  acceptance: SlurryAcceptance;
}

/** The registry as the dock needs it, stamped with its revision (a digest of the content) and time. */
export interface DockSnapshot {
  revision: string;
  asOf: string;
  settings: FitSettings & { timeZone: string };
  threadCodes: string[];
  drumTypes: SnapshotDrumType[];
  tubes: Array<{ id: string; threadCode: string; lengthMm: number }>;
  pairings: PoolRow[];
  stations: SnapshotStation[];
  slurries: SnapshotSlurry[];
  suppliers: Array<{ id: string; name: string; region: Region }>;
}

/** The dock check's question, as POST /api/receiving-checks takes it. */
export interface DockQuestion {
  drumTypeId?: string;
  drum?: { insideDepthMm: number; openings: Array<{ label?: string; threadCode: string; keyCode?: string | null }> };
  slurryId?: string;
  stationId?: string;
  productionDate?: string;
  expiryDate?: string;
  temperatureIndicator?: TemperatureIndicator;
}

export interface ProvisionalCheck {
  result: FitAnswer;
  lotVerdict: LotVerdict;
}

/** A question the kept snapshot cannot answer (a record it does not hold): the field and why. */
export class SnapshotGap extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
  }
}

function drumOf(snap: DockSnapshot, q: DockQuestion): JudgedDrum {
  if (q.drumTypeId) {
    const d = snap.drumTypes.find((x) => x.id === q.drumTypeId);
    if (!d) throw new SnapshotGap('drumTypeId', 'This drum type is not in the registry kept on this phone.');
    return { id: d.id, name: d.name, partNumber: d.partNumber, input: { insideDepthMm: d.insideDepthMm, head: d.head, openings: d.openings } };
  }
  const drum = q.drum;
  if (!drum) throw new SnapshotGap('drumTypeId', 'Pick a drum type or describe the drum.');
  drum.openings.forEach((o, i) => {
    if (!snap.threadCodes.includes(o.threadCode)) throw new SnapshotGap(`drum.openings.${i}.threadCode`, 'This thread is not in the registry kept on this phone.');
  });
  return {
    id: null,
    name: null,
    partNumber: null,
    input: { insideDepthMm: drum.insideDepthMm, openings: drum.openings.map((o, i) => ({ label: o.label ?? `opening ${i + 1}`, threadCode: o.threadCode, keyCode: o.keyCode ?? null, boreMm: null })) },
  };
}

/**
 * The dock's verdict worked out from the kept registry: what the server's `create` decides for the same
 * question on the same day (no certificate is attached yet at a check). `now` is the phone's clock.
 */
export function provisionalCheck(snap: DockSnapshot, q: DockQuestion, now: Date): ProvisionalCheck {
  const drum = drumOf(snap, q);
  const settings = snap.settings;
  if (drum.input.insideDepthMm <= settings.tipClearanceMaxMm) {
    throw new SnapshotGap(q.drum ? 'drum.insideDepthMm' : 'drumTypeId', `The inside depth must be more than the site's largest tip clearance (${settings.tipClearanceMaxMm} mm).`);
  }
  const station = q.stationId ? snap.stations.find((s) => s.id === q.stationId) : undefined;
  if (q.stationId && !station) throw new SnapshotGap('stationId', 'This station is not in the registry kept on this phone.');
  const slurry = q.slurryId ? snap.slurries.find((s) => s.id === q.slurryId) : undefined;
  if (q.slurryId && !slurry) throw new SnapshotGap('slurryId', 'This slurry is not in the registry kept on this phone.');
  const pool = selectPool(
    snap,
    { insideDepthMm: drum.input.insideDepthMm, threadCodes: drum.input.openings.flatMap((o) => (o.threadCode ? [o.threadCode] : [])) },
    station?.connectorId ?? null,
    settings,
  );
  const { timeZone: _tz, ...fitSettings } = settings;
  const result = judgeDrum({
    drum,
    pool,
    station: station ? { tapping: station.tapping, agitation: station.agitation, flowLpm: station.flowLpm } : null,
    stationRow: station ? { id: station.id, name: station.name, connectorId: station.connectorId } : null,
    slurry: slurry ? { id: slurry.id, name: slurry.name, foams: slurry.foams, shearSensitive: slurry.shearSensitive } : null,
    tubeSet: station?.readyTubeSet ?? null,
    settings: fitSettings,
  });
  const best = result.candidates[0];
  const stationsWithHead =
    best && !station
      ? snap.stations
          .filter((s) => s.connectorId === best.connectorId)
          .map((s) => s.name)
          .sort(byName)
      : [];
  const lotVerdict = decideLot({
    fit: result,
    lot: {
      today: localDate(now, settings.timeZone),
      productionDate: q.productionDate ?? null,
      expiryDate: q.expiryDate ?? null,
      temperatureIndicator: q.temperatureIndicator ?? null,
      certificateAttached: false,
      slurry: slurry?.acceptance ?? null,
    },
    stationsWithHead,
  });
  return { result, lotVerdict };
}

// Station names as the server's ORDER BY name gives them for plain names.
const byName = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

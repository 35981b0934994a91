import { In, type EntityManager } from 'typeorm';
import { PairSearch, type HeadRow, type TubeRow } from '../../shared/fit/pair-search';
import { describeThread } from '../../shared/fit/rules';
import { selectTubes, type PoolDrum } from '../../shared/fit/search';
import { recommendDipTubeLength } from '../../shared/recommend-length';
import type { OrderLine, StationNeed } from '../../shared/contract/records';
import { Pairing, Station, TubeSet } from '../entities';

export type { OrderLine, StationNeed };
import { NEXT_TUBE_SET_ORDER, NEXT_TUBE_SET_STATE, type FitCheckService } from '../fit/fit-check.service';

/** Fit checks a plan runs at once, on the prepared-statement connections (server/db/prepared.ts: at least 2 per process). */
const CHECKS_AT_ONCE = 2;

/** Three sets per drum position: one online, one standby, one being cleaned [practice]. */
export const SETS_PER_POSITION = 3;

interface SlurryFlags {
  name: string;
  foams: boolean;
  shearSensitive: boolean;
}

/**
 * What each station needs to run a drum type: nothing when an approved pair fits with the sets it has;
 * otherwise the registered parts that would fit (and the approval they need), or a specification to buy to.
 * One fit check per station, through the fit service; the hypothetical pairs are searched once for all of them.
 */
export async function needsForStations(m: EntityManager, fit: FitCheckService, drumTypeId: string, stations: Station[], slurry: SlurryFlags | null): Promise<StationNeed[]> {
  // Every set of these stations in one read, in the order the fit service picks the next set by.
  const sets = stations.length ? await m.find(TubeSet, { where: { stationId: In(stations.map((s) => s.id)) }, order: NEXT_TUBE_SET_ORDER }) : [];
  const searches = new Map<string, Promise<PairSearch>>();
  const needOf = async (station: Station): Promise<StationNeed> => {
    const own = sets.filter((s) => s.stationId === station.id);
    const nextTubeSet = own.find((s) => s.state === NEXT_TUBE_SET_STATE) ?? null;
    const result = await fit.checkFor(m, { drumTypeId, slurry, at: { station, nextTubeSet } });
    const search = () => {
      // The same for every station of the plan unless the drum or the settings changed in between.
      const key = JSON.stringify([result.drum, result.settings]);
      if (!searches.has(key)) searches.set(key, pairSearch(m, result, slurry));
      return searches.get(key)!;
    };
    return needAt(m, station, result, own, search);
  };
  // The checks are independent reads: a few at once (the database waits dominate), in station order. A
  // transaction has one connection, so there one at a time.
  const needs: StationNeed[] = new Array(stations.length);
  let next = 0;
  let failed = false;
  const worker = async () => {
    // A failed check fails the request at once; the other worker then stops instead of checking the rest for nobody.
    while (next < stations.length && !failed) {
      const i = next++;
      try {
        needs[i] = await needOf(stations[i]);
      } catch (e) {
        failed = true;
        throw e;
      }
    }
  };
  await Promise.all(Array.from({ length: Math.min(m.queryRunner?.isTransactionActive ? 1 : CHECKS_AT_ONCE, stations.length) }, worker));
  return needs;
}

type Checked = Awaited<ReturnType<FitCheckService['checkFor']>>;

async function needAt(m: EntityManager, station: Station, result: Checked, sets: TubeSet[], search: () => Promise<PairSearch>): Promise<StationNeed> {
  const tubeOrder = (tubeId: string, partNumber: string): OrderLine[] => {
    const have = sets.filter((s) => s.dipTubeId === tubeId).length;
    const count = Math.max(0, SETS_PER_POSITION - have);
    return count ? [{ kind: 'dip-tube', id: tubeId, partNumber, description: `Dip tube ${partNumber}`, note: 'one set each for online, standby and cleaning', count }] : [];
  };
  const headOrder = (connectorId: string, partNumber: string): OrderLine[] =>
    station.connectorId === connectorId ? [] : [{ kind: 'connector', id: connectorId, partNumber, description: `Dispense head ${partNumber}`, note: "stays on the station's transfer line", count: 1 }];

  const best = result.candidates[0];
  if (result.verdict === 'fits' && best) {
    const order = [...tubeOrder(best.dipTubeId, best.dipTubePartNumber), ...headOrder(best.connectorId, best.connectorPartNumber)];
    return {
      stationId: station.id,
      stationName: station.name,
      verdict: 'fits',
      summary: order.length ? `Fits with ${best.dipTubePartNumber} and ${best.connectorPartNumber}; order the parts listed.` : `Fits with the hardware already at ${station.name}.`,
      order,
    };
  }

  // Nothing approved fits: the registered tubes the search picks for this drum with every head, judged and
  // ranked as if paired and approved, by the same search, rules and ranking as a fit check.
  const { drum: input, settings } = result;
  const pick = (await search()).best({ tapping: station.tapping, agitation: station.agitation, flowLpm: station.flowLpm }, { id: station.id, name: station.name, connectorId: station.connectorId });
  if (pick) {
    const [tube, head] = [pick.dipTubePartNumber, pick.connectorPartNumber];
    const approved = await m.findOneBy(Pairing, { dipTubeId: pick.dipTubeId, connectorId: pick.connectorId, status: 'approved' });
    const order: OrderLine[] = [...tubeOrder(pick.dipTubeId, tube), ...headOrder(pick.connectorId, head)];
    if (!approved) order.push({ kind: 'approval', description: `An engineer approves the pairing of ${tube} with ${head} before use`, count: 1 });
    const problems = pick.rules.filter((r) => r.outcome !== 'pass').map((r) => r.message);
    const note = pick.verdict === 'caution' ? ` Caution: ${problems.join(' ')}` : '';
    return { stationId: station.id, stationName: station.name, verdict: result.verdict, summary: `Registered parts would fit: ${tube} with ${head}.${note}`, order };
  }

  // No registered part fits: say what to buy.
  const window = recommendDipTubeLength({ insideDepthMm: input.insideDepthMm, tipClearanceMinMm: settings.tipClearanceMinMm, tipClearanceMaxMm: settings.tipClearanceMaxMm });
  const opening = input.openings[0];
  const threads = [...new Set(input.openings.map((o) => describeThread(o.threadCode)))].join(' or ');
  const order: OrderLine[] = [
    {
      kind: 'spec',
      description: `Dip tube for ${threads}, ${Math.round(window.minLengthMm)} to ${Math.round(window.maxLengthMm)} mm seat to tip (aim ${Math.round(window.targetMm)} mm)${opening?.keyCode ? `, keyed ${opening.keyCode}` : ''}: ${SETS_PER_POSITION} sets`,
      count: SETS_PER_POSITION,
    },
    {
      kind: 'spec',
      description:
        station.tapping === 'one-opening'
          ? `Dispense head for one-opening tapping with equal feed and return ports and an open return path${opening?.keyCode ? `, keyed ${opening.keyCode}` : ''}`
          : `Dispense head for two-opening tapping${opening?.keyCode ? `, keyed ${opening.keyCode}` : ''}`,
      count: 1,
    },
  ];
  return {
    stationId: station.id,
    stationName: station.name,
    verdict: result.verdict,
    summary: `No registered tube and head fit this drum at ${station.name}; order to the specification below.`,
    order,
  };
}

const TUBES_SQL = `SELECT t.id AS dip_tube_id, t.part_number AS tube_part, th.code AS thread_code, t.length_mm, tk.code AS tube_key, t.channels, t.od_mm AS tube_od_mm
  FROM dip_tubes t JOIN thread_specs th ON th.id = t.thread_spec_id LEFT JOIN key_codes tk ON tk.id = t.key_code_id
  WHERE th.code = ANY($1::text[]) ORDER BY t.part_number COLLATE "C"`;
const HEADS_SQL = `SELECT c.id AS connector_id, c.part_number AS head_part, ck.code AS head_key, c.feed_bore_mm, c.feed_nominal, c.return_bore_mm, c.return_nominal, c.return_path, c.suited_to
  FROM connectors c LEFT JOIN key_codes ck ON ck.id = c.key_code_id ORDER BY c.part_number COLLATE "C" LIMIT 500`;

/** Every head with each tube `selectTubes` picks for the drum, as approved pairings (hypothetical ones), ready to search. */
async function pairSearch(m: EntityManager, result: Checked, slurry: SlurryFlags | null): Promise<PairSearch> {
  const { id, name, partNumber, ...input } = result.drum;
  const drum: PoolDrum = { insideDepthMm: input.insideDepthMm, threadCodes: input.openings.flatMap((o) => (o.threadCode ? [o.threadCode] : [])) };
  const tubes: TubeRow[] = drum.threadCodes.length ? await m.query(TUBES_SQL, [[...new Set(drum.threadCodes)]]) : [];
  const picked = selectTubes(
    tubes.map((t) => ({ id: t.dip_tube_id, threadCode: t.thread_code, lengthMm: t.length_mm })),
    drum,
    result.settings,
  );
  const heads: HeadRow[] = picked.size ? await m.query(HEADS_SQL) : [];
  const ctx = { drum: { id, name, partNumber, input }, slurry, settings: result.settings };
  return new PairSearch(
    ctx,
    tubes.filter((t) => picked.has(t.dip_tube_id)),
    heads,
  );
}

/** Adds up order lines across stations (the same part for two stations is one line). */
export function totalOrder(needs: StationNeed[]): OrderLine[] {
  const byKey = new Map<string, OrderLine>();
  for (const n of needs) {
    for (const line of n.order) {
      const key = line.id ? `${line.kind}:${line.id}` : `${line.kind}:${line.description}:${n.stationId}`;
      const prev = byKey.get(key);
      if (prev) prev.count += line.count;
      else byKey.set(key, { ...line, description: line.id ? line.description : `${n.stationName}: ${line.description}` });
    }
  }
  return [...byKey.values()];
}

export async function stationsByIds(m: EntityManager, ids: string[]): Promise<Station[]> {
  return ids.length ? m.find(Station, { where: { id: In(ids) }, order: { name: 'ASC' } }) : [];
}

/** Order lines as short sentences for notices and e-mail. */
export function orderLines(order: OrderLine[]): string[] {
  return order.map((o) => `${o.count} x ${o.description}${o.note ? ` (${o.note})` : ''}`);
}

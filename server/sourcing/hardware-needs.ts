import { In, type EntityManager } from 'typeorm';
import { evaluateCandidate } from '../../shared/fit';
import { describeThread } from '../../shared/fit/rules';
import { recommendDipTubeLength } from '../../shared/recommend-length';
import type { OrderLine, StationNeed } from '../../shared/contract/records';
import { Connector, DipTube, Pairing, Station, TubeSet } from '../entities';

export type { OrderLine, StationNeed };
import type { FitCheckService } from '../fit/fit-check.service';
import { fitSettingsOf, loadSettings } from '../settings/settings.service';

/** Three sets per drum position: one online, one standby, one being cleaned [practice]. */
export const SETS_PER_POSITION = 3;

interface SlurryFlags {
  name: string;
  foams: boolean;
  shearSensitive: boolean;
}

/**
 * What one station needs to run a drum type: nothing when an approved pair fits with the sets it has;
 * otherwise the registered parts that would fit (and the approval they need), or a specification to buy to.
 */
export async function needsForStation(m: EntityManager, fit: FitCheckService, drumTypeId: string, station: Station, slurry: SlurryFlags | null): Promise<StationNeed> {
  const result = await fit.checkFor(m, { drumTypeId, stationId: station.id, slurry });
  const sets = await m.find(TubeSet, { where: { stationId: station.id } });
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

  // Nothing approved fits: look at every registered tube of the drum's threads with every head, as if approved.
  const drum = await fit.loadDrum(m, drumTypeId);
  const settings = fitSettingsOf(await loadSettings(m));
  const tubes = drum.threadSpecIds.length ? await m.find(DipTube, { where: { threadSpecId: In(drum.threadSpecIds) }, relations: { threadSpec: true, keyCode: true }, take: 200 }) : [];
  const heads = await m.find(Connector, { relations: { keyCode: true }, take: 500 });
  const stationInput = { tapping: station.tapping, agitation: station.agitation, flowLpm: station.flowLpm };
  let pick: { tube: DipTube; head: Connector; verdict: 'fits' | 'caution' | 'no-fit'; score: number; problems: string[] } | null = null;
  for (const tube of tubes) {
    for (const head of heads) {
      const e = evaluateCandidate({
        drum: drum.input,
        tube: { id: tube.id, partNumber: tube.partNumber, threadCode: tube.threadSpec!.code, lengthMm: tube.lengthMm, keyCode: tube.keyCode?.code ?? null, channels: tube.channels },
        connector: {
          id: head.id,
          partNumber: head.partNumber,
          keyCode: head.keyCode?.code ?? null,
          feedBoreMm: head.feedBoreMm,
          returnBoreMm: head.returnBoreMm,
          returnPath: head.returnPath,
          suitedTo: head.suitedTo,
        },
        station: stationInput,
        slurry: slurry ? { foams: slurry.foams, shearSensitive: slurry.shearSensitive } : null,
        pairing: { status: 'approved' },
        settings,
      });
      const score = { fits: 0, caution: 10, 'no-fit': 100 }[e.verdict] - (head.id === station.connectorId ? 2 : 0) - (sets.some((s) => s.dipTubeId === tube.id) ? 1 : 0);
      if (!pick || score < pick.score) pick = { tube, head, verdict: e.verdict, score, problems: e.rules.filter((r) => r.outcome !== 'pass').map((r) => r.message) };
    }
  }

  if (pick && pick.verdict !== 'no-fit') {
    const approved = await m.findOneBy(Pairing, { dipTubeId: pick.tube.id, connectorId: pick.head.id, status: 'approved' });
    const order: OrderLine[] = [...tubeOrder(pick.tube.id, pick.tube.partNumber), ...headOrder(pick.head.id, pick.head.partNumber)];
    if (!approved) order.push({ kind: 'approval', description: `An engineer approves the pairing of ${pick.tube.partNumber} with ${pick.head.partNumber} before use`, count: 1 });
    const note = pick.verdict === 'caution' ? ` Caution: ${pick.problems.join(' ')}` : '';
    return { stationId: station.id, stationName: station.name, verdict: result.verdict, summary: `Registered parts would fit: ${pick.tube.partNumber} with ${pick.head.partNumber}.${note}`, order };
  }

  // No registered part fits: say what to buy.
  const window = recommendDipTubeLength({ insideDepthMm: drum.input.insideDepthMm, tipClearanceMinMm: settings.tipClearanceMinMm, tipClearanceMaxMm: settings.tipClearanceMaxMm });
  const opening = drum.input.openings[0];
  const threads = [...new Set(drum.input.openings.map((o) => describeThread(o.threadCode)))].join(' or ');
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

// The best of many hypothetical pairs (every registered tube the candidate search picks, with every head) without
// judging each pair: sourcing asks it for each station a plan reaches, where nothing approved fits.
import { resolveSettings } from './rules';
import { FIT_RULES } from './registry';
import { isNotChecked } from './rule-kit';
import { connectorInputOf, judgeCandidate, tubeInputOf, type CandidateContext, type FitCandidate, type JudgedStation, type PoolRow } from './search';
import type { CandidateInput, ConnectorInput, RuleOutcome, StationInput, TubeInput, Verdict } from './types';

export type TubeRow = Pick<PoolRow, 'dip_tube_id' | 'tube_part' | 'thread_code' | 'length_mm' | 'tube_key' | 'channels' | 'tube_od_mm'>;
export type HeadRow = Omit<PoolRow, keyof TubeRow | 'pairing_id' | 'status'>;

const SEVERITY: Record<RuleOutcome, number> = { pass: 0, caution: 1, fail: 2 };
const NO_FIT = 2;
const VERDICT_LEVEL: Record<Verdict, number> = { fits: 0, caution: 1, 'no-fit': NO_FIT };

/**
 * What the rules can tell apart: a part without its id and part number, which no rule reads (the reads test
 * checks it). Parts of one shape are judged once.
 */
const shapeOf = ({ id: _id, partNumber: _p, ...rest }: TubeInput | ConnectorInput) => JSON.stringify(rest);

function shapes<T>(items: readonly T[], inputOf: (item: T) => TubeInput | ConnectorInput) {
  const index = new Map<string, number>();
  const reps: Array<TubeInput | ConnectorInput> = [];
  const shapeIds = items.map((item) => {
    const input = inputOf(item);
    const key = shapeOf(input);
    let n = index.get(key);
    if (n === undefined) index.set(key, (n = reps.push(input) - 1));
    return n;
  });
  return { reps, shapeIds };
}

/**
 * Every tube paired with every head, judged as approved pairings, as `judgeDrum` would rank them: the same
 * answer as `judgeDrum({ pool: tubes x heads }).candidates[0]` when that is not a no-fit, else undefined. Each
 * rule is judged once per shape of the parts it reads (`reads` in registry.ts) and station, so a tube-only rule
 * runs once per tube, not once per head; only the pick is judged whole, by `judgeCandidate`. `tubes` and
 * `heads` come in pool order (part numbers, byte order).
 */
export class PairSearch {
  private readonly tubeShapes;
  private readonly headShapes;
  /** Tube indexes in rank order: part number (`localeCompare`, as `rankCandidates`), then pool order. */
  private readonly tubeRank: number[];
  /** The first head (pool order) of each head shape. */
  private readonly firstHeadOf: number[];
  private readonly headIndexById: Map<string, number>;
  private readonly memo = new Map<string, number>();
  private readonly worstByStation = new Map<string, Uint8Array>();
  private readonly settings;

  constructor(
    private readonly ctx: Omit<CandidateContext, 'station' | 'stationRow' | 'tubeSet'>,
    private readonly tubes: readonly TubeRow[],
    private readonly heads: readonly HeadRow[],
  ) {
    this.tubeShapes = shapes(tubes, (t) => tubeInputOf(t as PoolRow));
    this.headShapes = shapes(heads, (h) => connectorInputOf(h as PoolRow));
    this.tubeRank = tubes.map((_, i) => i).sort((a, b) => tubes[a].tube_part.localeCompare(tubes[b].tube_part) || a - b);
    this.firstHeadOf = this.headShapes.reps.map((_, s) => this.headShapes.shapeIds.indexOf(s));
    this.headIndexById = new Map(heads.map((h, i) => [h.connector_id, i]));
    this.settings = resolveSettings(ctx.settings);
  }

  best(station: StationInput, stationRow: JudgedStation): FitCandidate | undefined {
    const nHeads = this.headShapes.reps.length;
    if (!this.tubes.length || !nHeads) return undefined;
    const worst = this.worstAt(station);
    const installed = stationRow.connectorId === null ? undefined : this.headIndexById.get(stationRow.connectorId);
    for (let level = 0; level < NO_FIT; level++) {
      // The head already at the station first; else the first tube in rank order that any head reaches this level
      // with, and of those heads the first in pool order.
      if (installed !== undefined) {
        const shape = this.headShapes.shapeIds[installed];
        const tube = this.tubeRank.find((i) => worst[this.tubeShapes.shapeIds[i] * nHeads + shape] === level);
        if (tube !== undefined) return this.judge(tube, installed, level, station, stationRow);
      }
      for (const i of this.tubeRank) {
        const row = this.tubeShapes.shapeIds[i] * nHeads;
        let head: number | undefined;
        for (let h = 0; h < nHeads; h++) if (worst[row + h] === level && (head === undefined || this.firstHeadOf[h] < head)) head = this.firstHeadOf[h];
        if (head !== undefined) return this.judge(i, head, level, station, stationRow);
      }
    }
    return undefined;
  }

  /** The worst outcome of every tube shape with every head shape at a station (tube-major), kept per station shape. */
  private worstAt(station: StationInput): Uint8Array {
    const stationKey = JSON.stringify(station);
    const kept = this.worstByStation.get(stationKey);
    if (kept) return kept;
    const [nTubes, nHeads] = [this.tubeShapes.reps.length, this.headShapes.reps.length];
    const byTube = new Uint8Array(nTubes);
    const byHead = new Uint8Array(nHeads);
    const worst = new Uint8Array(nTubes * nHeads);
    let constant = 0;
    for (const rule of FIT_RULES) {
      const [tube, head] = [rule.reads.includes('tube'), rule.reads.includes('connector')];
      const at = (t: number, h: number) => this.outcome(rule, tube ? t : -1, head ? h : -1, station, rule.reads.includes('station') ? stationKey : '');
      if (tube && head) for (let t = 0; t < nTubes; t++) for (let h = 0; h < nHeads; h++) worst[t * nHeads + h] = Math.max(worst[t * nHeads + h], at(t, h));
      else if (tube) for (let t = 0; t < nTubes; t++) byTube[t] = Math.max(byTube[t], at(t, 0));
      else if (head) for (let h = 0; h < nHeads; h++) byHead[h] = Math.max(byHead[h], at(0, h));
      else constant = Math.max(constant, at(0, 0));
    }
    for (let t = 0; t < nTubes; t++) for (let h = 0; h < nHeads; h++) worst[t * nHeads + h] = Math.max(worst[t * nHeads + h], byTube[t], byHead[h], constant);
    this.worstByStation.set(stationKey, worst);
    return worst;
  }

  /** One rule's outcome (0 pass or not checked, 1 caution, 2 fail) for a tube shape and a head shape (-1: not read). */
  private outcome(rule: (typeof FIT_RULES)[number], tube: number, head: number, station: StationInput, stationKey: string): number {
    const key = `${rule.name}|${tube}|${head}|${stationKey}`;
    let s = this.memo.get(key);
    if (s === undefined) {
      const { drum, slurry, settings } = this.ctx;
      const input: CandidateInput = {
        drum: drum.input,
        tube: this.tubeShapes.reps[Math.max(tube, 0)] as TubeInput,
        connector: this.headShapes.reps[Math.max(head, 0)] as ConnectorInput,
        station,
        slurry: slurry ? { foams: slurry.foams, shearSensitive: slurry.shearSensitive } : null,
        pairing: { status: 'approved' },
        tubeSet: null,
        settings,
      };
      const result = rule.check(input, this.settings);
      s = isNotChecked(result) ? 0 : SEVERITY[result.outcome];
      this.memo.set(key, s);
    }
    return s;
  }

  private judge(tube: number, head: number, level: number, station: StationInput, stationRow: JudgedStation): FitCandidate {
    const [t, h] = [this.tubes[tube], this.heads[head]];
    const row: PoolRow = { ...t, ...h, pairing_id: `${t.dip_tube_id}+${h.connector_id}`, status: 'approved' };
    const pick = judgeCandidate(row, { ...this.ctx, station, stationRow, tubeSet: null });
    // Judged whole, the pick must come out as the shapes said: otherwise a rule reads more than its `reads` lists.
    if (VERDICT_LEVEL[pick.verdict] !== level)
      throw new Error(`pair search: ${pick.dipTubePartNumber} with ${pick.connectorPartNumber} is ${pick.verdict}, not level ${level}: a rule's reads are incomplete`);
    return pick;
  }

  /** The worst outcome of the rules for a tube shape with a head shape at a station, each rule judged once per the shapes it reads. */
  private severity(tube: number, head: number, station: StationInput): number {
    const { drum, slurry, settings } = this.ctx;
    const stationKey = JSON.stringify(station);
    let worst = 0;
    for (const rule of FIT_RULES) {
      const key = `${rule.name}|${rule.reads.includes('tube') ? tube : ''}|${rule.reads.includes('connector') ? head : ''}|${rule.reads.includes('station') ? stationKey : ''}`;
      let s = this.memo.get(key);
      if (s === undefined) {
        const input: CandidateInput = {
          drum: drum.input,
          tube: this.tubeShapes.reps[tube] as TubeInput,
          connector: this.headShapes.reps[head] as ConnectorInput,
          station,
          slurry: slurry ? { foams: slurry.foams, shearSensitive: slurry.shearSensitive } : null,
          pairing: { status: 'approved' },
          tubeSet: null,
          settings,
        };
        const result = rule.check(input, resolveSettings(settings));
        s = isNotChecked(result) ? 0 : SEVERITY[result.outcome];
        this.memo.set(key, s);
      }
      if (s > worst) worst = s;
    }
    return worst;
  }
}

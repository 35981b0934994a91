// The search over hypothetical pairs (sourcing) judges each rule once per shape of the parts it reads: it must
// give exactly the pick of judging every pair, and every rule's `reads` must list what the rule reads.
import { FIT_RULES, type CandidatePart } from '../../shared/fit/registry';
import { PairSearch, type HeadRow, type TubeRow } from '../../shared/fit/pair-search';
import { DEFAULT_SETTINGS } from '../../shared/fit/rules';
import { judgeDrum, type JudgedDrum, type PoolRow } from '../../shared/fit/search';
import type { CandidateInput, ConnectorInput, StationInput, TubeInput } from '../../shared/fit/types';

/** A small deterministic generator (mulberry32), so a failure names its seed. */
function random(seed: number) {
  let a = seed;
  const next = () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return <T>(items: readonly T[]): T => items[Math.floor(next() * items.length)];
}

const THREADS = ['NPS-2', 'G-2'];
const KEYS = [null, null, 'K1', 'K2'];

function world(seed: number) {
  const pick = random(seed);
  const depth = pick([851, 880]);
  const drum: JudgedDrum = {
    id: 'drum',
    name: 'Drum',
    partNumber: 'D-1',
    input: {
      insideDepthMm: depth,
      head: pick(['tight', 'open', null] as const),
      openings: [
        { label: 'large bung', threadCode: pick(THREADS), keyCode: pick(KEYS), boreMm: pick([50, 75, null]) },
        { label: 'small bung', threadCode: pick(THREADS), keyCode: pick(KEYS), boreMm: pick([19, 50]) },
      ],
    },
  };
  // Few distinct values, so that shapes repeat and part numbers tie (the rank's last words).
  const tubes: TubeRow[] = Array.from({ length: 1 + Math.floor(seed % 9) }, (_, i) => ({
    dip_tube_id: `t${i}`,
    tube_part: pick(['BT-1', 'bt-2', 'BT-2', 'BT-10']),
    thread_code: pick(THREADS),
    length_mm: depth - pick([2, 10, 10, 20, 30]),
    tube_key: pick(KEYS),
    channels: pick(['feed', 'feed-return'] as const),
    tube_od_mm: pick([25.4, 25.4, 60, undefined]),
  }));
  const heads: HeadRow[] = Array.from({ length: 1 + Math.floor(seed % 7) }, (_, i) => {
    const ret = pick([null, 12.7, 19.05]);
    return {
      connector_id: `h${i}`,
      head_part: pick(['BH-1', 'BH-2', 'bh-3']),
      head_key: pick(KEYS),
      feed_bore_mm: 19.05,
      feed_nominal: '3/4 in',
      return_bore_mm: ret,
      return_nominal: ret === null ? null : '1/2 in',
      return_path: ret === null ? 'none' : pick(['open', 'restricted'] as const),
      suited_to: pick(['two-opening', 'one-opening', 'both'] as const),
    };
  });
  const station: StationInput = { tapping: pick(['two-opening', 'one-opening'] as const), agitation: pick(['pump', 'mechanical'] as const), flowLpm: pick([5, 20, 60]) };
  const stationRow = { id: 'st', name: 'Station', connectorId: pick([null, 'h0', 'h2', 'elsewhere']) };
  const slurry = pick([null, { name: 'Slurry', foams: true, shearSensitive: false }, { name: 'Slurry', foams: false, shearSensitive: true }]);
  return { drum, tubes, heads, station, stationRow, slurry, settings: DEFAULT_SETTINGS };
}

describe('the search over hypothetical pairs', () => {
  it('picks what judging every pair would pick, on 500 invented registries', () => {
    const picked = new Set<string>();
    for (let seed = 1; seed <= 500; seed++) {
      const w = world(seed);
      const pool: PoolRow[] = w.tubes.flatMap((t) => w.heads.map((h) => ({ ...t, ...h, pairing_id: `${t.dip_tube_id}+${h.connector_id}`, status: 'approved' as const })));
      const everyPair = judgeDrum({ ...w, pool, tubeSet: null }).candidates[0];
      const expected = everyPair && everyPair.verdict !== 'no-fit' ? everyPair : undefined;
      const search = new PairSearch({ drum: w.drum, slurry: w.slurry, settings: w.settings }, w.tubes, w.heads);
      const got = search.best(w.station, w.stationRow);
      picked.add(got ? `${got.verdict}${got.installedAtStation ? ', installed' : ''}` : 'none');
      expect({ seed, pick: got && { ...got, handling: undefined } }).toEqual({ seed, pick: expected && { ...expected, handling: undefined } });
      // Asked again (a second station of the same shape), from what it kept.
      expect(search.best(w.station, w.stationRow)).toEqual(got);
    }
    // The invented registries reach every branch.
    expect([...picked].sort()).toEqual(['caution', 'caution, installed', 'fits', 'fits, installed', 'none']);
  });

  it('lists in each rule every part it reads, and no rule reads a part id or part number', () => {
    for (let seed = 1; seed <= 500; seed++) {
      const w = world(seed);
      const row = { ...w.tubes[0], ...w.heads[0] };
      const read = new Set<string>();
      const watch = <T extends object>(part: CandidatePart, value: T): T =>
        new Proxy(value, {
          get(target, prop, receiver) {
            read.add(part);
            if (prop === 'id' || prop === 'partNumber') read.add(`${part}.${prop}`);
            return Reflect.get(target, prop, receiver);
          },
        });
      const tube: TubeInput = { id: 't', partNumber: row.tube_part, threadCode: row.thread_code, lengthMm: row.length_mm, keyCode: row.tube_key, channels: row.channels, odMm: row.tube_od_mm ?? null };
      const connector: ConnectorInput = {
        id: 'h',
        partNumber: row.head_part,
        keyCode: row.head_key,
        feedBoreMm: row.feed_bore_mm,
        feedNominal: row.feed_nominal,
        returnBoreMm: row.return_bore_mm,
        returnNominal: row.return_nominal,
        returnPath: row.return_path,
        suitedTo: row.suited_to,
      };
      for (const rule of FIT_RULES) {
        read.clear();
        const input: CandidateInput = {
          drum: w.drum.input,
          tube: watch('tube', tube),
          connector: watch('connector', connector),
          station: seed % 5 ? watch('station', w.station) : null,
          slurry: w.slurry,
          pairing: { status: 'approved' },
          tubeSet: null,
        };
        rule.check(input, DEFAULT_SETTINGS);
        expect({ rule: rule.name, reads: [...read].filter((p) => !(rule.reads as readonly string[]).includes(p)) }).toEqual({ rule: rule.name, reads: [] });
      }
    }
  });
});

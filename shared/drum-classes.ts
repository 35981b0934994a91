// Reference drum sizes: the published nominal classes a drum type is compared with, so that a typo in a
// recorded dimension (an inside depth of 581 for 851) is caught. Marks as in ../shared/REFERENCES.md:
// [pub] read from a published table, [mem] recalled (confirm against the purchased standard), [derived]
// worked out here (inside depth = 4 V / (pi D^2) from the class's capacity and inside diameter of 571.5 mm,
// outside height = inside depth + 35 mm of chimes and bottom recess [practice]).
//
// The match windows are this product's choice, wide enough for one maker's drum against another's and
// narrow enough to catch a slipped digit: outside diameter +-15 mm, outside height and inside depth +-30 mm.
// Classes are compared with a drum type of the same material whose nominal capacity is within 10 % of theirs.

import { formatLength, type LengthUnit } from './units';

export type DrumMaterial = 'steel' | 'plastic';
export type ValueMark = 'pub' | 'mem' | 'derived';

export interface DrumClass {
  id: string;
  /** How the class is named to people: standard, capacity and kind. */
  name: string;
  material: DrumMaterial;
  head: 'tight' | 'open' | 'either';
  capacityL: number;
  capacityMark: ValueMark;
  outsideDiameterMm: number;
  outsideHeightMm: number;
  insideDepthMm: number;
  /** Where the dimensions come from, with their marks. */
  dimensionsFrom: string;
}

export const MATCH_WINDOW_MM = { outsideDiameterMm: 15, outsideHeightMm: 30, insideDepthMm: 30 } as const;
export const CAPACITY_WINDOW = 0.1;

const ISO_15750_DIMS = 'outside diameter 584 mm [mem]; inside depth and outside height [derived] from the capacity and a 571.5 mm inside diameter';
const ISO_20848_DIMS = '220 L: outside diameter 581 mm, outside height 935 mm, inside depth 880 mm [mem]; 208.2 L depth and height [derived] in proportion';

function iso15750(part: 1 | 2, capacityL: number): DrumClass {
  const insideDepthMm = Math.round((4 * capacityL * 1e6) / (Math.PI * 571.5 ** 2));
  return {
    id: `iso-15750-${part}-${capacityL}`,
    name: `ISO 15750-${part} ${part === 1 ? 'open' : 'tight'} head steel drum, ${capacityL} L`,
    material: 'steel',
    head: part === 1 ? 'open' : 'tight',
    capacityL,
    capacityMark: 'pub',
    outsideDiameterMm: 584,
    outsideHeightMm: insideDepthMm + 35,
    insideDepthMm,
    dimensionsFrom: ISO_15750_DIMS,
  };
}

/** Every reference class, steel and plastic. */
export const DRUM_CLASSES: readonly DrumClass[] = [
  // ISO 15750-1 open head 208 / 210 / 216.5 L; ISO 15750-2 tight head 212 / 216.5 / 230 L total capacity [pub]
  ...[208, 210, 216.5].map((c) => iso15750(1, c)),
  ...[212, 216.5, 230].map((c) => iso15750(2, c)),
  {
    id: 'us-55-gal',
    name: 'US 55 gallon steel drum, 208.2 L',
    material: 'steel',
    head: 'either',
    capacityL: 208.2, // 55 US gal x 3.785411784 L [pub, NIST SP 811]
    capacityMark: 'pub',
    outsideDiameterMm: 597, // 23.5 in over the chimes [mem]
    outsideHeightMm: 876, // 34.5 in [mem]
    insideDepthMm: 851, // 33.5 in [pub, secondary]
    dimensionsFrom: 'inside 22.5 in (572 mm) x 33.5 in (851 mm) [pub, secondary]; outside 23.5 in x 34.5 in [mem]',
  },
  {
    id: 'jis-z-1601-200',
    name: 'JIS Z 1601 steel drum, 200 L',
    material: 'steel',
    head: 'either',
    capacityL: 200,
    capacityMark: 'mem',
    outsideDiameterMm: 581,
    outsideHeightMm: 875,
    insideDepthMm: 840,
    dimensionsFrom: 'outside diameter 581 mm, outside height 875 mm, inside depth 840 mm [mem: confirm against JIS Z 1601]',
  },
  // ISO 20848-2 tight head plastic drums 208.2 and 220 L [pub]
  {
    id: 'iso-20848-2-220',
    name: 'ISO 20848-2 tight head plastic drum, 220 L',
    material: 'plastic',
    head: 'tight',
    capacityL: 220,
    capacityMark: 'pub',
    outsideDiameterMm: 581,
    outsideHeightMm: 935,
    insideDepthMm: 880,
    dimensionsFrom: ISO_20848_DIMS,
  },
  {
    id: 'iso-20848-2-208.2',
    name: 'ISO 20848-2 tight head plastic drum, 208.2 L',
    material: 'plastic',
    head: 'tight',
    capacityL: 208.2,
    capacityMark: 'pub',
    outsideDiameterMm: 581,
    outsideHeightMm: 888,
    insideDepthMm: 833,
    dimensionsFrom: ISO_20848_DIMS,
  },
];

export interface DrumDimensions {
  material: string;
  nominalCapacityL: number;
  outsideDiameterMm: number;
  outsideHeightMm: number;
  insideDepthMm: number;
}

export type DimensionField = keyof typeof MATCH_WINDOW_MM;

export interface ClassDeviation {
  field: DimensionField;
  valueMm: number;
  classMm: number;
}

export type ReferenceCheck =
  /** No reference class of this material and nominal capacity (a 20 L pail): nothing to compare. */
  { status: 'no-class' } | { status: 'matches'; drumClass: DrumClass } | { status: 'far'; nearest: DrumClass; deviations: ClassDeviation[] };

const FIELD_WORDS: Record<DimensionField, string> = { outsideDiameterMm: 'outside diameter', outsideHeightMm: 'outside height', insideDepthMm: 'inside depth' };
const FIELDS = Object.keys(MATCH_WINDOW_MM) as DimensionField[];

/** Each dimension's deviation from a class as a share of its window (1 = at the edge). */
function shares(d: DrumDimensions, c: DrumClass): number[] {
  return FIELDS.map((f) => Math.abs(d[f] - c[f]) / MATCH_WINDOW_MM[f]);
}

/** Nearest first: fewest dimensions outside their window, then the smallest sum of shares. */
function nearer(a: number[], b: number[]): number {
  const outside = (x: number[]) => x.filter((v) => v > 1).length;
  const sum = (x: number[]) => x.reduce((t, v) => t + v, 0);
  return outside(a) - outside(b) || sum(a) - sum(b);
}

/** Compare a drum type's recorded size with the reference classes of its material and nominal capacity. */
export function checkAgainstClasses(d: DrumDimensions): ReferenceCheck {
  const candidates = DRUM_CLASSES.filter((c) => c.material === d.material && Math.abs(d.nominalCapacityL - c.capacityL) <= CAPACITY_WINDOW * c.capacityL);
  if (candidates.length === 0) return { status: 'no-class' };
  const best = candidates.map((c) => ({ c, shares: shares(d, c) })).sort((a, b) => nearer(a.shares, b.shares))[0];
  if (best.shares.every((v) => v <= 1)) return { status: 'matches', drumClass: best.c };
  const deviations = FIELDS.filter((f) => Math.abs(d[f] - best.c[f]) > MATCH_WINDOW_MM[f]).map((f) => ({ field: f, valueMm: d[f], classMm: best.c[f] }));
  return { status: 'far', nearest: best.c, deviations };
}

/** The caution for a drum far from every class, in the reader's length unit. */
export function farFromClassesSays(check: Extract<ReferenceCheck, { status: 'far' }>, unit: LengthUnit): string {
  const parts = check.deviations.map((x) => `${FIELD_WORDS[x.field]} ${formatLength(x.valueMm, unit, unit === 'mm' ? 0 : 1)} against about ${formatLength(x.classMm, unit, unit === 'mm' ? 0 : 1)}`);
  return `Far from every reference drum of this capacity. Nearest: ${check.nearest.name}; ${parts.join(', ')}. Check the recorded size against the supplier's drawing.`;
}

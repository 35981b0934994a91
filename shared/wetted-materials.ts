// Wetted materials against a slurry's chemistry. The table is common practice of chemical handling
// [practice] (material makers' resistance charts agree on these broad lines; none is quoted as a source):
// fluoropolymers (PFA, PTFE, FFKM) resist the whole pH range, oxidisers and solvents; PVDF is attacked by
// strong bases and by ketone and ester solvents; polyolefins (HDPE, PP) take acids and bases but strong
// oxidisers embrittle them and solvents swell them; 316L stainless pits in strong acids and sheds metal ions;
// EPDM takes bases and mild oxidisers but swells in solvents; FKM takes acids, oxidisers and solvents but
// not strong bases. Always check the maker's chart for the exact slurry and temperature.

export const WETTED_MATERIALS = ['PFA', 'PTFE', 'FFKM', 'PVDF', 'HDPE', 'PP', '316L', 'EPDM', 'FKM'] as const;
export type WettedMaterial = (typeof WETTED_MATERIALS)[number];

export type Oxidiser = 'none' | 'mild' | 'strong';

/** What a slurry's liquid is: its pH range, whether it carries an oxidiser, and whether it holds organic solvent. */
export interface SlurryChemistry {
  phMin: number;
  phMax: number;
  oxidiser: Oxidiser;
  /** Organic solvent content, percent by weight (0 for a water-based slurry). */
  solventWtPct: number;
}

export type Compatibility = 'resists' | 'limited' | 'attacked';

interface MaterialLimits {
  /** Below this pH the material is attacked; null: no lower limit. */
  phAttackedBelow: number | null;
  /** Above this pH the material is attacked; null: no upper limit. */
  phAttackedAbove: number | null;
  /** How it stands with each strength of oxidiser. */
  oxidiser: Record<Oxidiser, Compatibility>;
  /** Solvent content (wt %) from which the material is limited, and from which it is attacked; null: never. */
  solventLimitedFrom: number | null;
  solventAttackedFrom: number | null;
}

const FLUOROPOLYMER: MaterialLimits = {
  phAttackedBelow: null,
  phAttackedAbove: null,
  oxidiser: { none: 'resists', mild: 'resists', strong: 'resists' },
  solventLimitedFrom: null,
  solventAttackedFrom: null,
};
const POLYOLEFIN: MaterialLimits = { phAttackedBelow: null, phAttackedAbove: null, oxidiser: { none: 'resists', mild: 'limited', strong: 'attacked' }, solventLimitedFrom: 1, solventAttackedFrom: 20 };

/** [practice] for every row; the pH limits are the broad bands of resistance charts, not a material's exact edge. */
export const MATERIAL_LIMITS: Record<WettedMaterial, MaterialLimits> = {
  PFA: FLUOROPOLYMER,
  PTFE: FLUOROPOLYMER,
  FFKM: FLUOROPOLYMER,
  PVDF: { phAttackedBelow: null, phAttackedAbove: 12, oxidiser: { none: 'resists', mild: 'resists', strong: 'resists' }, solventLimitedFrom: 1, solventAttackedFrom: 10 },
  HDPE: POLYOLEFIN,
  PP: POLYOLEFIN,
  '316L': { phAttackedBelow: 2, phAttackedAbove: null, oxidiser: { none: 'resists', mild: 'resists', strong: 'limited' }, solventLimitedFrom: null, solventAttackedFrom: null },
  EPDM: { phAttackedBelow: 1, phAttackedAbove: null, oxidiser: { none: 'resists', mild: 'resists', strong: 'attacked' }, solventLimitedFrom: 1, solventAttackedFrom: 5 },
  FKM: { phAttackedBelow: null, phAttackedAbove: 11, oxidiser: { none: 'resists', mild: 'resists', strong: 'resists' }, solventLimitedFrom: null, solventAttackedFrom: null },
};

/** pH within this distance inside a limit counts as limited. */
export const PH_MARGIN = 1;

export interface MaterialJudgement {
  material: string;
  /** Null when the material is not in the table: the pairing is unknown. */
  compatibility: Compatibility | null;
  /** Why, in words a person reads; empty when it resists. */
  because: string[];
}

const WORSE: Record<Compatibility, number> = { resists: 0, limited: 1, attacked: 2 };

/** The recognised materials named in a free-text list such as "PFA, PTFE, FFKM seals" (FFKM is not read as FKM). */
export function materialsNamed(text: string): { known: WettedMaterial[]; unknown: string[] } {
  const known: WettedMaterial[] = [];
  const unknown: string[] = [];
  for (const part of text.split(/[,;/+]|\band\b/i)) {
    const words = part.trim();
    if (!words) continue;
    const hit = WETTED_MATERIALS.find((m) => new RegExp(`(^|[^A-Za-z0-9])${m}([^A-Za-z0-9]|$)`, 'i').test(words));
    if (hit) {
      if (!known.includes(hit)) known.push(hit);
    } else unknown.push(words);
  }
  return { known, unknown };
}

/** One material against one slurry's chemistry. */
export function judgeMaterial(material: string, chem: SlurryChemistry): MaterialJudgement {
  const key = WETTED_MATERIALS.find((m) => m.toLowerCase() === material.trim().toLowerCase());
  if (!key) return { material, compatibility: null, because: [`${material} is not in the wetted-materials table`] };
  const lim = MATERIAL_LIMITS[key];
  const found: Array<[Compatibility, string]> = [];
  if (lim.phAttackedAbove != null && chem.phMax > lim.phAttackedAbove) found.push(['attacked', `${key} is attacked above pH ${lim.phAttackedAbove}; the slurry reaches pH ${chem.phMax}`]);
  else if (lim.phAttackedAbove != null && chem.phMax > lim.phAttackedAbove - PH_MARGIN)
    found.push(['limited', `${key} is near its limit of pH ${lim.phAttackedAbove}; the slurry reaches pH ${chem.phMax}`]);
  if (lim.phAttackedBelow != null && chem.phMin < lim.phAttackedBelow) found.push(['attacked', `${key} is attacked below pH ${lim.phAttackedBelow}; the slurry goes down to pH ${chem.phMin}`]);
  else if (lim.phAttackedBelow != null && chem.phMin < lim.phAttackedBelow + PH_MARGIN)
    found.push(['limited', `${key} is near its limit of pH ${lim.phAttackedBelow}; the slurry goes down to pH ${chem.phMin}`]);
  const ox = lim.oxidiser[chem.oxidiser];
  if (ox !== 'resists') found.push([ox, `${key} is ${ox === 'attacked' ? 'attacked by' : 'limited with'} a ${chem.oxidiser} oxidiser`]);
  if (lim.solventAttackedFrom != null && chem.solventWtPct >= lim.solventAttackedFrom)
    found.push(['attacked', `${key} is attacked from ${lim.solventAttackedFrom} % solvent; the slurry holds ${chem.solventWtPct} %`]);
  else if (lim.solventLimitedFrom != null && chem.solventWtPct >= lim.solventLimitedFrom)
    found.push(['limited', `${key} is limited from ${lim.solventLimitedFrom} % solvent; the slurry holds ${chem.solventWtPct} %`]);
  const compatibility = found.reduce<Compatibility>((worst, [c]) => (WORSE[c] > WORSE[worst] ? c : worst), 'resists');
  return { material: key, compatibility, because: found.map(([, why]) => why) };
}

/** Every wetted material of a part against the slurry: the worst decides; an unknown material makes it at best unknown. */
export function judgeWettedParts(materialsText: string, chem: SlurryChemistry): { worst: Compatibility | null; judgements: MaterialJudgement[] } {
  const { known, unknown } = materialsNamed(materialsText);
  const judgements = [...known.map((m) => judgeMaterial(m, chem)), ...unknown.map((u) => judgeMaterial(u, chem))];
  if (judgements.some((j) => j.compatibility === 'attacked')) return { worst: 'attacked', judgements };
  if (judgements.some((j) => j.compatibility === null) || judgements.length === 0) return { worst: null, judgements };
  return { worst: judgements.some((j) => j.compatibility === 'limited') ? 'limited' : 'resists', judgements };
}

import type { FieldProblem } from './field';
import type { Rheology } from '../line-loss';
import type { Oxidiser, SlurryChemistry } from '../wetted-materials';

// One home for a slurry's limits and cross-field rules, read by the API's DTO (server/registry/registry.dto.ts,
// slurries/slurry.def.ts) and the form (components/forms/slurry-form.tsx). The receiving fields (shelf life,
// remaining life, storage range) are optional; the table's checks hold the same bounds (migrations, lot acceptance).
export const SLURRY_LIMITS = {
  nameChars: 120,
  solidsMinPct: 0,
  solidsMaxPct: 100,
  shelfLifeMinDays: 1,
  remainingMinDays: 0,
  /** Ten years [practice]: no slurry keeps longer. */
  daysMax: 3650,
  storageMinC: -50,
  storageMaxC: 80,
} as const;

/**
 * A slurry's own properties, each optional (a computation that needs a missing one says "not checked"): the
 * bounds of each, in its stored unit; `above` true when the lower bound itself is refused. The table's checks
 * (migrations/1764932400000-slurry-properties.ts) hold the same bounds. Wide on purpose [practice]: they refuse
 * typos (a density of 12 000), not unusual slurries. CMP slurries run about 1000–1300 kg/m³, 1–20 mPa·s, 20–300 nm
 * particles, pH 2–11 [practice].
 */
export const SLURRY_PROPERTY_LIMITS = {
  densityKgM3: { min: 500, max: 5000, above: false, unit: 'kg/m³' },
  viscosityMPaS: { min: 0, max: 100000, above: true, unit: 'mPa·s' },
  consistencyPaSn: { min: 0, max: 1000, above: true, unit: 'Pa·sⁿ' },
  flowIndex: { min: 0, max: 2, above: true, unit: '' },
  particleSizeNm: { min: 0, max: 100000, above: true, unit: 'nm' },
  minVelocityMs: { min: 0, max: 20, above: false, unit: 'm/s' },
  maxVelocityMs: { min: 0, max: 20, above: true, unit: 'm/s' },
  maxWallShearPerS: { min: 0, max: 1000000, above: true, unit: '1/s' },
  minTurnovers: { min: 0, max: 100, above: false, unit: 'turnovers' },
  minRecircMinutes: { min: 0, max: 1440, above: false, unit: 'min' },
  phMin: { min: 0, max: 14, above: false, unit: '' },
  phMax: { min: 0, max: 14, above: false, unit: '' },
  solventWtPct: { min: 0, max: 100, above: false, unit: '%' },
} as const;
export type SlurryPropertyField = keyof typeof SLURRY_PROPERTY_LIMITS;
export const SLURRY_PROPERTY_FIELDS = Object.keys(SLURRY_PROPERTY_LIMITS) as SlurryPropertyField[];

/** How the viscosity is given: one value (Newtonian) or the power law's consistency K and index n (shear-thinning). */
export const VISCOSITY_MODELS = ['newtonian', 'power-law'] as const;
export type ViscosityModel = (typeof VISCOSITY_MODELS)[number];
/** Strength of the oxidiser the slurry carries (shared/wetted-materials.ts judges the wetted parts by it). */
export const OXIDISERS = ['none', 'mild', 'strong'] as const satisfies readonly Oxidiser[];

/** What a bound says, in the field's unit: "must be more than 0 mPa·s", "must be at most 14". */
export function propertyBoundSays(field: SlurryPropertyField, side: 'min' | 'max'): string {
  const l = SLURRY_PROPERTY_LIMITS[field];
  const unit = l.unit ? ` ${l.unit}` : '';
  if (side === 'max') return `must be at most ${l.max}${unit}`;
  return l.above ? `must be more than ${l.min}${unit}` : `must be ${l.min}${unit} or more`;
}

export const SLURRY_SAYS = {
  wholeDays: 'must be a whole number of days',
  minRemainingDays: 'must be at most the shelf life',
  storageMaxC: 'must be above the lowest storage temperature',
  viscosityMPaS: 'is required for a Newtonian viscosity',
  consistencyPaSn: 'is required for a power-law viscosity',
  flowIndex: 'is required for a power-law viscosity',
  maxVelocityMs: 'must be above the lowest line velocity',
  phMax: 'must be at least the lowest pH',
} as const;

type Maybe = number | null | undefined;
type SlurryValues = {
  shelfLifeDays?: Maybe;
  minRemainingDays?: Maybe;
  storageMinC?: Maybe;
  storageMaxC?: Maybe;
  viscosityModel?: string | null;
  viscosityMPaS?: Maybe;
  consistencyPaSn?: Maybe;
  flowIndex?: Maybe;
  minVelocityMs?: Maybe;
  maxVelocityMs?: Maybe;
  phMin?: Maybe;
  phMax?: Maybe;
};

const above = (hi: Maybe, lo: Maybe, strict: boolean): boolean => hi == null || lo == null || (strict ? Number(hi) > Number(lo) : Number(hi) >= Number(lo));

/**
 * The rules across a slurry's fields: the remaining life asked for at the dock is at most the shelf life, and the
 * storage range is a range (the table's slurries_remaining_within_life and slurries_storage_range say the same);
 * the viscosity model has its values, and the velocity window and pH range are ranges (slurries_viscosity_given,
 * slurries_velocity_window, slurries_ph_range).
 * Null when they hold or a value is missing.
 */
export function slurryProblem(v: SlurryValues): FieldProblem | null {
  if (v.minRemainingDays != null && v.shelfLifeDays != null && Number(v.minRemainingDays) > Number(v.shelfLifeDays)) return { field: 'minRemainingDays', says: SLURRY_SAYS.minRemainingDays };
  if (!above(v.storageMaxC, v.storageMinC, true)) return { field: 'storageMaxC', says: SLURRY_SAYS.storageMaxC };
  if (v.viscosityModel === 'newtonian' && v.viscosityMPaS == null) return { field: 'viscosityMPaS', says: SLURRY_SAYS.viscosityMPaS };
  if (v.viscosityModel === 'power-law' && v.consistencyPaSn == null) return { field: 'consistencyPaSn', says: SLURRY_SAYS.consistencyPaSn };
  if (v.viscosityModel === 'power-law' && v.flowIndex == null) return { field: 'flowIndex', says: SLURRY_SAYS.flowIndex };
  if (!above(v.maxVelocityMs, v.minVelocityMs, true)) return { field: 'maxVelocityMs', says: SLURRY_SAYS.maxVelocityMs };
  if (!above(v.phMax, v.phMin, false)) return { field: 'phMax', says: SLURRY_SAYS.phMax };
  return null;
}

/** The slurry's properties as the computations read them (all optional on the record). */
export interface SlurryProperties {
  densityKgM3: number | null;
  viscosityModel: ViscosityModel | null;
  viscosityMPaS: number | null;
  consistencyPaSn: number | null;
  flowIndex: number | null;
  particleSizeNm: number | null;
  minVelocityMs: number | null;
  maxVelocityMs: number | null;
  maxWallShearPerS: number | null;
  minTurnovers: number | null;
  minRecircMinutes: number | null;
  phMin: number | null;
  phMax: number | null;
  oxidiser: Oxidiser | null;
  solventWtPct: number | null;
}

/** Every property key, in the order the form and the detail show them. */
export const SLURRY_PROPERTY_KEYS = [
  'densityKgM3',
  'viscosityModel',
  'viscosityMPaS',
  'consistencyPaSn',
  'flowIndex',
  'particleSizeNm',
  'minVelocityMs',
  'maxVelocityMs',
  'maxWallShearPerS',
  'minTurnovers',
  'minRecircMinutes',
  'phMin',
  'phMax',
  'oxidiser',
  'solventWtPct',
] as const satisfies readonly (keyof SlurryProperties)[];

/** The viscosity as shared/line-loss.ts reads it (SI), or null when the slurry's record does not give it. */
export function rheologyOf(p: Pick<SlurryProperties, 'viscosityModel' | 'viscosityMPaS' | 'consistencyPaSn' | 'flowIndex'>): Rheology | null {
  if (p.viscosityModel === 'newtonian' && p.viscosityMPaS != null) return { model: 'newtonian', viscosityPaS: Number(p.viscosityMPaS) / 1000 };
  if (p.viscosityModel === 'power-law' && p.consistencyPaSn != null && p.flowIndex != null) return { model: 'power-law', consistencyPaSn: Number(p.consistencyPaSn), flowIndex: Number(p.flowIndex) };
  return null;
}

/** The chemistry as shared/wetted-materials.ts reads it, or null when the pH range or the oxidiser is not given (no solvent given reads as none). */
export function chemistryOf(p: Pick<SlurryProperties, 'phMin' | 'phMax' | 'oxidiser' | 'solventWtPct'>): SlurryChemistry | null {
  if (p.phMin == null || p.phMax == null || p.oxidiser == null) return null;
  return { phMin: Number(p.phMin), phMax: Number(p.phMax), oxidiser: p.oxidiser, solventWtPct: Number(p.solventWtPct ?? 0) };
}

// Unit conversions used by every check. All stored lengths are mm and all flows m^3/s internally;
// other units exist only at the edges (forms, tables, reports).

/** 1 in = 25.4 mm exactly (NIST SP 811, Appendix B). */
export const MM_PER_IN = 25.4;
/** 1 US gal = 231 in^3 = 3.785411784 L exactly (NIST SP 811, Appendix B; 16 CFR 500.19). */
export const L_PER_US_GAL = 3.785411784;

/** 1 lb = 0.453 592 37 kg exactly (NIST SP 811, Appendix B). */
export const KG_PER_LB = 0.45359237;
/** 1 psi = 6.894 757 kPa (NIST SP 811, Appendix B: 6.894 757 E+03 Pa). */
export const KPA_PER_PSI = 6.894757293168361;

import { FLOW_UNITS, LENGTH_UNITS, VOLUME_UNITS, type FlowUnit, type LengthUnit, type VolumeUnit } from './contract/units';

export { FLOW_UNITS, LENGTH_UNITS, VOLUME_UNITS, type FlowUnit, type LengthUnit, type VolumeUnit };

/** Thrown when a unit string is not one we know, so a typo never converts silently. */
export class UnknownUnitError extends Error {
  readonly unit: string;
  readonly expected: readonly string[];

  constructor(unit: unknown, expected: readonly string[]) {
    super(`Unknown unit "${String(unit)}": expected one of ${expected.join(', ')}`);
    this.name = 'UnknownUnitError';
    this.unit = String(unit);
    this.expected = expected;
    // Keeps `instanceof` working when a bundler compiles classes down to ES5.
    Object.setPrototypeOf(this, new.target.prototype);
  }
}

export function isLengthUnit(x: unknown): x is LengthUnit {
  return typeof x === 'string' && (LENGTH_UNITS as readonly string[]).includes(x);
}

export function isVolumeUnit(x: unknown): x is VolumeUnit {
  return typeof x === 'string' && (VOLUME_UNITS as readonly string[]).includes(x);
}

export function isFlowUnit(x: unknown): x is FlowUnit {
  return typeof x === 'string' && (FLOW_UNITS as readonly string[]).includes(x);
}

// Millimetres per one of each length unit.
const MM_PER: Record<LengthUnit, number> = { mm: 1, in: MM_PER_IN };
// Litres per one of each volume unit.
const L_PER: Record<VolumeUnit, number> = { L: 1, gal: L_PER_US_GAL };
// Cubic metres per second per one of each flow unit.
const M3S_PER: Record<FlowUnit, number> = {
  'L/min': 1 / 1000 / 60,
  'gal/min': L_PER_US_GAL / 1000 / 60,
  'm3/h': 1 / 3600,
};

function lengthFactor(unit: unknown): number {
  if (!isLengthUnit(unit)) throw new UnknownUnitError(unit, LENGTH_UNITS);
  return MM_PER[unit];
}

function volumeFactor(unit: unknown): number {
  if (!isVolumeUnit(unit)) throw new UnknownUnitError(unit, VOLUME_UNITS);
  return L_PER[unit];
}

function flowFactor(unit: unknown): number {
  if (!isFlowUnit(unit)) throw new UnknownUnitError(unit, FLOW_UNITS);
  return M3S_PER[unit];
}

export function toMm(value: number, unit: LengthUnit): number {
  return value * lengthFactor(unit);
}

export function fromMm(mm: number, unit: LengthUnit): number {
  return mm / lengthFactor(unit);
}

export function mmToIn(mm: number): number {
  return mm / MM_PER_IN;
}

export function inToMm(inches: number): number {
  return inches * MM_PER_IN;
}

export function kgToLb(kg: number): number {
  return kg / KG_PER_LB;
}

export function kpaToPsi(kpa: number): number {
  return kpa / KPA_PER_PSI;
}

export function toLitres(value: number, unit: VolumeUnit): number {
  return value * volumeFactor(unit);
}

export function fromLitres(litres: number, unit: VolumeUnit): number {
  return litres / volumeFactor(unit);
}

export function flowToM3s(value: number, unit: FlowUnit): number {
  return value * flowFactor(unit);
}

export function fromM3s(m3s: number, unit: FlowUnit): number {
  return m3s / flowFactor(unit);
}

export function convertFlow(value: number, from: FlowUnit, to: FlowUnit): number {
  return fromM3s(flowToM3s(value, from), to);
}

// Inches need more decimals than mm to carry the same resolution (0.001 in is about 0.025 mm).
const DEFAULT_DIGITS: Record<LengthUnit, number> = { mm: 1, in: 3 };

/** Formats a length held in mm for display, e.g. formatLength(60.325, 'in') -> "2.375 in". */
export function formatLength(mm: number, unit: LengthUnit, digits?: number): string {
  const value = fromMm(mm, unit);
  return `${value.toFixed(digits ?? DEFAULT_DIGITS[unit])} ${unit}`;
}

/** 1 ft = 0.3048 m exactly (NIST SP 811, Appendix B). */
export const M_PER_FT = 0.3048;
/** 1 lb/ft³ = 16.018 46 kg/m³ (NIST SP 811, Appendix B: 1.601 846 E+01). */
export const KG_M3_PER_LB_FT3 = KG_PER_LB / M_PER_FT ** 3;

/** The quantities beyond length that a person reads in their preference: SI for mm, US customary for inches. */
export type Quantity = 'pressureKpa' | 'velocityMs' | 'densityKgM3' | 'volumeL' | 'flowLpm';

const QUANTITY_UNITS: Record<Quantity, { si: string; us: string; toUs: (v: number) => number; siDigits: number; usDigits: number }> = {
  pressureKpa: { si: 'kPa', us: 'psi', toUs: kpaToPsi, siDigits: 1, usDigits: 2 },
  velocityMs: { si: 'm/s', us: 'ft/s', toUs: (v) => v / M_PER_FT, siDigits: 2, usDigits: 2 },
  densityKgM3: { si: 'kg/m³', us: 'lb/ft³', toUs: (v) => v / KG_M3_PER_LB_FT3, siDigits: 0, usDigits: 1 },
  volumeL: { si: 'L', us: 'US gal', toUs: (v) => fromLitres(v, 'gal'), siDigits: 1, usDigits: 2 },
  flowLpm: { si: 'L/min', us: 'US gal/min', toUs: (v) => convertFlow(v, 'L/min', 'gal/min'), siDigits: 1, usDigits: 2 },
};

/** A quantity held in its SI unit, shown in the person's preference: formatQuantity(200, 'pressureKpa', 'in') -> "29.01 psi". */
export function formatQuantity(si: number, quantity: Quantity, unit: LengthUnit): string {
  const q = QUANTITY_UNITS[quantity];
  return unit === 'in' ? `${q.toUs(si).toFixed(q.usDigits)} ${q.us}` : `${si.toFixed(q.siDigits)} ${q.si}`;
}

/** The unit a quantity is read in for a person's preference (for column headers and form labels). */
export const quantityUnit = (quantity: Quantity, unit: LengthUnit): string => (unit === 'in' ? QUANTITY_UNITS[quantity].us : QUANTITY_UNITS[quantity].si);

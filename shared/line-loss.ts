// Pressure drop along a transfer line or through a port, for a Newtonian slurry or a shear-thinning one
// (power law, tau = K * gamma^n). SI throughout: m, m/s, m^3/s, Pa, Pa s, kg/m^3.
//
// Formulas (fluid-mechanics handbooks [pub], see ../shared/REFERENCES.md "Line pressure drop"):
// - Darcy-Weisbach: dp = f * (L / D) * rho * v^2 / 2
// - laminar friction factor f = 64 / Re (for a power-law fluid, with Re the Metzner-Reed number)
// - turbulent: Colebrook, 1/sqrt(f) = -2 log10( (eps/D)/3.7 + 2.51/(Re sqrt(f)) ), solved by iteration
// - Metzner-Reed: Re_MR = rho v^(2-n) D^n / (K 8^(n-1) ((3n+1)/(4n))^n); wall shear rate ((3n+1)/(4n)) 8v/D

import { DEFAULT_LAMINAR_LIMIT, DEFAULT_TURBULENT_FROM, flowRegime, meanVelocity, requireNonNegative as nonNegative, requirePositive as positive, type FlowRegime } from './flow';

/** How a slurry's viscosity is described: one viscosity, or the power-law consistency and index. */
export type Rheology = { model: 'newtonian'; viscosityPaS: number } | { model: 'power-law'; consistencyPaSn: number; flowIndex: number };

export interface LineInput {
  flowM3s: number;
  boreM: number;
  lengthM: number;
  /** Absolute wall roughness, m (drawn tubing and smooth plastics about 1.5e-6 m, common practice). */
  roughnessM: number;
  densityKgM3: number;
  rheology: Rheology;
  laminarLimit?: number;
}

export interface LineLoss {
  velocityMs: number;
  /** Reynolds number; the Metzner-Reed generalised number for a power-law slurry. */
  reynolds: number;
  regime: FlowRegime;
  /** Darcy friction factor. */
  friction: number;
  pressureDropPa: number;
  /** Wall shear rate, 1/s: 8v/D for a Newtonian slurry, ((3n+1)/(4n)) 8v/D for a power-law one (nominal when turbulent). */
  wallShearRatePerS: number;
}

/** Colebrook's Darcy friction factor for turbulent flow, by fixed-point iteration on x = 1/sqrt(f). */
export function colebrookFriction(reynolds: number, relativeRoughness: number): number {
  positive('reynolds', reynolds);
  nonNegative('relativeRoughness', relativeRoughness);
  let x = 1 / Math.sqrt(swameeJainFriction(reynolds, relativeRoughness));
  for (let i = 0; i < 50; i++) {
    const next = -2 * Math.log10(relativeRoughness / 3.7 + (2.51 * x) / reynolds);
    if (Math.abs(next - x) < 1e-12) return 1 / (next * next);
    x = next;
  }
  return 1 / (x * x);
}

/** Swamee-Jain's explicit approximation of Colebrook (within about 2 % of it [pub]); Colebrook's starting point. */
export function swameeJainFriction(reynolds: number, relativeRoughness: number): number {
  positive('reynolds', reynolds);
  nonNegative('relativeRoughness', relativeRoughness);
  const l = Math.log10(relativeRoughness / 3.7 + 5.74 / reynolds ** 0.9);
  return 0.25 / (l * l);
}

/** Metzner-Reed generalised Reynolds number of a power-law fluid; with n = 1 it is rho v D / K. */
export function metznerReedReynolds(densityKgM3: number, velocityMs: number, boreM: number, consistencyPaSn: number, flowIndex: number): number {
  positive('densityKgM3', densityKgM3);
  nonNegative('velocityMs', velocityMs);
  positive('boreM', boreM);
  positive('consistencyPaSn', consistencyPaSn);
  positive('flowIndex', flowIndex);
  const n = flowIndex;
  return (densityKgM3 * velocityMs ** (2 - n) * boreM ** n) / (consistencyPaSn * 8 ** (n - 1) * ((3 * n + 1) / (4 * n)) ** n);
}

/** Darcy-Weisbach pressure drop, Pa. */
export function darcyWeisbach(friction: number, lengthM: number, boreM: number, densityKgM3: number, velocityMs: number): number {
  nonNegative('friction', friction);
  nonNegative('lengthM', lengthM);
  positive('boreM', boreM);
  positive('densityKgM3', densityKgM3);
  nonNegative('velocityMs', velocityMs);
  return (friction * (lengthM / boreM) * densityKgM3 * velocityMs * velocityMs) / 2;
}

/**
 * Pressure drop and wall shear along one line. Laminar flow (below the laminar limit) uses 64/Re; above it,
 * Colebrook. Transitional flow is reported as such and computed with Colebrook, the larger and so the safer figure.
 */
export function lineLoss(input: LineInput): LineLoss {
  positive('boreM', input.boreM);
  nonNegative('lengthM', input.lengthM);
  nonNegative('roughnessM', input.roughnessM);
  positive('densityKgM3', input.densityKgM3);
  const laminarLimit = input.laminarLimit ?? DEFAULT_LAMINAR_LIMIT;
  const velocityMs = meanVelocity(input.flowM3s, input.boreM);
  const { rheology } = input;
  const n = rheology.model === 'power-law' ? rheology.flowIndex : 1;
  const reynolds =
    rheology.model === 'power-law'
      ? metznerReedReynolds(input.densityKgM3, velocityMs, input.boreM, rheology.consistencyPaSn, rheology.flowIndex)
      : (positive('viscosityPaS', rheology.viscosityPaS), (input.densityKgM3 * velocityMs * input.boreM) / rheology.viscosityPaS);
  const wallShearRatePerS = ((3 * n + 1) / (4 * n)) * ((8 * velocityMs) / input.boreM);
  if (velocityMs === 0) return { velocityMs, reynolds: 0, regime: 'laminar', friction: 0, pressureDropPa: 0, wallShearRatePerS: 0 };
  const regime = flowRegime(reynolds, laminarLimit, Math.max(DEFAULT_TURBULENT_FROM, laminarLimit));
  const friction = regime === 'laminar' ? 64 / reynolds : colebrookFriction(reynolds, input.roughnessM / input.boreM);
  return { velocityMs, reynolds, regime, friction, pressureDropPa: darcyWeisbach(friction, input.lengthM, input.boreM, input.densityKgM3, velocityMs), wallShearRatePerS };
}

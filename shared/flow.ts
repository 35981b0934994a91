// Pipe-flow numbers for connector ports. SI throughout (m, m^3/s, Pa); bores come in as mm because
// that is how they are recorded, and are converted once here.

import { fromM3s } from './units';

/** Water at 20 C [pub]: kinematic viscosity m^2/s, dynamic viscosity Pa s. */
export const WATER_20C = { nu: 1.004e-6, mu: 1.002e-3 } as const;

// Sources put the end of laminar flow at 2000, 2100 or 2300, so it is a setting; 2300 is the most
// quoted. Above 4000 flow is taken as fully turbulent.
export const DEFAULT_LAMINAR_LIMIT = 2300;
export const DEFAULT_TURBULENT_FROM = 4000;

export type FlowRegime = 'laminar' | 'transitional' | 'turbulent';

/** Throws a RangeError naming the value unless it is a finite number above zero. */
export function requirePositive(name: string, value: number): void {
  if (!Number.isFinite(value) || value <= 0) {
    throw new RangeError(`${name} must be a positive number, got ${String(value)}`);
  }
}

/** Throws a RangeError naming the value unless it is a finite number of zero or more. */
export function requireNonNegative(name: string, value: number): void {
  if (!Number.isFinite(value) || value < 0) {
    throw new RangeError(`${name} must be zero or more, got ${String(value)}`);
  }
}

/** Cross-section of a round bore, m^2: A = pi D^2 / 4. */
export function circleAreaM2(diameterM: number): number {
  requirePositive('diameterM', diameterM);
  return (Math.PI * diameterM * diameterM) / 4;
}

/** Mean velocity v = Q / A, m/s. */
export function meanVelocity(flowM3s: number, diameterM: number): number {
  requireNonNegative('flowM3s', flowM3s);
  return flowM3s / circleAreaM2(diameterM);
}

/** Nominal (Newtonian, fully developed laminar) wall shear rate 8 v / D, 1/s; only indicative in turbulent flow. */
export function wallShearRate(velocityMs: number, diameterM: number): number {
  requireNonNegative('velocityMs', velocityMs);
  requirePositive('diameterM', diameterM);
  return (8 * velocityMs) / diameterM;
}

/** Re = v D / nu. */
export function reynoldsNumber(velocityMs: number, diameterM: number, nu: number = WATER_20C.nu): number {
  requireNonNegative('velocityMs', velocityMs);
  requirePositive('diameterM', diameterM);
  requirePositive('nu', nu);
  return (velocityMs * diameterM) / nu;
}

export function flowRegime(reynolds: number, laminarLimit: number = DEFAULT_LAMINAR_LIMIT, turbulentFrom: number = DEFAULT_TURBULENT_FROM): FlowRegime {
  requirePositive('laminarLimit', laminarLimit);
  if (turbulentFrom < laminarLimit) {
    throw new RangeError(`turbulentFrom (${turbulentFrom}) must not be below laminarLimit (${laminarLimit})`);
  }
  if (reynolds < laminarLimit) return 'laminar';
  if (reynolds <= turbulentFrom) return 'transitional';
  return 'turbulent';
}

/** Hagen-Poiseuille pressure drop, Pa: dp = 32 mu L v / D^2. Valid only for laminar flow. */
export function laminarPressureDrop(args: { mu?: number; lengthM: number; velocityMs: number; diameterM: number }): number {
  const mu = args.mu ?? WATER_20C.mu;
  requirePositive('mu', mu);
  requireNonNegative('lengthM', args.lengthM);
  requireNonNegative('velocityMs', args.velocityMs);
  requirePositive('diameterM', args.diameterM);
  return (32 * mu * args.lengthM * args.velocityMs) / (args.diameterM * args.diameterM);
}

/** At equal flow, v_return / v_feed = (D_feed / D_return)^2. */
export function velocityRatio(feedBoreMm: number, returnBoreMm: number): number {
  requirePositive('feedBoreMm', feedBoreMm);
  requirePositive('returnBoreMm', returnBoreMm);
  return (feedBoreMm / returnBoreMm) ** 2;
}

export interface PortFlow {
  boreMm: number;
  areaM2: number;
  velocityMs: number;
  /** Nominal wall shear rate 8 v / D, 1/s. */
  shearRatePerS: number;
  reynolds: number;
  regime: FlowRegime;
  /** Hagen-Poiseuille Pa per metre of bore, or null when the flow is not laminar (formula does not apply). */
  laminarPressureDropPaPerM: number | null;
}

export interface PortFlowInput {
  flowM3s: number;
  feedBoreMm: number;
  returnBoreMm?: number | null;
  laminarLimit?: number;
  /** Kinematic viscosity, m^2/s (default water at 20 C). */
  nu?: number;
  /** Dynamic viscosity, Pa s (default water at 20 C). */
  mu?: number;
}

export interface PortFlowResult {
  flowM3s: number;
  flowLpm: number;
  feed: PortFlow;
  /** Present when a return bore was given; the same flow is assumed to come back. */
  return?: PortFlow;
  /** (D_feed / D_return)^2, present with a return bore. */
  velocityRatio?: number;
}

function portFlow(flowM3s: number, boreMm: number, nu: number, mu: number, laminarLimit: number): PortFlow {
  requirePositive('bore', boreMm);
  const d = boreMm / 1000;
  const velocityMs = meanVelocity(flowM3s, d);
  const reynolds = reynoldsNumber(velocityMs, d, nu);
  const regime = flowRegime(reynolds, laminarLimit, Math.max(DEFAULT_TURBULENT_FROM, laminarLimit));
  return {
    boreMm,
    areaM2: circleAreaM2(d),
    velocityMs,
    shearRatePerS: wallShearRate(velocityMs, d),
    reynolds,
    regime,
    laminarPressureDropPaPerM: regime === 'laminar' ? laminarPressureDrop({ mu, lengthM: 1, velocityMs, diameterM: d }) : null,
  };
}

/** Velocities, shear rates and regimes in a connector's feed and (optional) return bores at one flow. */
export function computePortFlow(input: PortFlowInput): PortFlowResult {
  const nu = input.nu ?? WATER_20C.nu;
  const mu = input.mu ?? WATER_20C.mu;
  const laminarLimit = input.laminarLimit ?? DEFAULT_LAMINAR_LIMIT;
  requireNonNegative('flowM3s', input.flowM3s);
  requirePositive('nu', nu);
  requirePositive('mu', mu);

  const feed = portFlow(input.flowM3s, input.feedBoreMm, nu, mu, laminarLimit);
  const result: PortFlowResult = { flowM3s: input.flowM3s, flowLpm: fromM3s(input.flowM3s, 'L/min'), feed };
  if (input.returnBoreMm !== undefined && input.returnBoreMm !== null) {
    result.return = portFlow(input.flowM3s, input.returnBoreMm, nu, mu, laminarLimit);
    result.velocityRatio = velocityRatio(input.feedBoreMm, input.returnBoreMm);
  }
  return result;
}

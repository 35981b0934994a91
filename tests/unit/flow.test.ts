import { circleAreaM2, computePortFlow, flowRegime, laminarPressureDrop, meanVelocity, reynoldsNumber, velocityRatio, wallShearRate, WATER_20C } from '../../shared/flow';
import { flowToM3s } from '../../shared/units';

describe('worked examples', () => {
  it('Hagen-Poiseuille: water 20 C, v 0.800 m/s, R 0.500 mm, L 2.00 m', () => {
    const d = 2 * 0.5e-3;
    // textbook Hagen-Poiseuille example: Q = 6.28e-7 m^3/s [pub]
    expect(0.8 * circleAreaM2(d)).toBeCloseTo(6.28e-7, 9);
    const dp = laminarPressureDrop({ mu: 1.002e-3, lengthM: 2, velocityMs: 0.8, diameterM: d });
    // textbook Hagen-Poiseuille example: dp = 5.13e4 Pa [pub]
    expect(dp / 1e4).toBeCloseTo(5.13, 2);
    // Same result through the other published form, dp = 8 mu L Q / (pi R^4) [pub]
    const q = 0.8 * Math.PI * 0.5e-3 ** 2;
    expect(dp).toBeCloseTo((8 * 1.002e-3 * 2 * q) / (Math.PI * 0.5e-3 ** 4), 6);
  });

  it('10 m^3/h through a 50 mm bore', () => {
    const q = flowToM3s(10, 'm3/h');
    const v = meanVelocity(q, 0.05);
    expect(v).toBeCloseTo(1.415, 3); // shear-rate worked example: v = 1.415 m/s [pub]
    expect(wallShearRate(v, 0.05)).toBeCloseTo(226.4, 1); // shear-rate worked example: 8 v / D = 226.4 1/s [pub]
    // Equivalent form 32 Q / (pi D^3) [pub]
    expect(wallShearRate(v, 0.05)).toBeCloseTo((32 * q) / (Math.PI * 0.05 ** 3), 9);
  });

  it('Reynolds number: v 2 m/s, D 0.1 m, nu 1e-6 m^2/s', () => {
    expect(reynoldsNumber(2, 0.1, 1e-6)).toBeCloseTo(200000, 6); // Re = v D / nu = 200000 [pub]
    expect(flowRegime(200000)).toBe('turbulent');
  });

  it('uses water at 20 C by default', () => {
    expect(WATER_20C.nu).toBe(1.004e-6); // water 20 C kinematic viscosity 1.004e-6 m^2/s [pub]
    expect(WATER_20C.mu).toBe(1.002e-3); // water 20 C dynamic viscosity 1.002e-3 Pa s [pub]
    expect(reynoldsNumber(1, 0.01)).toBeCloseTo(0.01 / 1.004e-6, 6);
  });
});

describe('regime', () => {
  it('uses a configurable laminar limit and 4000 for fully turbulent', () => {
    // Laminar limit differs by source (2000, 2100, 2300) [pub]: configurable
    expect(flowRegime(2200)).toBe('laminar');
    expect(flowRegime(2200, 2000)).toBe('transitional');
    expect(flowRegime(2300)).toBe('transitional');
    expect(flowRegime(4000)).toBe('transitional');
    expect(flowRegime(4001)).toBe('turbulent');
    expect(() => flowRegime(3000, 5000, 4000)).toThrow(RangeError);
  });
});

describe('velocity ratio (Df/Dr)^2', () => {
  it('equals the ratio of the computed port velocities at equal flow', () => {
    // v_return / v_feed = (D_feed / D_return)^2 [derived from v = Q / A]
    const q = flowToM3s(20, 'L/min');
    const ratio = meanVelocity(q, 0.0127) / meanVelocity(q, 0.01905);
    expect(velocityRatio(19.05, 12.7)).toBeCloseTo(ratio, 12);
    expect(velocityRatio(19.05, 12.7)).toBeCloseTo(2.25, 12); // 3/4 in over 1/2 in: 1.5^2 [practice example]
    expect(velocityRatio(12.7, 12.7)).toBe(1);
  });
});

describe('computePortFlow', () => {
  it('returns feed and return figures in SI plus L/min', () => {
    const q = flowToM3s(20, 'L/min');
    const r = computePortFlow({ flowM3s: q, feedBoreMm: 19.05, returnBoreMm: 12.7 });
    expect(r.flowLpm).toBeCloseTo(20, 12);
    expect(r.feed.velocityMs).toBeCloseTo(q / ((Math.PI * 0.01905 ** 2) / 4), 12);
    expect(r.return!.velocityMs).toBeCloseTo(q / ((Math.PI * 0.0127 ** 2) / 4), 12);
    expect(r.velocityRatio).toBeCloseTo(2.25, 12);
    expect(r.return!.velocityMs / r.feed.velocityMs).toBeCloseTo(r.velocityRatio!, 12);
    expect(r.feed.shearRatePerS).toBeCloseTo((8 * r.feed.velocityMs) / 0.01905, 9);
    expect(r.feed.reynolds).toBeCloseTo((r.feed.velocityMs * 0.01905) / 1.004e-6, 6);
    expect(r.feed.regime).toBe('turbulent');
    expect(r.feed.laminarPressureDropPaPerM).toBeNull();
  });

  it('gives the Hagen-Poiseuille drop per metre when laminar, with overridden viscosity', () => {
    // A viscous fluid: nu 1e-4 m^2/s, mu 0.1 Pa s
    const r = computePortFlow({ flowM3s: flowToM3s(1, 'L/min'), feedBoreMm: 10, nu: 1e-4, mu: 0.1 });
    expect(r.return).toBeUndefined();
    expect(r.feed.regime).toBe('laminar');
    expect(r.feed.laminarPressureDropPaPerM).toBeCloseTo((32 * 0.1 * 1 * r.feed.velocityMs) / 0.01 ** 2, 9);
  });

  it('applies the caller laminar limit', () => {
    const q = flowToM3s(1, 'L/min'); // about 2100 in a 10 mm bore of water
    const reynolds = computePortFlow({ flowM3s: q, feedBoreMm: 10 }).feed.reynolds;
    expect(reynolds).toBeGreaterThan(2000);
    expect(reynolds).toBeLessThan(2300);
    expect(computePortFlow({ flowM3s: q, feedBoreMm: 10 }).feed.regime).toBe('laminar');
    expect(computePortFlow({ flowM3s: q, feedBoreMm: 10, laminarLimit: 2000 }).feed.regime).toBe('transitional');
  });

  it('rejects bad input', () => {
    expect(() => computePortFlow({ flowM3s: -1, feedBoreMm: 10 })).toThrow(RangeError);
    expect(() => computePortFlow({ flowM3s: 1e-4, feedBoreMm: 0 })).toThrow(RangeError);
    expect(() => computePortFlow({ flowM3s: 1e-4, feedBoreMm: 10, nu: 0 })).toThrow(RangeError);
  });
});

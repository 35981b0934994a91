import { colebrookFriction, darcyWeisbach, lineLoss, metznerReedReynolds, swameeJainFriction } from '../../shared/line-loss';
import { KPA_PER_PSI } from '../../shared/units';

const FT = 0.3048; // 1 ft = 0.3048 m exactly [pub, NIST SP 811 Appendix B]
const G = 9.80665; // standard gravity, m/s^2 [pub, NIST SP 811]

describe('Darcy-Weisbach with Colebrook', () => {
  it('reproduces the textbook example: water at 60 F, 2 in stainless pipe, 0.2 ft^3/s, 200 ft', () => {
    // Water at 60 F: rho 1.94 slug/ft^3 = 999 kg/m^3, mu 2.34e-5 lbf s/ft^2 = 1.12e-3 Pa s [pub, fluid-mechanics property tables]
    // Stainless (drawn) pipe roughness 0.000007 ft [mem: the textbook's roughness table]
    const r = lineLoss({
      flowM3s: 0.2 * FT ** 3,
      boreM: 2 * 0.0254,
      lengthM: 200 * FT,
      roughnessM: 0.000007 * FT,
      densityKgM3: 999,
      rheology: { model: 'newtonian', viscosityPaS: 1.12e-3 },
    });
    // REFERENCES.md "Line pressure drop" [mem]: V 9.17 ft/s, Re about 126,000, f about 0.0174, dp about 11.8 psi, head loss about 27.3 ft
    expect(r.velocityMs / FT).toBeCloseTo(9.17, 2);
    expect(r.reynolds / 1000).toBeCloseTo(126, -1);
    expect(r.regime).toBe('turbulent');
    expect(r.friction).toBeCloseTo(0.0174, 4);
    expect(r.pressureDropPa / 1000 / KPA_PER_PSI).toBeCloseTo(11.8, 1);
    expect(r.pressureDropPa / (999 * G) / FT).toBeCloseTo(27.3, 0);
  });

  it('agrees with Prandtl smooth-pipe law and with Swamee-Jain within 3 %', () => {
    // Smooth pipe, Re 1e5: 1/sqrt(f) = 2 log10(Re sqrt(f)) - 0.8 gives f = 0.0180 [pub, Moody chart / Prandtl]
    expect(colebrookFriction(1e5, 0)).toBeCloseTo(0.018, 3);
    // Explicit approximations agree with Colebrook within about 2 % [pub, fluid-mechanics handbooks]; measured here:
    // at most 2.8 %, at Re 5000 with eps/D 0.01, the corner of Swamee-Jain's stated range (Re 5e3 to 1e8, eps/D to 1e-2)
    for (const re of [5e3, 2e4, 1e5, 1e6, 1e7]) {
      for (const rel of [0, 1e-5, 1e-4, 1e-3, 1e-2]) {
        const f = colebrookFriction(re, rel);
        expect(Math.abs(swameeJainFriction(re, rel) - f) / f).toBeLessThan(0.03);
        // f solves Colebrook itself
        expect(1 / Math.sqrt(f)).toBeCloseTo(-2 * Math.log10(rel / 3.7 + 2.51 / (re * Math.sqrt(f))), 9);
      }
    }
  });

  it('laminar flow uses 64/Re and gives the Hagen-Poiseuille drop', () => {
    // Textbook Hagen-Poiseuille example: water 20 C, mu 1.002e-3 Pa s, v 0.800 m/s, R 0.500 mm, L 2.00 m: dp = 5.13e4 Pa [pub]
    const d = 1e-3;
    const r = lineLoss({ flowM3s: 0.8 * Math.PI * (d / 2) ** 2, boreM: d, lengthM: 2, roughnessM: 0, densityKgM3: 998.2, rheology: { model: 'newtonian', viscosityPaS: 1.002e-3 } });
    expect(r.regime).toBe('laminar');
    expect(r.friction).toBeCloseTo(64 / r.reynolds, 12);
    expect(r.pressureDropPa / 1e4).toBeCloseTo(5.13, 2);
  });

  it('a still line loses nothing, and a rougher wall loses more', () => {
    const base = { boreM: 0.025, lengthM: 10, densityKgM3: 1200, rheology: { model: 'newtonian' as const, viscosityPaS: 3e-3 } };
    expect(lineLoss({ ...base, flowM3s: 0, roughnessM: 0 }).pressureDropPa).toBe(0);
    const smooth = lineLoss({ ...base, flowM3s: 1e-3, roughnessM: 1.5e-6 });
    const rough = lineLoss({ ...base, flowM3s: 1e-3, roughnessM: 1e-4 });
    expect(smooth.regime).toBe('turbulent');
    expect(rough.pressureDropPa).toBeGreaterThan(smooth.pressureDropPa);
  });
});

describe('power-law slurry (Metzner-Reed)', () => {
  it('with n = 1 is the Newtonian Reynolds number and shear rate', () => {
    // Metzner and Reed 1955: the generalised number reduces to rho v D / mu for n = 1 [pub]
    expect(metznerReedReynolds(1000, 1.5, 0.02, 1e-3, 1)).toBeCloseTo((1000 * 1.5 * 0.02) / 1e-3, 6);
    const a = lineLoss({ flowM3s: 1e-5, boreM: 0.01, lengthM: 1, roughnessM: 0, densityKgM3: 1100, rheology: { model: 'power-law', consistencyPaSn: 0.05, flowIndex: 1 } });
    const b = lineLoss({ flowM3s: 1e-5, boreM: 0.01, lengthM: 1, roughnessM: 0, densityKgM3: 1100, rheology: { model: 'newtonian', viscosityPaS: 0.05 } });
    expect(a.reynolds).toBeCloseTo(b.reynolds, 9);
    expect(a.pressureDropPa).toBeCloseTo(b.pressureDropPa, 6);
    expect(a.wallShearRatePerS).toBeCloseTo((8 * a.velocityMs) / 0.01, 9);
  });

  it('laminar: 64/Re_MR gives the power-law pipe drop dp = 4 L tau_w / D', () => {
    // Power-law laminar pipe flow: tau_w = K (((3n+1)/(4n)) 8v/D)^n and dp = 4 L tau_w / D [pub, non-Newtonian flow texts]
    const K = 0.8;
    const n = 0.45;
    const D = 0.0127;
    const L = 5;
    const r = lineLoss({ flowM3s: 5e-5, boreM: D, lengthM: L, roughnessM: 0, densityKgM3: 1250, rheology: { model: 'power-law', consistencyPaSn: K, flowIndex: n } });
    expect(r.regime).toBe('laminar');
    const gammaW = ((3 * n + 1) / (4 * n)) * ((8 * r.velocityMs) / D);
    expect(r.wallShearRatePerS).toBeCloseTo(gammaW, 9);
    expect(r.pressureDropPa).toBeCloseTo((4 * L * K * gammaW ** n) / D, 6);
  });

  it('a shear-thinning slurry sees a higher wall shear rate than 8v/D', () => {
    const r = lineLoss({ flowM3s: 5e-5, boreM: 0.0127, lengthM: 1, roughnessM: 0, densityKgM3: 1250, rheology: { model: 'power-law', consistencyPaSn: 0.8, flowIndex: 0.5 } });
    expect(r.wallShearRatePerS).toBeCloseTo(1.25 * ((8 * r.velocityMs) / 0.0127), 9);
  });
});

describe('input', () => {
  it('refuses a bore, density or viscosity that is not positive, naming it', () => {
    const ok = { flowM3s: 1e-4, boreM: 0.02, lengthM: 3, roughnessM: 0, densityKgM3: 1000, rheology: { model: 'newtonian' as const, viscosityPaS: 1e-3 } };
    expect(() => lineLoss({ ...ok, boreM: 0 })).toThrow(/boreM/);
    expect(() => lineLoss({ ...ok, densityKgM3: Number.NaN })).toThrow(/densityKgM3/);
    expect(() => lineLoss({ ...ok, rheology: { model: 'newtonian', viscosityPaS: -1 } })).toThrow(/viscosityPaS/);
    expect(() => lineLoss({ ...ok, rheology: { model: 'power-law', consistencyPaSn: 1, flowIndex: 0 } })).toThrow(/flowIndex/);
    expect(() => darcyWeisbach(0.02, -1, 0.02, 1000, 1)).toThrow(/lengthM/);
  });
});

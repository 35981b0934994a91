import { cylinderVolumeL, drumRun, heelVolumeL } from '../../shared/heel';
import { fromLitres } from '../../shared/units';

describe('heel and run time', () => {
  it('reproduces the 55 gal drum bottom: 0.2565 L per mm, 2.57 L under a 10 mm tip', () => {
    // ../shared/REFERENCES.md "Drum geometry at the bottom" [derived]: D 571.5 mm, 0.2565 L/mm, 10 mm -> about 2.57 L
    expect(cylinderVolumeL(571.5, 1)).toBeCloseTo(0.2565, 4);
    expect(heelVolumeL(571.5, 10)).toBeCloseTo(2.565, 2);
    // NIST SP 811: 1 US gal = 3.785411784 L, so 2.565 L = 0.678 gal
    expect(fromLitres(heelVolumeL(571.5, 10), 'gal')).toBeCloseTo(0.678, 3);
  });

  it('grows with the square of the diameter and linearly with the clearance', () => {
    expect(heelVolumeL(400, 20) / heelVolumeL(200, 20)).toBeCloseTo(4, 9);
    expect(heelVolumeL(400, 30) / heelVolumeL(400, 10)).toBeCloseTo(3, 9);
    expect(heelVolumeL(400, 0)).toBe(0);
  });

  it('gives the usable volume and the time to empty at the station flow', () => {
    // 200 L at 20 L/min: 10 min per drum volume [derived, ../shared/REFERENCES.md "Recirculation"]
    const run = drumRun({ insideDiameterMm: 571.5, tipClearanceMm: 10, fillL: 200, flowLpm: 20 });
    expect(run.usableL).toBeCloseTo(200 - 2.565, 2);
    expect(run.runMinutes).toBeCloseTo((200 - 2.565) / 20, 2);
    expect(drumRun({ insideDiameterMm: 571.5, tipClearanceMm: 10, fillL: 200 }).runMinutes).toBeNull();
    expect(drumRun({ insideDiameterMm: 571.5, tipClearanceMm: 1000, fillL: 200 }).usableL).toBe(0);
  });

  it('refuses impossible inputs', () => {
    expect(() => cylinderVolumeL(0, 10)).toThrow(RangeError);
    expect(() => cylinderVolumeL(500, -1)).toThrow(RangeError);
    expect(() => drumRun({ insideDiameterMm: 500, tipClearanceMm: 10, fillL: 200, flowLpm: 0 })).toThrow(RangeError);
  });
});

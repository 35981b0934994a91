import { checkAgainstClasses, DRUM_CLASSES, farFromClassesSays, MATCH_WINDOW_MM } from '../../shared/drum-classes';
import { cylinderVolumeL } from '../../shared/heel';
import { L_PER_US_GAL } from '../../shared/units';

const us55 = { material: 'steel', nominalCapacityL: 208, outsideDiameterMm: 597, outsideHeightMm: 876, insideDepthMm: 851 };

describe('reference drum classes', () => {
  it('hold the published capacities', () => {
    const caps = (prefix: string) => DRUM_CLASSES.filter((c) => c.id.startsWith(prefix)).map((c) => c.capacityL);
    expect(caps('iso-15750-1-')).toEqual([208, 210, 216.5]); // ISO 15750-1 open head 208 / 210 / 216.5 L [pub]
    expect(caps('iso-15750-2-')).toEqual([212, 216.5, 230]); // ISO 15750-2 tight head 212 / 216.5 / 230 L [pub]
    expect(caps('iso-20848-2-').sort()).toEqual([208.2, 220]); // ISO 20848-2 tight head plastic 208.2 and 220 L [pub]
    // 55 US gal = 208.2 L (1 US gal = 3.785411784 L exactly [pub, NIST SP 811])
    expect(DRUM_CLASSES.find((c) => c.id === 'us-55-gal')?.capacityL).toBeCloseTo(55 * L_PER_US_GAL, 1);
  });

  it('derive ISO 15750 depths that hold the class capacity in a 571.5 mm bore', () => {
    for (const c of DRUM_CLASSES.filter((k) => k.id.startsWith('iso-15750'))) {
      // V = pi/4 D^2 h [derived, REFERENCES.md "Drum geometry at the bottom"]
      expect(cylinderVolumeL(571.5, c.insideDepthMm)).toBeCloseTo(c.capacityL, 0);
      expect(c.outsideHeightMm).toBeGreaterThan(c.insideDepthMm);
    }
  });

  it('the US drum: 22.5 in x 33.5 in inside holds at least 55 gal', () => {
    // inside about 22.5 in (572 mm) x 33.5 in (851 mm) [pub, secondary]
    expect(cylinderVolumeL(22.5 * 25.4, 33.5 * 25.4)).toBeGreaterThan(55 * L_PER_US_GAL);
  });
});

describe('checkAgainstClasses', () => {
  it('a drum of a class matches it', () => {
    const r = checkAgainstClasses(us55);
    expect(r.status).toBe('matches');
    if (r.status === 'matches') expect(r.drumClass.id).toBe('us-55-gal');
  });

  it('a slipped digit in the inside depth is far, naming the nearest class and the field', () => {
    const r = checkAgainstClasses({ ...us55, insideDepthMm: 581 });
    expect(r.status).toBe('far');
    if (r.status !== 'far') return;
    expect(r.nearest.id).toBe('us-55-gal');
    expect(r.deviations).toEqual([{ field: 'insideDepthMm', valueMm: 581, classMm: 851 }]);
    expect(farFromClassesSays(r, 'mm')).toMatch(/Nearest: US 55 gallon steel drum, 208\.2 L; inside depth 581 mm against about 851 mm/);
    expect(farFromClassesSays(r, 'in')).toMatch(/inside depth 22\.9 in against about 33\.5 in/);
  });

  it('sits inside the window at its edge and outside just past it', () => {
    const edge = us55.insideDepthMm + MATCH_WINDOW_MM.insideDepthMm;
    expect(checkAgainstClasses({ ...us55, insideDepthMm: edge }).status).toBe('matches');
    expect(checkAgainstClasses({ ...us55, insideDepthMm: edge + 1 }).status).toBe('far');
  });

  it('compares only the same material and a capacity within 10 %', () => {
    expect(checkAgainstClasses({ ...us55, material: 'plastic', nominalCapacityL: 20 }).status).toBe('no-class');
    expect(checkAgainstClasses({ ...us55, nominalCapacityL: 120 }).status).toBe('no-class');
    expect(checkAgainstClasses({ ...us55, material: 'fibre' }).status).toBe('no-class');
    // 200 L plastic is within 10 % of the 208.2 L and 220 L classes
    expect(checkAgainstClasses({ material: 'plastic', nominalCapacityL: 200, outsideDiameterMm: 581, outsideHeightMm: 935, insideDepthMm: 880 }).status).toBe('matches');
  });
});

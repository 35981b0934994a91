import { identifyThread, threadSpecEquals } from '../../shared/threads/identify';
import { findThreadSpec, THREAD_TABLE } from '../../shared/threads/thread-table';

// The G / NPS / NPT / buttress cases below are about those families; ISO 7-1 R, Rc and Rp share the G
// dimensions (told apart by taper and by being internal or external) and have their own block at the end.
const WITHOUT_ISO_7 = THREAD_TABLE.filter((r) => !['R', 'Rc', 'Rp'].includes(r.family));
const identifyWithoutIso7 = (m: Parameters<typeof identifyThread>[0], opts?: Parameters<typeof identifyThread>[2]) => identifyThread(m, WITHOUT_ISO_7, opts);

const IN = 25.4; // NIST SP 811 Appendix B: 1 in = 25.4 mm exactly [pub]

// Published dimensions, typed in here from the sources (not read from the table under test).
// ASME B1.20.1, Table 2 [pub]: nominal size, threads per inch, pipe OD in inches; 60 deg form, taper 1:16.
const ASME_B1_20_1 = [
  { size: '1/2', tpi: 14, odIn: 0.84 },
  { size: '3/4', tpi: 14, odIn: 1.05 },
  { size: '1', tpi: 11.5, odIn: 1.315 },
  { size: '1-1/2', tpi: 11.5, odIn: 1.9 },
  { size: '2', tpi: 11.5, odIn: 2.375 },
];
// ISO 228-1 [pub]: size, threads per inch, pitch mm, major diameter mm; 55 deg form, parallel.
const ISO_228_1 = [
  { size: '1/2', tpi: 14, pitchMm: 1.814, majorMm: 20.955 },
  { size: '3/4', tpi: 14, pitchMm: 1.814, majorMm: 26.441 },
  { size: '1', tpi: 11, pitchMm: 2.309, majorMm: 33.249 },
  { size: '1-1/2', tpi: 11, pitchMm: 2.309, majorMm: 47.803 },
  { size: '2', tpi: 11, pitchMm: 2.309, majorMm: 59.614 },
];

describe('thread table holds the published values', () => {
  it.each(ASME_B1_20_1)('NPT and NPS $size in: $tpi TPI, OD $odIn in', ({ size, tpi, odIn }) => {
    for (const family of ['NPT', 'NPS']) {
      const row = findThreadSpec(`${family}-${size}`);
      expect(row).toBeDefined();
      expect(row!.majorDiameterMm).toBeCloseTo(odIn * IN, 6); // ASME B1.20.1 Table 2: pipe OD [pub]
      expect(row!.threadsPerInch).toBe(tpi); // ASME B1.20.1 Table 2: threads per inch [pub]; NPS same pitch [mem]
      expect(row!.pitchMm).toBeCloseTo(IN / tpi, 9);
      expect(row!.flankAngleDeg).toBe(60); // ASME B1.20.1: 60 deg thread form [pub]
      expect(row!.form).toBe(family === 'NPT' ? 'tapered' : 'parallel');
    }
  });

  it.each(ISO_228_1)('G $size: $tpi TPI, pitch $pitchMm mm, major $majorMm mm', ({ size, tpi, pitchMm, majorMm }) => {
    const row = findThreadSpec(`G-${size}`);
    expect(row).toBeDefined();
    expect(row!.majorDiameterMm).toBe(majorMm); // ISO 228-1: major diameter [pub]
    expect(row!.pitchMm).toBe(pitchMm); // ISO 228-1: pitch [pub]
    expect(row!.threadsPerInch).toBe(tpi); // ISO 228-1: threads per inch [pub]
    expect(row!.flankAngleDeg).toBe(55); // ISO 228-1: 55 deg form [pub]
    expect(row!.form).toBe('parallel'); // ISO 228-1: parallel thread [pub]
  });

  it('has the buttress bungs named diameter x pitch', () => {
    // Plastic-drum buttress bungs written diameter x pitch in mm [pub, no dimension standard found]
    expect(findThreadSpec('BT-56x4')).toMatchObject({ majorDiameterMm: 56, pitchMm: 4, family: 'buttress' });
    expect(findThreadSpec('BT-70x6')).toMatchObject({ majorDiameterMm: 70, pitchMm: 6, family: 'buttress' });
  });

  it('has unique codes', () => {
    const codes = THREAD_TABLE.map((r) => r.code);
    expect(new Set(codes).size).toBe(codes.length);
    expect(codes).toEqual(expect.arrayContaining(['NPT-3/4', 'NPS-2', 'G-2', 'BT-56x4', 'BT-70x6']));
  });
});

describe('every row identifies itself from its published dimensions', () => {
  it.each(ASME_B1_20_1.flatMap((s) => ['NPT', 'NPS'].map((family) => ({ ...s, family }))))('$family $size from ASME B1.20.1 values', ({ size, tpi, odIn, family }) => {
    // ASME B1.20.1 Table 2: OD and threads per inch, 60 deg [pub]; taper tells NPT from NPS
    const result = identifyWithoutIso7({
      majorDiameterMm: odIn * IN,
      threadsPerInch: tpi,
      flankAngleDeg: 60,
      taper: family === 'NPT' ? 'tapered' : 'parallel',
    });
    expect(result.matches[0]?.code).toBe(`${family}-${size}`);
    expect(result.matches).toHaveLength(1);
    expect(result.ambiguous).toBe(false);
  });

  it.each(ISO_228_1)('G $size from ISO 228-1 values', ({ size, tpi, majorMm }) => {
    // ISO 228-1: major diameter, threads per inch, 55 deg [pub]
    const result = identifyWithoutIso7({ majorDiameterMm: majorMm, threadsPerInch: tpi, flankAngleDeg: 55, taper: 'parallel' });
    expect(result.matches.map((m) => m.code)).toEqual([`G-${size}`]);
    expect(result.ambiguous).toBe(false);
    expect(result.matches[0]!.deltaMm).toBeCloseTo(0, 9);
  });

  it.each([
    ['BT-56x4', 56, 4],
    ['BT-70x6', 70, 6],
  ])('%s from diameter and pitch', (code, majorDiameterMm, pitchMm) => {
    // Buttress bung names are diameter x pitch in mm [pub, no dimension standard found]
    const result = identifyWithoutIso7({ majorDiameterMm, pitchMm });
    expect(result.matches.map((m) => m.code)).toEqual([code]);
    expect(result.matches[0]!.pitchDeltaMm).toBeCloseTo(0, 9);
  });

  it('identifies every table row from its own row values', () => {
    for (const row of THREAD_TABLE) {
      const result = identifyThread({
        majorDiameterMm: row.majorDiameterMm,
        pitchMm: row.pitchMm,
        flankAngleDeg: row.flankAngleDeg,
        taper: row.form,
      });
      // Only rows of identical dimensions and form share the answer: G and Rp, R and Rc (ISO 7-1 [mem]).
      const twins = THREAD_TABLE.filter((t) => t.majorDiameterMm === row.majorDiameterMm && t.pitchMm === row.pitchMm && t.flankAngleDeg === row.flankAngleDeg && t.form === row.form);
      expect(result.matches.map((m) => m.code).sort()).toEqual(twins.map((t) => t.code).sort());
      expect(result.ambiguous).toBe(twins.length > 1);
    }
  });
});

describe('neighbours are not confused', () => {
  it('G 3/4 and 3/4 in NPT: same 14 TPI, told apart by the flank angle', () => {
    // ISO 228-1: G 3/4 major 26.441 mm, 14 TPI, 55 deg; ASME B1.20.1: 3/4 in OD 1.050 in, 14 TPI, 60 deg [pub]
    const countOnly = identifyWithoutIso7({ majorDiameterMm: 26.5, threadsPerInch: 14 });
    expect(countOnly.ambiguous).toBe(true);
    expect(countOnly.matches.map((m) => m.code).sort()).toEqual(['G-3/4', 'NPS-3/4', 'NPT-3/4']);
    expect(countOnly.advice).toMatch(/flank angle/);
    expect(countOnly.advice).not.toMatch(/threads per inch/); // all three are 14 TPI, counting cannot help

    expect(identifyWithoutIso7({ majorDiameterMm: 26.5, threadsPerInch: 14, flankAngleDeg: 55 }).matches.map((m) => m.code)).toEqual(['G-3/4']);
    const npt = identifyWithoutIso7({ majorDiameterMm: 26.6, threadsPerInch: 14, flankAngleDeg: 60, taper: 'tapered' });
    expect(npt.matches.map((m) => m.code)).toEqual(['NPT-3/4']);
  });

  it('G 2 and 2 in NPS: close diameters, told apart by 11 vs 11.5 TPI', () => {
    // ISO 228-1: G 2 major 59.614 mm, 11 TPI (pitch 2.309 mm); ASME B1.20.1: 2 in OD 2.375 in (60.325 mm), 11.5 TPI [pub]
    const g = identifyWithoutIso7({ majorDiameterMm: 59.8, threadsPerInch: 11 });
    expect(g.matches.map((m) => m.code)).toEqual(['G-2']);
    expect(g.ambiguous).toBe(false);

    const pitchOnly = identifyWithoutIso7({ majorDiameterMm: 59.8, pitchMm: 2.309 });
    expect(pitchOnly.matches.map((m) => m.code)).toEqual(['G-2']);

    const nps = identifyWithoutIso7({ majorDiameterMm: 60.2, threadsPerInch: 11.5, taper: 'parallel' });
    expect(nps.matches.map((m) => m.code)).toEqual(['NPS-2']);

    const byFlank = identifyWithoutIso7({ majorDiameterMm: 60.0, flankAngleDeg: 55 });
    expect(byFlank.matches.map((m) => m.code)).toEqual(['G-2']);
  });

  it('ranks a diameter-only reading by closeness', () => {
    // ISO 228-1: G 2 59.614 mm; ASME B1.20.1: 2 in OD 60.325 mm [pub]
    const nearG = identifyWithoutIso7({ majorDiameterMm: 59.7 });
    expect(nearG.matches[0]!.code).toBe('G-2');
    expect(nearG.matches[0]!.deltaMm).toBeCloseTo(59.7 - 59.614, 9);
    const nearPipe = identifyWithoutIso7({ majorDiameterMm: 60.3 });
    expect(['NPT-2', 'NPS-2']).toContain(nearPipe.matches[0]!.code);
    expect(nearPipe.matches[2]!.code).toBe('G-2');
  });

  it('keeps a 56 mm buttress apart from 2 in pipe threads', () => {
    const result = identifyWithoutIso7({ majorDiameterMm: 56.1 });
    expect(result.matches.map((m) => m.code)).toEqual(['BT-56x4']);
  });
});

describe('ambiguous readings are reported as ambiguous', () => {
  it('2 in NPS vs NPT: same OD and TPI, only a taper check separates them', () => {
    // ASME B1.20.1: 2 in OD 2.375 in, 11.5 TPI, 60 deg for both [pub]; NPS parallel, NPT tapered 1:16
    const result = identifyWithoutIso7({ majorDiameterMm: 2.375 * IN, threadsPerInch: 11.5, flankAngleDeg: 60 });
    expect(result.ambiguous).toBe(true);
    expect(result.matches.map((m) => m.code).sort()).toEqual(['NPS-2', 'NPT-2']);
    expect(result.advice).toMatch(/taper/);
    expect(result.advice).toMatch(/two points/);
    expect(result.advice).not.toMatch(/flank angle/);
  });

  it('diameter-only 60 mm fits G 2, NPS 2 and NPT 2', () => {
    // ISO 228-1: G 2 59.614 mm; ASME B1.20.1: 2 in 60.325 mm [pub]: 0.7 mm apart, within caliper error on a thread
    const result = identifyWithoutIso7({ majorDiameterMm: 60 });
    expect(result.ambiguous).toBe(true);
    expect(result.matches.map((m) => m.code).sort()).toEqual(['G-2', 'NPS-2', 'NPT-2']);
    expect(result.advice).toMatch(/threads per inch/);
    expect(result.advice).toMatch(/flank angle/);
    expect(result.advice).toMatch(/taper/);
  });
});

describe('tolerances and advice', () => {
  it('uses max(0.6 mm, 2 %) on diameter', () => {
    // G 2 tolerance is 2 % of 59.614 = 1.192 mm; 2 in pipe tolerance 2 % of 60.325 = 1.2065 mm
    const codes = identifyWithoutIso7({ majorDiameterMm: 58.5 }).matches.map((m) => m.code);
    expect(codes).toEqual(['G-2']);
    expect(identifyWithoutIso7({ majorDiameterMm: 58.3 }).matches).toEqual([]);
    // G 1/2 at 20.955 mm: 2 % is 0.419 mm, so the 0.6 mm floor applies
    expect(identifyWithoutIso7({ majorDiameterMm: 20.955 - 0.55, threadsPerInch: 14, flankAngleDeg: 55 }).matches.map((m) => m.code)).toEqual(['G-1/2']);
    expect(identifyWithoutIso7({ majorDiameterMm: 20.955 - 0.65, threadsPerInch: 14, flankAngleDeg: 55 }).matches).toEqual([]);
  });

  it('honours a caller tolerance', () => {
    expect(identifyThread({ majorDiameterMm: 60 }, THREAD_TABLE, { diameterToleranceMm: 0.1, diameterTolerancePct: 0 }).matches).toEqual([]);
  });

  it('advises re-measuring when nothing fits', () => {
    const result = identifyWithoutIso7({ majorDiameterMm: 40, threadsPerInch: 8 });
    expect(result.matches).toEqual([]);
    expect(result.ambiguous).toBe(false);
    expect(result.advice).toMatch(/caliper/);
    expect(result.advice).toMatch(/added to the table/);
  });

  it('suggests confirming a single diameter-only match', () => {
    const result = identifyWithoutIso7({ majorDiameterMm: 70.2 });
    expect(result.matches.map((m) => m.code)).toEqual(['BT-70x6']);
    expect(result.advice).toMatch(/threads per inch/);
  });

  it('flags a pitch and a count that disagree', () => {
    const result = identifyWithoutIso7({ majorDiameterMm: 59.6, pitchMm: 2.309, threadsPerInch: 14 });
    expect(result.matches.map((m) => m.code)).toEqual(['G-2']);
    expect(result.advice).toMatch(/disagree/);
  });

  it('rejects impossible readings', () => {
    expect(() => identifyWithoutIso7({ majorDiameterMm: 0 })).toThrow(RangeError);
    expect(() => identifyWithoutIso7({ majorDiameterMm: 60, threadsPerInch: -11 })).toThrow(RangeError);
    expect(() => identifyWithoutIso7({ majorDiameterMm: Number.NaN })).toThrow(RangeError);
  });
});

describe('threadSpecEquals: match on spec code, never nominal size', () => {
  it('does not match G 2 with 2 in NPS', () => {
    // ISO 228-1 G 2 (11 TPI, 55 deg) vs 2 in NPS (11.5 TPI, 60 deg) [pub]: same nominal size, different threads
    expect(threadSpecEquals('G-2', 'NPS-2')).toBe(false);
    expect(threadSpecEquals('NPS-2', 'NPT-2')).toBe(false);
  });

  it('matches the same code in any carrier and never an unknown', () => {
    expect(threadSpecEquals('G-3/4', 'G-3/4')).toBe(true);
    expect(threadSpecEquals({ code: 'G-2' }, { threadCode: 'G-2' })).toBe(true);
    expect(threadSpecEquals(null, null)).toBe(false);
    expect(threadSpecEquals('', '')).toBe(false);
    expect(threadSpecEquals({ threadCode: null }, 'G-2')).toBe(false);
  });
});

describe('ISO 7-1 taper threads R, Rc and Rp', () => {
  it.each(ISO_228_1)('R, Rc and Rp $size carry the ISO 228-1 diameter and pitch, 55 deg', ({ size, tpi, pitchMm, majorMm }) => {
    // ISO 7-1 [mem, ../shared/REFERENCES.md "Threads, more"]: same gauge diameter and pitch as G; taper 1:16 for R and Rc, Rp parallel
    for (const [family, form] of [
      ['R', 'tapered'],
      ['Rc', 'tapered'],
      ['Rp', 'parallel'],
    ] as const) {
      expect(findThreadSpec(`${family}-${size}`)).toMatchObject({ family, form, majorDiameterMm: majorMm, pitchMm, threadsPerInch: tpi, flankAngleDeg: 55 });
    }
  });

  it('tells R 3/4 from G 3/4 by taper and from 3/4 in NPT by the flank angle', () => {
    // ISO 7-1 / ISO 228-1: 26.441 mm, 14 TPI, 55 deg [mem/pub]; ASME B1.20.1: 3/4 in NPT 1.050 in, 14 TPI, 60 deg, taper 1:16 [pub]
    const tapered55 = identifyThread({ majorDiameterMm: 26.45, threadsPerInch: 14, flankAngleDeg: 55, taper: 'tapered' });
    expect(tapered55.matches.map((m) => m.code).sort()).toEqual(['R-3/4', 'Rc-3/4']);
    const tapered60 = identifyThread({ majorDiameterMm: 26.6, threadsPerInch: 14, flankAngleDeg: 60, taper: 'tapered' });
    expect(tapered60.matches.map((m) => m.code)).toEqual(['NPT-3/4']);
    const taperOnly = identifyThread({ majorDiameterMm: 26.5, threadsPerInch: 14, taper: 'tapered' });
    expect(taperOnly.matches.map((m) => m.code).sort()).toEqual(['NPT-3/4', 'R-3/4', 'Rc-3/4']);
    expect(taperOnly.advice).toMatch(/55 degrees for R 3\/4 or Rc 3\/4, 60 degrees for 3\/4 in NPT/);
  });

  it('tells R 1 from 1 in NPT by the count as well: 11 against 11.5 per inch', () => {
    // ISO 7-1: R 1, 33.249 mm, 11 TPI [mem]; ASME B1.20.1: 1 in NPT, 1.315 in (33.401 mm), 11.5 TPI [pub]
    const r = identifyThread({ majorDiameterMm: 33.3, threadsPerInch: 11, taper: 'tapered' });
    expect(r.matches.map((m) => m.code).sort()).toEqual(['R-1', 'Rc-1']);
    const npt = identifyThread({ majorDiameterMm: 33.3, threadsPerInch: 11.5, taper: 'tapered' });
    expect(npt.matches.map((m) => m.code)).toEqual(['NPT-1']);
    const untested = identifyThread({ majorDiameterMm: 33.3, flankAngleDeg: 55 });
    expect(untested.advice).toMatch(/taper .*R 1 or Rc 1.* changes by about 1\.6 mm/);
  });

  it('a drum opening (an internal thread) is never taken for R, which ISO 7-1 cuts outside only; a plug never for Rc or Rp', () => {
    // ISO 7-1 clause 1 [mem]: R external taper, Rc internal taper, Rp internal parallel
    const reading = { majorDiameterMm: 59.6, threadsPerInch: 11, flankAngleDeg: 55 };
    expect(
      identifyThread(reading)
        .matches.map((m) => m.code)
        .sort(),
    ).toEqual(['G-2', 'R-2', 'Rc-2', 'Rp-2']);
    expect(
      identifyThread({ ...reading, side: 'internal' })
        .matches.map((m) => m.code)
        .sort(),
    ).toEqual(['G-2', 'Rc-2', 'Rp-2']);
    expect(
      identifyThread({ ...reading, side: 'external' })
        .matches.map((m) => m.code)
        .sort(),
    ).toEqual(['G-2', 'R-2']);
    expect(identifyThread({ ...reading, side: 'internal', taper: 'tapered' }).matches.map((m) => m.code)).toEqual(['Rc-2']);
  });

  it('never matches R and G on the same code', () => {
    // ISO 7-1 vs ISO 228-1: a tapered R does not seal in a parallel G [mem]
    expect(threadSpecEquals('R-2', 'G-2')).toBe(false);
    expect(threadSpecEquals('R-2', 'R-2')).toBe(true);
  });
});

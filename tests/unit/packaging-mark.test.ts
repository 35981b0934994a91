import { readPackagingMark, type PackagingMark } from '../../shared/packaging-mark';

const TODAY = new Date('2026-12-03T00:00:00Z');

function mark(raw: string): PackagingMark {
  const r = readPackagingMark(raw, TODAY);
  if (!r.ok) throw new Error(`expected ${raw} to read: ${r.error}`);
  if (!r.mark) throw new Error(`expected ${raw} to carry a mark`);
  return r.mark;
}

describe('readPackagingMark', () => {
  it('reads a steel drum for liquids', () => {
    // UN Model Regulations 6.1.3.7 example [mem]: 1A1/Y1.4/150/98/NL/VL824, new steel drum for liquids
    const m = mark('UN 1A1/Y1.4/150/98/NL/VL824');
    expect(m).toMatchObject({ packingGroups: ['II', 'III'], contents: 'liquids', relativeDensity: 1.4, testPressureKpa: 150, grossMassKg: null, yearMade: 1998, state: 'NL', maker: 'VL824' });
    // NIST SP 811: 1 psi = 6.894757 kPa, so 150 kPa = 21.76 psi
    expect(m.testPressurePsi).toBeCloseTo(21.756, 2);
    expect(m.parts.map((p) => p.part)).toEqual(['code', 'performance', 'contents', 'year', 'state', 'maker']);
    expect(m.parts[4]!.meaning).toMatch(/Netherlands/);
  });

  it('reads a steel drum for solids', () => {
    // UN Model Regulations 6.1.3.7 example [mem]: 1A2/Y150/S/01/NL/VL825, steel drum for solids or inner packagings
    const m = mark('1A2/Y150/S/01/NL/VL825');
    expect(m).toMatchObject({ contents: 'solids', grossMassKg: 150, relativeDensity: null, testPressureKpa: null, yearMade: 2001 });
    // NIST SP 811: 1 lb = 0.45359237 kg exactly
    expect(m.grossMassLb).toBeCloseTo(330.69, 2);
  });

  it('reads a fibreboard box and the 49 CFR spacing between year and state', () => {
    // UN Model Regulations 6.1.3.7 example [mem]: 4G/Y145/S/02/NL/VL823; 49 CFR 178.503(e) writes "83 NL" [mem]
    expect(mark('4G/Y145/S/02/NL/VL823')).toMatchObject({ grossMassKg: 145, yearMade: 2002 });
    expect(mark('1A1/Y1.4/150/83 NL/VL824')).toMatchObject({ yearMade: 1983, state: 'NL', maker: 'VL824' });
  });

  it('takes a liquid mark without density as up to 1.2, and X as all three packing groups', () => {
    // UN Model Regulations 6.1.3.1 (c): density may be left out up to 1.2; X = packing groups I, II, III [mem]
    const m = mark('1H1/X/250/24/D/ACME 123');
    expect(m).toMatchObject({ packingGroups: ['I', 'II', 'III'], relativeDensity: null, maker: 'ACME 123', yearMade: 2024 });
    expect(m.parts[1]!.meaning).toMatch(/up to 1\.2/);
    // 4.1.1.15 [mem]: plastic drums five years from manufacture
    expect(m.notes.join(' ')).toMatch(/until about 2029/);
  });

  it('keeps further marks apart', () => {
    const m = mark('1A1/Y1.4/150/20/NL/VL824/NL/RB/24 RL');
    expect(m.maker).toBe('VL824');
    expect(m.parts.at(-1)).toMatchObject({ part: 'further', mark: 'NL/RB/24 RL' });
  });

  it('answers a code alone with no mark', () => {
    expect(readPackagingMark('1A1', TODAY)).toMatchObject({ ok: true, mark: null });
  });

  it.each([
    ['3N1/Y1.4/150/24/NL/X', /no metal other than steel or aluminium jerrican/],
    ['1A1/W1.4/150/24/NL/X', /packing-group letter X, Y or Z/], // 6.1.3.1 (c) [mem]
    ['1A1/Y14/150/24/NL/X', /relative density with one decimal/], // 6.1.3.1 (c)(ii) [mem]
    ['1A1/Y/S/24/NL/X', /maximum gross mass in kg/], // 6.1.3.1 (c)(ii) [mem]
    ['1A1/Y1.4/155/24/NL/X', /nearest 10 kPa/], // 6.1.3.1 (d) [mem]
    ['1A1/Y1.4/P/24/NL/X', /test pressure in kPa .* or S/],
    ['4G/Y1.4/150/24/NL/X', /box is marked S/],
    ['1A1/Y1.4/150', /stops after the test pressure/],
    ['1A1/Y1.4/150/2024/NL/X', /last two digits/], // 6.1.3.1 (e) [mem]
    ['1A1/Y1.4/150/24', /stops after the year/],
    ['1A1/Y1.4/150/24/N1/X', /distinguishing sign/], // 6.1.3.1 (f) [mem]
    ['1A1/Y1.4/150/24/NL', /stops after the state/], // 6.1.3.1 (g) [mem]
  ])('refuses %s naming the part', (raw, reason) => {
    const r = readPackagingMark(raw, TODAY);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error).toMatch(reason);
  });
});

import { unit } from 'mathjs';

import {
  convertFlow,
  flowToM3s,
  formatLength,
  formatQuantity,
  quantityUnit,
  fromLitres,
  fromM3s,
  fromMm,
  isFlowUnit,
  isLengthUnit,
  L_PER_US_GAL,
  MM_PER_IN,
  toLitres,
  toMm,
  UnknownUnitError,
  type FlowUnit,
  type LengthUnit,
} from '../../shared/units';

// mathjs names for our flow units, so each conversion is checked against an independent library.
const MATHJS_FLOW: Record<FlowUnit, string> = { 'L/min': 'L/minute', 'gal/min': 'gallon/minute', 'm3/h': 'm^3/hour' };

describe('exact definitions', () => {
  it('uses the exact inch and US gallon', () => {
    expect(toMm(1, 'in')).toBe(25.4); // NIST SP 811 Appendix B: 1 in = 25.4 mm exactly [pub]
    expect(toLitres(1, 'gal')).toBe(3.785411784); // NIST SP 811 Appendix B; 16 CFR 500.19: 1 US gal = 3.785411784 L exactly [pub]
    // 1 US gal = 231 in^3 [pub, NIST SP 811]: derive the litre figure from the inch, independently of L_PER_US_GAL.
    expect(231 * (MM_PER_IN / 100) ** 3).toBeCloseTo(L_PER_US_GAL, 12);
  });
});

describe('length against mathjs', () => {
  it.each([0, 1, 19.05, 60.325, 851, 1234.5678])('%p mm to inches and back', (mm) => {
    expect(fromMm(mm, 'in')).toBeCloseTo(unit(mm, 'mm').toNumber('inch'), 12);
    expect(toMm(fromMm(mm, 'in'), 'in')).toBeCloseTo(mm, 10);
    expect(fromMm(mm, 'mm')).toBe(mm);
  });

  it('converts the published 2 in pipe OD', () => {
    // ASME B1.20.1: 2 in pipe OD 2.375 in [pub]
    expect(toMm(2.375, 'in')).toBeCloseTo(unit(2.375, 'inch').toNumber('mm'), 10);
    expect(toMm(2.375, 'in')).toBeCloseTo(60.325, 10);
  });
});

describe('volume against mathjs', () => {
  it.each([1, 55, 208.2])('%p US gal to litres and back', (gal) => {
    expect(toLitres(gal, 'gal')).toBeCloseTo(unit(gal, 'gallon').toNumber('L'), 10);
    expect(fromLitres(toLitres(gal, 'gal'), 'gal')).toBeCloseTo(gal, 10);
  });
});

describe('flow against mathjs', () => {
  const units: FlowUnit[] = ['L/min', 'gal/min', 'm3/h'];
  it.each(units)('1 and 37.5 %s to m3/s and back', (u) => {
    for (const value of [1, 37.5]) {
      expect(flowToM3s(value, u)).toBeCloseTo(unit(value, MATHJS_FLOW[u]).toNumber('m^3/s'), 14);
      expect(fromM3s(flowToM3s(value, u), u)).toBeCloseTo(value, 10);
    }
  });

  it.each(units.flatMap((from) => units.map((to) => [from, to] as const)))('%s to %s', (from, to) => {
    expect(convertFlow(12.5, from, to)).toBeCloseTo(unit(12.5, MATHJS_FLOW[from]).toNumber(MATHJS_FLOW[to]), 9);
  });
});

describe('guards and errors', () => {
  it('recognises units', () => {
    expect(isLengthUnit('mm')).toBe(true);
    expect(isLengthUnit('in')).toBe(true);
    expect(isLengthUnit('cm')).toBe(false);
    expect(isLengthUnit(25.4)).toBe(false);
    expect(isFlowUnit('gal/min')).toBe(true);
    expect(isFlowUnit('gpm')).toBe(false);
  });

  it('throws an UnknownUnitError naming the unit', () => {
    expect(() => toMm(1, 'ft' as LengthUnit)).toThrow(UnknownUnitError);
    expect(() => toMm(1, 'ft' as LengthUnit)).toThrow(/"ft"/);
    expect(() => flowToM3s(1, 'gpm' as FlowUnit)).toThrow(/Unknown unit "gpm": expected one of L\/min, gal\/min, m3\/h/);
    try {
      fromM3s(1, 'cfm' as FlowUnit);
      throw new Error('expected a throw');
    } catch (e) {
      expect(e).toBeInstanceOf(UnknownUnitError);
      expect((e as UnknownUnitError).unit).toBe('cfm');
    }
  });
});

describe('formatLength', () => {
  it('formats in the chosen unit with sensible default digits', () => {
    expect(formatLength(60.325, 'in')).toBe('2.375 in');
    expect(formatLength(60.325, 'mm')).toBe('60.3 mm');
    expect(formatLength(19.05, 'in', 2)).toBe('0.75 in');
  });
});

describe('formatQuantity against mathjs', () => {
  it('shows SI for a person in mm and US customary for one in inches, each figure checked by mathjs', () => {
    const us = (text: string) => Number(text.split(' ')[0]);
    expect(formatQuantity(200, 'pressureKpa', 'mm')).toBe('200.0 kPa');
    expect(us(formatQuantity(200, 'pressureKpa', 'in'))).toBeCloseTo(unit(200, 'kPa').toNumber('psi'), 2);
    expect(us(formatQuantity(1.5, 'velocityMs', 'in'))).toBeCloseTo(unit(1.5, 'm/s').toNumber('ft/s'), 2);
    expect(us(formatQuantity(1180, 'densityKgM3', 'in'))).toBeCloseTo(unit(1180, 'kg/m^3').toNumber('lbm/ft^3'), 1);
    expect(us(formatQuantity(208.2, 'volumeL', 'in'))).toBeCloseTo(unit(208.2, 'L').toNumber('gallon'), 2);
    expect(us(formatQuantity(20, 'flowLpm', 'in'))).toBeCloseTo(unit(20, 'L/minute').toNumber('gallon/minute'), 2);
    expect([quantityUnit('densityKgM3', 'mm'), quantityUnit('densityKgM3', 'in'), quantityUnit('pressureKpa', 'in')]).toEqual(['kg/m³', 'lb/ft³', 'psi']);
  });
});

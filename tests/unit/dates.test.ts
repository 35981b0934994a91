import { isCalendarDate, isDateOrTimestamp, parseCalendarDate } from '../../shared/dates';

describe('calendar dates (shared/dates.ts)', () => {
  it('takes dates that exist, leap days by the Gregorian rule', () => {
    expect(parseCalendarDate('2026-05-14')).toEqual({ year: 2026, month: 5, day: 14 });
    expect(isCalendarDate('2024-02-29')).toBe(true);
    expect(isCalendarDate('2000-02-29')).toBe(true); // divisible by 400
    expect(isCalendarDate('2026-12-31')).toBe(true);
  });

  it('refuses dates that do not exist or that the database cannot hold', () => {
    for (const text of [
      '2024-02-30',
      '2023-02-29',
      '1900-02-29',
      '2026-04-31',
      '2026-13-01',
      '2026-00-10',
      '2026-01-00',
      '0000-01-01',
      '1899-12-31',
      '2026-5-14',
      '2026-05-14 ',
      '+02026-05-14',
      '',
      'today',
    ]) {
      expect([text, isCalendarDate(text)]).toEqual([text, false]);
    }
    expect(isCalendarDate(20260514)).toBe(false);
    expect(isCalendarDate(null)).toBe(false);
  });

  it('takes a date and time in ISO 8601 and refuses impossible times', () => {
    for (const text of ['2026-05-14', '2026-05-14T08:30', '2026-05-14T08:30:59Z', '2026-05-14T08:30:00.123+02:00', '2026-05-14 23:59']) expect([text, isDateOrTimestamp(text)]).toEqual([text, true]);
    for (const text of ['2026-05-14T24:00', '2026-05-14T08:60', '2026-02-30T08:00', '2026-05-14T08:30+15:00', '0000-01-01T00:00Z', '2026-05-14T8:30'])
      expect([text, isDateOrTimestamp(text)]).toEqual([text, false]);
  });
});

// Dates as people type them and as the API takes them: YYYY-MM-DD, checked against the calendar (no
// 30 February), in years the database and the site can both mean. Date.parse is not a check: it rolls
// 2024-02-30 over to 1 March and takes year 0, which PostgreSQL refuses.

export const MIN_YEAR = 1900;
export const MAX_YEAR = 9999;

const DATE_RE = /^(\d{4})-(\d{2})-(\d{2})$/;
const TIMESTAMP_RE = /^(\d{4}-\d{2}-\d{2})[T ](\d{2}):(\d{2})(?::(\d{2})(?:\.\d{1,6})?)?(Z|[+-](\d{2}):?(\d{2}))?$/;

export interface CalendarDate {
  year: number;
  month: number;
  day: number;
}

function daysIn(year: number, month: number): number {
  const leap = (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
  return [31, leap ? 29 : 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31][month - 1]!;
}

/** The date written YYYY-MM-DD, or null when it is not one that exists (2024-02-30, 2024-13-01, 0000-01-01). */
export function parseCalendarDate(text: unknown): CalendarDate | null {
  if (typeof text !== 'string') return null;
  const m = DATE_RE.exec(text);
  if (!m) return null;
  const [year, month, day] = [Number(m[1]), Number(m[2]), Number(m[3])];
  if (year < MIN_YEAR || year > MAX_YEAR || month < 1 || month > 12 || day < 1 || day > daysIn(year, month)) return null;
  return { year, month, day };
}

export function isCalendarDate(text: unknown): text is string {
  return parseCalendarDate(text) !== null;
}

/** A date, or a date and time (ISO 8601, optionally with seconds and an offset), that exists. */
export function isDateOrTimestamp(text: unknown): text is string {
  if (isCalendarDate(text)) return true;
  if (typeof text !== 'string') return false;
  const m = TIMESTAMP_RE.exec(text);
  if (!m || !isCalendarDate(m[1])) return false;
  const [hour, minute, second] = [Number(m[2]), Number(m[3]), Number(m[4] ?? 0)];
  const offsetOk = !m[5] || m[5] === 'Z' || (Number(m[6]) <= 14 && Number(m[7]) <= 59);
  return hour <= 23 && minute <= 59 && second <= 59 && offsetOk;
}

/** The words a form and the API both use when a date is not one. */
export const DATE_MESSAGE = 'must be a real date, YYYY-MM-DD';

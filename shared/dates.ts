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

/** Days in a month (1 to 12) of a year, leap years counted. */
export function daysIn(year: number, month: number): number {
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

// Day arithmetic for the dock's lot rules. "Today" is the site's local date (the site's time zone in
// site_settings), passed in by the caller, never read here.

export type IsoDate = string;

const DAY_MS = 86_400_000;
const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/** Days since 1970-01-01 for a valid calendar date; null for anything else (2026-02-30, '2026-2-3'). */
export function dayNumber(date: string): number | null {
  const d = parseCalendarDate(date);
  return d ? Date.UTC(d.year, d.month - 1, d.day) / DAY_MS : null;
}

export const isIsoDate = (v: unknown): v is IsoDate => typeof v === 'string' && dayNumber(v) !== null;

export function fromDayNumber(n: number): IsoDate {
  return new Date(n * DAY_MS).toISOString().slice(0, 10);
}

export function addDays(date: IsoDate, days: number): IsoDate {
  const n = dayNumber(date);
  if (n === null) throw new RangeError(`not a calendar date: ${date}`);
  return fromDayNumber(n + days);
}

/** Whole days from `from` to `to` (negative when `to` is earlier). */
export function daysBetween(from: IsoDate, to: IsoDate): number {
  const a = dayNumber(from);
  const b = dayNumber(to);
  if (a === null || b === null) throw new RangeError(`not a calendar date: ${a === null ? from : to}`);
  return b - a;
}

/** "12 Nov 2026", the same on every device (no locale tables involved). */
export function formatDay(date: IsoDate): string {
  const d = parseCalendarDate(date);
  return d ? `${d.day} ${MONTHS[d.month - 1]} ${d.year}` : date;
}

/** The calendar date at `now` in an IANA time zone ('Europe/Berlin', 'UTC'): the site's "today". */
export function localDate(now: Date, timeZone: string): IsoDate {
  const parts = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).formatToParts(now);
  const get = (type: string) => parts.find((p) => p.type === type)?.value ?? '';
  return `${get('year')}-${get('month')}-${get('day')}`;
}

/** Whether the runtime knows this IANA time zone name. */
export function isTimeZone(name: unknown): name is string {
  if (typeof name !== 'string' || !name.trim()) return false;
  try {
    new Intl.DateTimeFormat('en-CA', { timeZone: name });
    return true;
  } catch {
    return false;
  }
}

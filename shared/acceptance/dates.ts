// Calendar dates as the dock reads them from a drum label: 'YYYY-MM-DD', no time, no zone. "Today" is the
// site's local date (the site's time zone in site_settings), passed in by the caller, never read here.

export type IsoDate = string;

const ISO = /^(\d{4})-(\d{2})-(\d{2})$/;
const DAY_MS = 86_400_000;
const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/** Days since 1970-01-01 for a valid calendar date; null for anything else (2026-02-30, '2026-2-3'). */
export function dayNumber(date: string): number | null {
  const m = ISO.exec(date);
  if (!m) return null;
  const [y, mo, d] = [Number(m[1]), Number(m[2]), Number(m[3])];
  const t = Date.UTC(y, mo - 1, d);
  const back = new Date(t);
  if (back.getUTCFullYear() !== y || back.getUTCMonth() !== mo - 1 || back.getUTCDate() !== d) return null;
  return t / DAY_MS;
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
  const m = ISO.exec(date);
  if (!m) return date;
  return `${Number(m[3])} ${MONTHS[Number(m[2]) - 1]} ${m[1]}`;
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

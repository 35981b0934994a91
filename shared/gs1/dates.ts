// GS1 dates YYMMDD, as in AI (11) production date and (17) expiration date
// (GS1 General Specifications §3.4 and §7.12) [mem: confirm against the current edition].

import { daysIn } from '../dates';

export type Gs1DateResult = { ok: true; iso: string } | { ok: false; error: string };

/**
 * The full year of a two-digit GS1 year (§7.12): when YY minus this year's two digits is 51 to 99 it is
 * the previous century; −99 to −50, the next; otherwise this one. `today` is read in UTC.
 */
export function gs1Year(yy: number, today: Date): number {
  const year = today.getUTCFullYear();
  const current = year % 100;
  const century = year - current;
  const gap = yy - current;
  if (gap >= 51) return century - 100 + yy;
  if (gap <= -50) return century + 100 + yy;
  return century + yy;
}

/**
 * Reads YYMMDD into an ISO date (YYYY-MM-DD). Day 00 means the last day of the month (§3.4.7: a date
 * with only year and month fills DD with zeroes). A day the month does not have is refused, not rolled over.
 */
export function parseGs1Date(yymmdd: string, today: Date): Gs1DateResult {
  if (!/^\d{6}$/.test(yymmdd)) return { ok: false, error: `“${yymmdd}” is not six digits (YYMMDD)` };
  const yy = Number(yymmdd.slice(0, 2));
  const month = Number(yymmdd.slice(2, 4));
  const day = Number(yymmdd.slice(4, 6));
  if (month < 1 || month > 12) return { ok: false, error: `${yymmdd} has month ${yymmdd.slice(2, 4)}, and a month is 01 to 12` };
  const year = gs1Year(yy, today);
  const last = daysIn(year, month);
  if (day > last) return { ok: false, error: `${yymmdd} has day ${day}, and that month has ${last} days` };
  const dd = day === 0 ? last : day;
  return { ok: true, iso: `${String(year).padStart(4, '0')}-${String(month).padStart(2, '0')}-${String(dd).padStart(2, '0')}` };
}

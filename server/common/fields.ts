import { Transform } from 'class-transformer';
import { IsInt, IsOptional, Max, Min, ValidateBy, ValidateIf } from 'class-validator';
import { DATE_MESSAGE, isCalendarDate, isDateOrTimestamp } from '../../shared/dates';

// Field rules that several DTOs share, so each limit and each word lives once.

/** A record id as PostgreSQL's uuid type reads it; anything else is refused before a query is built. */
export const UUID_RE = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * A field that may be left out, but is not null when given. class-validator's IsOptional also lets null
 * through, which then reached NOT NULL columns as a 500 (PATCH /api/settings {"tipClearanceMinMm": null});
 * IsOptional is for the fields where null means "clear it".
 */
export const Optional = () => ValidateIf((_object, value) => value !== undefined);

/** Pages beyond this hold nothing in any registry of ours; the bound keeps OFFSET inside PostgreSQL's bigint. */
export const MAX_PAGE = 100_000;
export const MAX_PAGE_SIZE = 200;

/**
 * A whole number from the query string, in plain digits only: Number() would read "1e20", "0x10",
 * " 7 " and "" as numbers too, and 1e20 passes as an integer in JavaScript but not as a bigint.
 */
const Digits = Transform(({ value }) => (typeof value === 'string' && /^\d{1,15}$/.test(value) ? Number(value) : value));

function wholeNumber(max: number) {
  return (target: object, key: string) => {
    IsOptional()(target, key);
    Digits(target, key);
    IsInt({ message: 'must be a whole number, written in digits' })(target, key);
    Min(1, { message: 'must be 1 or more' })(target, key);
    Max(max, { message: `must be at most ${max}` })(target, key);
  };
}

/** ?page= of a list: optional, 1 to MAX_PAGE. */
export const PageParam = wholeNumber(MAX_PAGE);
/** ?pageSize= of a list: optional, 1 to MAX_PAGE_SIZE. */
export const PageSizeParam = wholeNumber(MAX_PAGE_SIZE);

/** A date written YYYY-MM-DD that exists on the calendar (shared/dates.ts). */
export const IsCalendarDate = () => ValidateBy({ name: 'isCalendarDate', validator: { validate: (v) => isCalendarDate(v), defaultMessage: () => DATE_MESSAGE } });

/** A date, or a date and time in ISO 8601, that exists. */
export const IsDateOrTimestamp = () =>
  ValidateBy({
    name: 'isDateOrTimestamp',
    validator: { validate: (v) => isDateOrTimestamp(v), defaultMessage: () => 'must be a real date (YYYY-MM-DD) or date and time (YYYY-MM-DDTHH:MM, with an optional offset)' },
  });

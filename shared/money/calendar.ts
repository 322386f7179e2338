// One module per function: Metro does not tree-shake, and the app reaches this file through the
// VAT rules, so importing from the packages' roots would bundle every date-fns function.
import { tz } from '@date-fns/tz/tz';
import { type UTCDate } from '@date-fns/utc/date';
import { utc } from '@date-fns/utc/utc';
import { addDays as addCalendarDays } from 'date-fns/addDays';
import { addMonths as addCalendarMonths } from 'date-fns/addMonths';
import { differenceInCalendarDays } from 'date-fns/differenceInCalendarDays';
import { differenceInCalendarMonths } from 'date-fns/differenceInCalendarMonths';
import { formatISO } from 'date-fns/formatISO';
import { getDate } from 'date-fns/getDate';
import { getMonth } from 'date-fns/getMonth';
import { getYear } from 'date-fns/getYear';
import { isValid } from 'date-fns/isValid';
import { lastDayOfMonth } from 'date-fns/lastDayOfMonth';
import { parseISO } from 'date-fns/parseISO';

import { MoneyRuleError } from './errors';

/** A calendar date in the studio's time zone, written 'YYYY-MM-DD' (ISO 8601). */
export type IsoDate = string;

/** A month written 'YYYY-MM'. */
export type IsoMonth = string;

// parseISO also reads '20260203', '2026-02', week and ordinal dates and date-times: the product
// takes dates only as written 'YYYY-MM-DD' (and months as 'YYYY-MM'), so the shape is checked first.
const ISO_DATE_SHAPE = /^\d{4}-\d{2}-\d{2}$/;
const ISO_MONTH_SHAPE = /^\d{4}-\d{2}$/;

/**
 * The text read by date-fns as midnight UTC, or null unless it has the shape and is a real date
 * (parseISO refuses 2026-02-30). UTC has no daylight saving and no skipped days, so arithmetic on
 * it gives the same answer whatever the process's time zone; a `TZDate` in 'UTC' goes through the
 * system's local time and loses a day where the system zone skipped one (Pacific/Apia, 2011-12-30).
 */
function readUtc(text: string, shape: RegExp): UTCDate | null {
  if (typeof text !== 'string' || !shape.test(text)) return null;
  const date = parseISO(text, { in: utc });
  return isValid(date) ? date : null;
}

/** The date as a UTC date for date-fns; refuses anything that is not a real 'YYYY-MM-DD' date. */
function toUtcDate(date: IsoDate): UTCDate {
  const utcDate = readUtc(date, ISO_DATE_SHAPE);
  if (utcDate === null) {
    throw new MoneyRuleError(
      'invalid-date',
      `“${String(date)}” is not a date written as YYYY-MM-DD.`,
    );
  }
  return utcDate;
}

/** The calendar date of a UTC date, written 'YYYY-MM-DD'. */
function fromUtcDate(date: UTCDate): IsoDate {
  return formatISO(date, { representation: 'date' });
}

/** Refuses anything that is not a real date written 'YYYY-MM-DD', such as 2026-02-30. */
export function assertIsoDate(date: IsoDate): void {
  toUtcDate(date);
}

/** Year, month (1–12) and day of an ISO date; refuses anything that is not a real date. */
export function parseIsoDate(date: IsoDate): { year: number; month: number; day: number } {
  const utcDate = toUtcDate(date);
  return { year: getYear(utcDate), month: getMonth(utcDate) + 1, day: getDate(utcDate) };
}

/** The date a number of days later (earlier when negative): due dates count calendar days. */
export function addDays(date: IsoDate, days: number): IsoDate {
  return fromUtcDate(addCalendarDays(toUtcDate(date), days));
}

/** Whole days from `from` to `to` (negative when `to` is earlier). */
export function daysBetween(from: IsoDate, to: IsoDate): number {
  return differenceInCalendarDays(toUtcDate(to), toUtcDate(from));
}

/** The same day n months on, kept within the month (31 Jan + 1 month is 28 or 29 Feb). */
export function addMonths(date: IsoDate, months: number): IsoDate {
  return fromUtcDate(addCalendarMonths(toUtcDate(date), months));
}

/** The last day of the date's month: payment terms counted from the month end start there. */
export function endOfMonth(date: IsoDate): IsoDate {
  return fromUtcDate(lastDayOfMonth(toUtcDate(date)));
}

/** January of year 0: month indexes count from it, so an index is year × 12 + month − 1. */
const MONTH_ZERO = parseISO('0000-01-01', { in: utc });

/**
 * The month index of an ISO month; refuses an invalid one. Indexes let the VAT threshold monitor
 * key turnover by month and step through a rolling 12 months with plain integers.
 */
export function monthIndex(month: IsoMonth): number {
  const first = ISO_MONTH_SHAPE.test(month) ? readUtc(`${month}-01`, ISO_DATE_SHAPE) : null;
  if (first === null) {
    throw new MoneyRuleError('invalid-date', `“${month}” is not a month written as YYYY-MM.`);
  }
  return differenceInCalendarMonths(first, MONTH_ZERO);
}

/** The last day of the month with this index. */
export function monthEndOfIndex(index: number): IsoDate {
  return fromUtcDate(lastDayOfMonth(addCalendarMonths(MONTH_ZERO, index)));
}

/**
 * Today's date (or an instant's) in a time zone such as the studio's Europe/London, so month ends
 * and due dates are the studio's, not the server's. `tz` reads the zone's offset at that instant,
 * summer time included. (@date-fns/tz 1.5 flips the sign of offsets between −01:00 and 00:00,
 * date-fns/date-fns#4279; no zone has used one since Liberia's in 1972.)
 */
export function isoDateInTimeZone(instant: Date, timeZone: string): IsoDate {
  return formatISO(instant, { representation: 'date', in: tz(timeZone) });
}

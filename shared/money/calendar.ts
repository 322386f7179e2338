import { MoneyRuleError } from './errors';

/** A calendar date in the studio's time zone, written 'YYYY-MM-DD' (ISO 8601). */
export type IsoDate = string;

const ISO_MONTH = /^(\d{4})-(\d{2})$/;

export function isLeapYear(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

export function daysInMonth(year: number, month: number): number {
  if (month === 2) return isLeapYear(year) ? 29 : 28;
  return month === 4 || month === 6 || month === 9 || month === 11 ? 30 : 31;
}

/** Year, month (1–12) and day of an ISO date; refuses anything that is not a real date. */
export function parseIsoDate(date: IsoDate): { year: number; month: number; day: number } {
  assertIsoDate(date);
  return { year: digitsAt(date, 0, 4), month: digitsAt(date, 5, 2), day: digitsAt(date, 8, 2) };
}

/**
 * Refuses anything that is not a real date written 'YYYY-MM-DD'. Read character by character,
 * without a regular expression, as statements check every line's date.
 */
export function assertIsoDate(date: IsoDate): void {
  if (
    typeof date !== 'string' ||
    date.length !== 10 ||
    date.charCodeAt(4) !== DASH ||
    date.charCodeAt(7) !== DASH
  ) {
    throw invalidDate(date);
  }
  const year = digitsAt(date, 0, 4);
  const month = digitsAt(date, 5, 2);
  const day = digitsAt(date, 8, 2);
  if (year < 0 || month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month)) {
    throw invalidDate(date);
  }
}

const DASH = 45;
const ZERO = 48;

/** The number written by `length` digits from `start`; -1 if any is not a digit. */
function digitsAt(text: string, start: number, length: number): number {
  let value = 0;
  for (let i = start; i < start + length; i += 1) {
    const digit = text.charCodeAt(i) - ZERO;
    if (digit < 0 || digit > 9) return -1;
    value = value * 10 + digit;
  }
  return value;
}

function invalidDate(date: unknown): MoneyRuleError {
  return new MoneyRuleError(
    'invalid-date',
    `“${String(date)}” is not a date written as YYYY-MM-DD.`,
  );
}

export function isIsoDate(date: string): boolean {
  try {
    parseIsoDate(date);
    return true;
  } catch {
    return false;
  }
}

/** An ISO date from its parts; the day must be valid for the month. */
export function isoDate(year: number, month: number, day: number): IsoDate {
  return `${String(year).padStart(4, '0')}-${pad2(month)}-${pad2(day)}`;
}

/**
 * Days since 1970-01-01 in the proleptic Gregorian calendar, by integer arithmetic on the date's
 * parts (H. Hinnant's civil-date algorithms): no Date object, so no time zone can shift a day.
 */
export function dayNumber(date: IsoDate): number {
  const { year, month, day } = parseIsoDate(date);
  const y = month <= 2 ? year - 1 : year;
  const era = Math.floor(y / 400);
  const yearOfEra = y - era * 400;
  const dayOfYear = Math.floor((153 * (month + (month > 2 ? -3 : 9)) + 2) / 5) + day - 1;
  const dayOfEra =
    yearOfEra * 365 + Math.floor(yearOfEra / 4) - Math.floor(yearOfEra / 100) + dayOfYear;
  return era * 146097 + dayOfEra - 719468;
}

/** The ISO date of a day number (inverse of `dayNumber`). */
export function fromDayNumber(days: number): IsoDate {
  const z = days + 719468;
  const era = Math.floor(z / 146097);
  const dayOfEra = z - era * 146097;
  const yearOfEra = Math.floor(
    (dayOfEra -
      Math.floor(dayOfEra / 1460) +
      Math.floor(dayOfEra / 36524) -
      Math.floor(dayOfEra / 146096)) /
      365,
  );
  const dayOfYear =
    dayOfEra - (365 * yearOfEra + Math.floor(yearOfEra / 4) - Math.floor(yearOfEra / 100));
  const monthIndex = Math.floor((5 * dayOfYear + 2) / 153);
  const day = dayOfYear - Math.floor((153 * monthIndex + 2) / 5) + 1;
  const month = monthIndex < 10 ? monthIndex + 3 : monthIndex - 9;
  return isoDate(yearOfEra + era * 400 + (month <= 2 ? 1 : 0), month, day);
}

export function addDays(date: IsoDate, days: number): IsoDate {
  return fromDayNumber(dayNumber(date) + days);
}

/** Whole days from `from` to `to` (negative when `to` is earlier). */
export function daysBetween(from: IsoDate, to: IsoDate): number {
  return dayNumber(to) - dayNumber(from);
}

/** The same day n months on, kept within the month (31 Jan + 1 month is 28 or 29 Feb). */
export function addMonths(date: IsoDate, months: number): IsoDate {
  const { year, month, day } = parseIsoDate(date);
  const index = year * 12 + (month - 1) + months;
  const newYear = Math.floor(index / 12);
  const newMonth = index - newYear * 12 + 1;
  return isoDate(newYear, newMonth, Math.min(day, daysInMonth(newYear, newMonth)));
}

/** The last day of the date's month. */
export function endOfMonth(date: IsoDate): IsoDate {
  const { year, month } = parseIsoDate(date);
  return isoDate(year, month, daysInMonth(year, month));
}

/** A month written 'YYYY-MM'. */
export type IsoMonth = string;

/** The month index (year × 12 + month − 1) of an ISO month; refuses an invalid one. */
export function monthIndex(month: IsoMonth): number {
  const match = ISO_MONTH.exec(month);
  const m = Number(match?.[2]);
  if (match === null || m < 1 || m > 12) {
    throw new MoneyRuleError('invalid-date', `“${month}” is not a month written as YYYY-MM.`);
  }
  return Number(match[1]) * 12 + m - 1;
}

/** The last day of the month with this index. */
export function monthEndOfIndex(index: number): IsoDate {
  const year = Math.floor(index / 12);
  const month = index - year * 12 + 1;
  return isoDate(year, month, daysInMonth(year, month));
}

/**
 * Today's date (or an instant's) in a time zone such as the studio's Europe/London, so month ends
 * and due dates are the studio's, not the server's.
 */
export function isoDateInTimeZone(instant: Date, timeZone: string): IsoDate {
  const parts = new Intl.DateTimeFormat('en-CA', {
    timeZone,
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
  }).formatToParts(instant);
  const part = (type: string) => parts.find((p) => p.type === type)?.value ?? '';
  return `${part('year')}-${part('month')}-${part('day')}`;
}

function pad2(value: number): string {
  return value < 10 ? `0${value}` : String(value);
}

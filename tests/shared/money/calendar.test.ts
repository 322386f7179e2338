import {
  addDays as fnsAddDays,
  addMonths as fnsAddMonths,
  differenceInCalendarDays,
  endOfMonth as fnsEndOfMonth,
  format,
} from 'date-fns';
import * as fc from 'fast-check';

import {
  addDays,
  addMonths,
  dayNumber,
  daysBetween,
  endOfMonth,
  fromDayNumber,
  isIsoDate,
  isoDateInTimeZone,
} from '@/shared/money';

import { RUNS } from './arbitraries';

// Cross-checks against date-fns, the calendar library TRADE-FACTS.md names for these rules.
const localDate = (iso: string) => {
  const [y, m, d] = iso.split('-').map(Number) as [number, number, number];
  const date = new Date(2000, 0, 1);
  date.setFullYear(y, m - 1, d);
  return date;
};
const iso = (date: Date) => format(date, 'yyyy-MM-dd');
const dateArb = fc
  .integer({ min: dayNumber('1900-01-01'), max: dayNumber('2199-12-31') })
  .map(fromDayNumber);

describe('calendar arithmetic on ISO dates', () => {
  it('day numbers start at 1970-01-01 and round-trip', () => {
    expect(dayNumber('1970-01-01')).toBe(0);
    expect(dayNumber('2000-03-01')).toBe(11017);
    expect(fromDayNumber(dayNumber('2024-02-29'))).toBe('2024-02-29');
  });

  it('refuses dates that do not exist', () => {
    expect(isIsoDate('2023-02-29')).toBe(false);
    expect(isIsoDate('2024-02-29')).toBe(true);
    expect(isIsoDate('2024-13-01')).toBe(false);
    expect(isIsoDate('2024-4-01')).toBe(false);
    expect(() => addDays('2100-02-29', 1)).toThrow(
      expect.objectContaining({ code: 'invalid-date' }),
    );
  });

  it('keeps the day within the month: 31 Jan + 1 month is 29 Feb in a leap year', () => {
    expect(addMonths('2024-01-31', 1)).toBe('2024-02-29');
    expect(addMonths('2023-01-31', 1)).toBe('2023-02-28');
    expect(addMonths('2024-02-29', 12)).toBe('2025-02-28');
    expect(endOfMonth('2024-02-10')).toBe('2024-02-29');
  });

  it('addDays and daysBetween agree with date-fns', () => {
    fc.assert(
      fc.property(dateArb, fc.integer({ min: -800, max: 800 }), (date, days) => {
        const later = addDays(date, days);
        expect(later).toBe(iso(fnsAddDays(localDate(date), days)));
        expect(daysBetween(date, later)).toBe(
          differenceInCalendarDays(localDate(later), localDate(date)),
        );
      }),
      RUNS,
    );
  });

  it('addMonths and endOfMonth agree with date-fns', () => {
    fc.assert(
      fc.property(dateArb, fc.integer({ min: -30, max: 30 }), (date, months) => {
        expect(addMonths(date, months)).toBe(iso(fnsAddMonths(localDate(date), months)));
        expect(endOfMonth(date)).toBe(iso(fnsEndOfMonth(localDate(date))));
      }),
      RUNS,
    );
  });

  it('takes today from the studio’s time zone, not the server’s (DESIGN.md, studios)', () => {
    // 23:30 UTC on 30 June is already 1 July in London (BST, UTC+1).
    expect(isoDateInTimeZone(new Date('2024-06-30T23:30:00Z'), 'Europe/London')).toBe('2024-07-01');
    expect(isoDateInTimeZone(new Date('2024-12-31T23:30:00Z'), 'Europe/London')).toBe('2024-12-31');
  });
});

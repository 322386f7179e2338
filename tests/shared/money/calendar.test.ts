import { spawnSync } from 'node:child_process';
import path from 'node:path';

import * as fc from 'fast-check';

import {
  addDays,
  addMonths,
  assertIsoDate,
  daysBetween,
  endOfMonth,
  isoDateInTimeZone,
  monthEndOfIndex,
  monthIndex,
  parseIsoDate,
} from '@/shared/money';

import { RUNS } from './arbitraries';

// The oracle: ECMAScript's own day arithmetic on UTC time values (ECMA-262, MakeDay and
// MakeDate), which shares no code with date-fns and no time zone with the process.
const DAY_MS = 86_400_000;
const utcDay = (date: string) => {
  const [y, m, d] = date.split('-').map(Number) as [number, number, number];
  return Date.UTC(y, m - 1, d) / DAY_MS;
};
const dateOfUtcDay = (day: number) => new Date(day * DAY_MS).toISOString().slice(0, 10);
/** The day-of-month clamp of a calendar month: the same day, or the month's last if it has none. */
const oracleAddMonths = (date: string, months: number) => {
  const [y, m, d] = date.split('-').map(Number) as [number, number, number];
  const lastDay = new Date(Date.UTC(y, m - 1 + months + 1, 0)).getUTCDate();
  return dateOfUtcDay(Date.UTC(y, m - 1 + months, Math.min(d, lastDay)) / DAY_MS);
};
const oracleEndOfMonth = (date: string) => {
  const [y, m] = date.split('-').map(Number) as [number, number];
  return dateOfUtcDay(Date.UTC(y, m, 0) / DAY_MS);
};

const dateArb = fc
  .integer({ min: utcDay('1900-01-01'), max: utcDay('2199-12-31') })
  .map(dateOfUtcDay);

const invalid = (date: string) =>
  expect.objectContaining({
    name: 'MoneyRuleError',
    code: 'invalid-date',
    message: `“${date}” is not a date written as YYYY-MM-DD.`,
  });

describe('calendar dates (ISO 8601 calendar dates, Gregorian calendar)', () => {
  it('keeps the Gregorian leap years: 2024 and 2000 have 29 February, 2023, 1900 and 2100 do not', () => {
    for (const leapDay of ['2024-02-29', '2000-02-29', '1600-02-29']) {
      expect(parseIsoDate(leapDay)).toEqual({
        year: Number(leapDay.slice(0, 4)),
        month: 2,
        day: 29,
      });
    }
    for (const notADay of ['2023-02-29', '1900-02-29', '2100-02-29']) {
      expect(() => assertIsoDate(notADay)).toThrow(invalid(notADay));
    }
    expect(endOfMonth('2100-02-10')).toBe('2100-02-28');
    expect(endOfMonth('2000-02-10')).toBe('2000-02-29');
    expect(daysBetween('2000-01-01', '2001-01-01')).toBe(366);
    expect(daysBetween('2100-01-01', '2101-01-01')).toBe(365);
  });

  it('counts 11,017 days from 1970-01-01 to 2000-03-01, as the Unix epoch does', () => {
    expect(daysBetween('1970-01-01', '2000-03-01')).toBe(11017);
    expect(addDays('1970-01-01', 11017)).toBe('2000-03-01');
  });

  it('refuses dates that do not exist, with the same error every time', () => {
    for (const date of ['2026-02-30', '2024-04-31', '2024-13-01', '2024-00-10', '2024-01-00']) {
      expect(() => assertIsoDate(date)).toThrow(invalid(date));
      expect(() => addDays(date, 1)).toThrow(invalid(date));
    }
  });

  it('refuses other ISO 8601 forms that date-fns’ parseISO reads, and anything else', () => {
    const forms = [
      '2026-2-3',
      '20260203',
      '2026-02',
      '2026',
      '2026-034',
      '2026-W05-2',
      '2026-02-03T00:00',
      '+002026-02-03',
      ' 2026-02-03',
      '2026/02/03',
      '',
    ];
    for (const form of forms) expect(() => assertIsoDate(form)).toThrow(invalid(form));
    expect(() => assertIsoDate(20260203 as unknown as string)).toThrow(invalid('20260203'));
  });

  it('keeps the day within the month: 31 Jan + 1 month is 29 Feb in a leap year', () => {
    expect(addMonths('2024-01-31', 1)).toBe('2024-02-29');
    expect(addMonths('2023-01-31', 1)).toBe('2023-02-28');
    expect(addMonths('2024-02-29', 12)).toBe('2025-02-28');
    expect(addMonths('2024-03-31', -1)).toBe('2024-02-29');
    expect(endOfMonth('2024-02-10')).toBe('2024-02-29');
    expect(endOfMonth('2024-04-30')).toBe('2024-04-30');
  });

  it('addDays and daysBetween agree with UTC day arithmetic', () => {
    fc.assert(
      fc.property(dateArb, fc.integer({ min: -800, max: 800 }), (date, days) => {
        const later = addDays(date, days);
        expect(later).toBe(dateOfUtcDay(utcDay(date) + days));
        expect(daysBetween(date, later)).toBe(days);
      }),
      RUNS,
    );
  });

  it('addMonths and endOfMonth agree with UTC month arithmetic', () => {
    fc.assert(
      fc.property(dateArb, fc.integer({ min: -30, max: 30 }), (date, months) => {
        expect(addMonths(date, months)).toBe(oracleAddMonths(date, months));
        expect(endOfMonth(date)).toBe(oracleEndOfMonth(date));
      }),
      RUNS,
    );
  });

  it('gives the same answers whatever the process’s time zone, even where it skipped a day', () => {
    // Days a zone skipped (Kwajalein 1993-08-21, Kiritimati 1994-12-31, Samoa 2011-12-30), a
    // midnight São Paulo skipped (2018-11-04), and 2024's clock changes in New York, London and
    // Auckland; each with the day before it.
    const awkward = [
      '1993-08-21',
      '1994-12-31',
      '2011-12-30',
      '2018-11-04',
      '2024-03-10',
      '2024-03-31',
      '2024-04-07',
      '2024-09-29',
      '2024-10-27',
      '2024-11-03',
    ];
    const dates = awkward.flatMap((date) => [dateOfUtcDay(utcDay(date) - 1), date]);
    const zones = [
      'UTC',
      'Pacific/Kwajalein',
      'Pacific/Kiritimati',
      'Pacific/Apia',
      'America/Sao_Paulo',
      'America/New_York',
      'Europe/London',
      'Pacific/Auckland',
    ];
    const child = spawnSync(
      process.execPath,
      [
        '--import',
        'tsx',
        path.join(__dirname, 'calendar-in-zones.ts'),
        JSON.stringify([zones, dates]),
      ],
      { encoding: 'utf8' },
    );
    expect(child.stderr).toBe('');
    const expected = dates.map((date) => [
      dateOfUtcDay(utcDay(date) + 1),
      dateOfUtcDay(utcDay(date) - 1),
      utcDay('2030-01-01') - utcDay(date),
      oracleAddMonths(date, 1),
      oracleEndOfMonth(date),
    ]);
    expect(JSON.parse(child.stdout)).toEqual(Object.fromEntries(zones.map((z) => [z, expected])));
  }, 30_000);
});

describe('month indexes (the VAT threshold monitor’s rolling 12 months)', () => {
  it('number months from January of year 0: year × 12 + month − 1', () => {
    expect(monthIndex('2024-03')).toBe(2024 * 12 + 2);
    expect(monthIndex('0000-01')).toBe(0);
    expect(monthEndOfIndex(2024 * 12 + 1)).toBe('2024-02-29');
    expect(monthEndOfIndex(2100 * 12 + 1)).toBe('2100-02-28');
  });

  it('refuses anything but a month written YYYY-MM', () => {
    for (const month of ['2024-13', '2024-00', '2024-3', '202403', '2024-03-01', '']) {
      expect(() => monthIndex(month)).toThrow(
        expect.objectContaining({
          name: 'MoneyRuleError',
          code: 'invalid-date',
          message: `“${month}” is not a month written as YYYY-MM.`,
        }),
      );
    }
  });

  it('a month’s index leads back to its last day', () => {
    fc.assert(
      fc.property(dateArb, (date) => {
        expect(monthEndOfIndex(monthIndex(date.slice(0, 7)))).toBe(oracleEndOfMonth(date));
      }),
      RUNS,
    );
  });
});

describe('isoDateInTimeZone (the studio’s today, not the server’s)', () => {
  it('follows UK summer time (Summer Time Order 2002: BST ends 01:00 GMT, last Sunday in October)', () => {
    // 23:30 UTC on 30 June is already 1 July in London (BST, UTC+1).
    expect(isoDateInTimeZone(new Date('2024-06-30T23:30:00Z'), 'Europe/London')).toBe('2024-07-01');
    expect(isoDateInTimeZone(new Date('2024-12-31T23:30:00Z'), 'Europe/London')).toBe('2024-12-31');
    expect(isoDateInTimeZone(new Date('2024-10-26T23:30:00Z'), 'Europe/London')).toBe('2024-10-27');
    expect(isoDateInTimeZone(new Date('2024-10-27T23:30:00Z'), 'Europe/London')).toBe('2024-10-27');
  });

  it('follows New Zealand daylight time (NZ Daylight Time Order 2007: ends first Sunday in April)', () => {
    // NZDT is UTC+13 until 03:00 on 7 April 2024, then NZST UTC+12.
    expect(isoDateInTimeZone(new Date('2024-04-06T11:30:00Z'), 'Pacific/Auckland')).toBe(
      '2024-04-07',
    );
    expect(isoDateInTimeZone(new Date('2024-04-07T11:30:00Z'), 'Pacific/Auckland')).toBe(
      '2024-04-07',
    );
  });

  it('follows US daylight time (Energy Policy Act 2005: ends first Sunday in November)', () => {
    // EDT is UTC−4 until 02:00 on 3 November 2024, then EST UTC−5.
    expect(isoDateInTimeZone(new Date('2024-11-03T04:30:00Z'), 'America/New_York')).toBe(
      '2024-11-03',
    );
    expect(isoDateInTimeZone(new Date('2024-11-04T04:30:00Z'), 'America/New_York')).toBe(
      '2024-11-03',
    );
  });

  it('agrees with Intl.DateTimeFormat for any instant in zones with odd offsets and DST', () => {
    const zones = [
      'Europe/London',
      'America/New_York',
      'Pacific/Auckland',
      'Pacific/Chatham',
      'Asia/Kolkata',
      'America/St_Johns',
      'Australia/Lord_Howe',
    ];
    const intlDate = (instant: Date, timeZone: string) => {
      const parts = new Intl.DateTimeFormat('en-GB', {
        timeZone,
        year: 'numeric',
        month: '2-digit',
        day: '2-digit',
      }).formatToParts(instant);
      const part = (type: string) => parts.find((p) => p.type === type)?.value;
      return `${part('year')}-${part('month')}-${part('day')}`;
    };
    fc.assert(
      fc.property(
        fc.integer({ min: Date.UTC(2000, 0, 1), max: Date.UTC(2040, 0, 1) }),
        fc.constantFrom(...zones),
        (time, zone) => {
          expect(isoDateInTimeZone(new Date(time), zone)).toBe(intlDate(new Date(time), zone));
        },
      ),
      RUNS,
    );
  });
});

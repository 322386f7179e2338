import * as fc from 'fast-check';

import {
  addMonths,
  money,
  saleTurnover,
  splitSale,
  type TurnoverEntry,
  ukVatRegistrationThreshold,
  ukVatThresholds,
  vatThresholdMonitor,
} from '@/shared/money';
import { defaultTerms } from '@/shared/schemas/terms';

import { RUNS } from './arbitraries';

const gbp = (pence: number) => money(pence, 'GBP');
const monthly = (pence: number, from: string, count: number): TurnoverEntry[] =>
  Array.from({ length: count }, (_, i) => ({ date: addMonths(from, i), amount: gbp(pence) }));

describe('UK registration threshold (HM Treasury policy paper, 7 March 2024)', () => {
  it('is £90,000 from 1 April 2024 and £85,000 before, from 2017', () => {
    expect(ukVatRegistrationThreshold('2024-04-01')).toEqual(gbp(9_000_000));
    expect(ukVatRegistrationThreshold('2024-03-31')).toEqual(gbp(8_500_000));
    expect(ukVatRegistrationThreshold('2017-04-01')).toEqual(gbp(8_500_000));
    expect(ukVatRegistrationThreshold('2017-03-31')).toBeNull();
  });

  it('deregistration is £88,000 from 1 April 2024 and £83,000 before', () => {
    expect(ukVatThresholds.map((t) => t.deregistration)).toEqual([8_800_000, 8_300_000]);
  });
});

describe('vatThresholdMonitor (HMRC: rolling 12 months at each month end, register within 30 days)', () => {
  it('finds the first month end over the threshold and the date to register by', () => {
    // £7,600 a month: £91,200 after twelve months, over £90,000 at 31 Dec 2024.
    const report = vatThresholdMonitor({
      entries: monthly(760_000, '2024-01-15', 18),
      fromMonth: '2024-01',
      toMonth: '2025-03',
      currency: 'GBP',
    });
    expect(report.months[11]).toMatchObject({
      monthEnd: '2024-12-31',
      rolling12: gbp(9_120_000),
      threshold: gbp(9_000_000),
      over: true,
    });
    expect(report.months[10]?.over).toBe(false);
    expect(report.firstMonthEndOver).toBe('2024-12-31');
    // 30 days after 31 December 2024: 31 days in January, so 30 January.
    expect(report.registerBy).toBe('2025-01-30');
  });

  it('counts only turnover over the threshold, not equal to it', () => {
    const report = vatThresholdMonitor({
      entries: [{ date: '2024-06-10', amount: gbp(9_000_000) }],
      fromMonth: '2024-06',
      toMonth: '2024-06',
      currency: 'GBP',
    });
    expect(report.firstMonthEndOver).toBeNull();
  });

  it('applies the threshold in force at each month end: £88,000 is over in March 2024 only', () => {
    const report = vatThresholdMonitor({
      entries: [{ date: '2024-03-01', amount: gbp(8_800_000) }],
      fromMonth: '2024-03',
      toMonth: '2024-04',
      currency: 'GBP',
    });
    expect(report.months.map((m) => m.over)).toEqual([true, false]);
  });

  it('drops a month once it is more than 12 months back', () => {
    const report = vatThresholdMonitor({
      entries: [{ date: '2023-01-31', amount: gbp(100) }],
      fromMonth: '2023-12',
      toMonth: '2024-01',
      currency: 'GBP',
    });
    expect(report.months.map((m) => m.rolling12.amount)).toEqual([100, 0]);
  });

  it('asks for a threshold outside GBP', () => {
    expect(() =>
      vatThresholdMonitor({
        entries: [],
        fromMonth: '2024-01',
        toMonth: '2024-01',
        currency: 'EUR',
      }),
    ).toThrow(expect.objectContaining({ code: 'threshold-unknown' }));
  });

  it('each rolling total is the sum of the entries in the 12 months to that month end', () => {
    const entryArb = fc.record({
      date: fc
        .integer({ min: 0, max: 47 })
        .chain((m) =>
          fc
            .integer({ min: 1, max: 28 })
            .map((d) => addMonths(`2021-01-${String(d).padStart(2, '0')}`, m)),
        ),
      amount: fc.integer({ min: 0, max: 1_000_000 }).map(gbp),
    });
    fc.assert(
      fc.property(fc.array(entryArb, { maxLength: 40 }), (entries) => {
        const report = vatThresholdMonitor({
          entries,
          fromMonth: '2022-01',
          toMonth: '2024-12',
          currency: 'GBP',
          threshold: gbp(5_000_000),
        });
        // Brute force: for each month end, add every entry dated in the 12 months up to it.
        const expected = report.months.map((month) => {
          const start = addMonths(`${month.month}-01`, -11);
          return entries
            .filter((e) => e.date >= start && e.date <= month.monthEnd)
            .reduce((sum, e) => sum + e.amount.amount, 0);
        });
        expect(report.months.map((m) => m.rolling12.amount)).toEqual(expected);
        expect(report.months.map((m) => m.over)).toEqual(expected.map((t) => t > 5_000_000));
      }),
      RUNS,
    );
  });
});

describe('saleTurnover (docs/money-rules.md; ICAEW FAQ on disclosed agents)', () => {
  it('through an agent the whole sale price is the maker’s; on sale or return, what the venue pays', () => {
    const split = splitSale(defaultTerms, gbp(10000), gbp(10000));
    expect(saleTurnover(defaultTerms, gbp(10000), split)).toEqual(gbp(10000));
    const sor = { ...defaultTerms, venueRole: 'sale-or-return' as const };
    expect(saleTurnover(sor, gbp(10000), split)).toEqual(gbp(6000));
  });
});

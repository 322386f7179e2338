import * as fc from 'fast-check';

import { addDays, type ExposureLine, exposureOn, isOutOn, money } from '@/shared/money';

import { RUNS } from './arbitraries';

const line = (changes: Partial<ExposureLine> & { id: number }): ExposureLine => ({
  consignmentId: 1,
  venueId: 1,
  insuranceValue: money(6000, 'GBP'),
  dispatchDate: '2024-05-01',
  endDate: null,
  ...changes,
});

describe('exposureOn (docs/money-rules.md: the insured value of every line still out)', () => {
  const lines = [
    line({ id: 1 }),
    line({ id: 2, insuranceValue: money(4000, 'GBP'), endDate: '2024-06-10' }), // sold 10 June
    line({ id: 3, consignmentId: 2, venueId: 2, insuranceValue: money(12000, 'GBP') }),
    line({ id: 4, consignmentId: 3, venueId: 2, dispatchDate: null }), // still in the studio
    line({ id: 5, consignmentId: 3, venueId: 2, dispatchDate: '2024-07-01' }),
  ];

  it('sums per consignment, per venue and for the studio', () => {
    const exposure = exposureOn(lines, '2024-06-09', 'GBP');
    expect(exposure.studio).toEqual({ value: money(22000, 'GBP'), lineCount: 3 });
    expect(exposure.byVenue).toEqual([
      { venueId: 1, value: money(10000, 'GBP'), lineCount: 2 },
      { venueId: 2, value: money(12000, 'GBP'), lineCount: 1 },
    ]);
    expect(exposure.byConsignment.map((c) => [c.consignmentId, c.value.amount])).toEqual([
      [1, 10000],
      [2, 12000],
    ]);
  });

  it('counts a line from its dispatch day and not on the day it ends', () => {
    expect(isOutOn(lines[1]!, '2024-06-10')).toBe(false);
    expect(isOutOn(lines[4]!, '2024-07-01')).toBe(true);
    expect(isOutOn(lines[4]!, '2024-06-30')).toBe(false);
    expect(exposureOn(lines, '2024-07-01', 'GBP').studio.value).toEqual(money(24000, 'GBP'));
  });

  it('refuses a line in another currency or one that ends before it was sent', () => {
    const euro = line({ id: 9, insuranceValue: money(1, 'EUR') });
    expect(() => exposureOn([euro], '2024-06-01', 'GBP')).toThrow(
      expect.objectContaining({ code: 'currency-mismatch' }),
    );
    const backwards = line({ id: 9, endDate: '2024-04-01' });
    expect(() => exposureOn([backwards], '2024-06-01', 'GBP')).toThrow(
      expect.objectContaining({ code: 'invalid-date' }),
    );
  });

  it('equals the sum of the open lines’ insurance values, however they are grouped', () => {
    const day = fc.integer({ min: 0, max: 60 }).map((offset) => addDays('2024-03-01', offset));
    const lineArb = fc.record({
      id: fc.nat(),
      consignmentId: fc.integer({ min: 1, max: 5 }),
      venueId: fc.integer({ min: 1, max: 3 }),
      value: fc.integer({ min: 0, max: 100_000_000_000 }),
      dispatchDate: fc.option(day),
      daysOut: fc.option(fc.integer({ min: 0, max: 30 })),
    });
    fc.assert(
      fc.property(fc.array(lineArb, { maxLength: 30 }), day, (specs, asOf) => {
        const input: ExposureLine[] = specs.map((s) => ({
          id: s.id,
          consignmentId: s.consignmentId,
          venueId: s.venueId,
          insuranceValue: money(s.value, 'GBP'),
          dispatchDate: s.dispatchDate,
          endDate:
            s.dispatchDate === null || s.daysOut === null
              ? null
              : addDays(s.dispatchDate, s.daysOut),
        }));
        const exposure = exposureOn(input, asOf, 'GBP');
        const open = input.filter(
          (l) => l.dispatchDate !== null && l.dispatchDate <= asOf && (l.endDate ?? '9') > asOf,
        );
        const expected = open.reduce((sum, l) => sum + l.insuranceValue.amount, 0);
        expect(exposure.studio).toEqual({
          value: { amount: expected, currency: 'GBP' },
          lineCount: open.length,
        });
        const byVenue = exposure.byVenue.reduce((sum, v) => sum + v.value.amount, 0);
        const byConsignment = exposure.byConsignment.reduce((sum, c) => sum + c.value.amount, 0);
        expect([byVenue, byConsignment]).toEqual([expected, expected]);
      }),
      RUNS,
    );
  });
});

import * as fc from 'fast-check';

import { parseDecimalAmount, toDecimalString } from '@/shared/money';

describe('parseDecimalAmount', () => {
  it('reads major units into minor units by the ISO 4217 minor unit (GBP 2, JPY 0, BHD 3)', () => {
    expect(parseDecimalAmount('12.50', 'GBP')).toBe(1250);
    expect(parseDecimalAmount('12.5', 'GBP')).toBe(1250);
    expect(parseDecimalAmount('£1,250', 'GBP')).toBe(125_000);
    expect(parseDecimalAmount(' 8 ', 'GBP')).toBe(800);
    expect(parseDecimalAmount('1234', 'JPY')).toBe(1234);
    expect(parseDecimalAmount('1.234', 'BHD')).toBe(1234);
  });

  it('refuses text, negatives, and more decimals than the currency has', () => {
    for (const text of ['twelve', '-1', '12.505', '1,25', '', '1e3']) {
      expect([text, parseDecimalAmount(text, 'GBP')]).toEqual([text, null]);
    }
    expect(parseDecimalAmount('12.5', 'JPY')).toBeNull();
  });

  it('reads back what toDecimalString writes (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 100_000_000_000 }), (amount) => {
        expect(parseDecimalAmount(toDecimalString({ amount, currency: 'GBP' }), 'GBP')).toBe(
          amount,
        );
      }),
    );
  });
});

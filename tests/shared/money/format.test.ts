import * as cc from 'currency-codes';
import * as fc from 'fast-check';

import { formatMoney, money, toDecimalString } from '@/shared/money';
import { currencyCodes, isCurrencyCode, minorUnitOf } from '@/shared/schemas/money';

import { RUNS } from './arbitraries';

describe('minor units (ISO 4217, as currency-codes carries it)', () => {
  it('GBP 2, EUR 2, USD 2, JPY 0, KRW 0, BHD 3', () => {
    const codes = ['GBP', 'EUR', 'USD', 'JPY', 'KRW', 'BHD'];
    expect(codes.map(minorUnitOf)).toEqual([2, 2, 2, 0, 0, 3]);
  });

  it('every accepted currency has the minor unit the ISO 4217 data in currency-codes gives', () => {
    const unknown: string[] = [];
    for (const code of currencyCodes) {
      const record = cc.code(code);
      if (record === undefined) unknown.push(code);
      else expect([code, minorUnitOf(code)]).toEqual([code, record.digits]);
    }
    // Codes added to ISO 4217 after the data's publication (2024-06-25).
    expect(unknown).toEqual(['XAD', 'XCG']);
  });

  it('refuses currencies whose minor unit dinero.js does not model in tenths (MGA, MRU)', () => {
    expect([isCurrencyCode('MGA'), isCurrencyCode('MRU'), isCurrencyCode('GBP')]).toEqual([
      false,
      false,
      true,
    ]);
  });
});

describe('toDecimalString', () => {
  it('writes the minor unit’s digits exactly', () => {
    expect(toDecimalString(money(123450, 'GBP'))).toBe('1234.50');
    expect(toDecimalString(money(-5, 'GBP'))).toBe('-0.05');
    expect(toDecimalString(money(1234, 'JPY'))).toBe('1234');
    expect(toDecimalString(money(1234, 'BHD'))).toBe('1.234');
  });
});

describe('formatMoney agrees with Intl.NumberFormat (the built-in reference formatter)', () => {
  const cases: [string, string][] = [
    ['GBP', 'en-GB'],
    ['EUR', 'de-DE'],
    ['EUR', 'en-GB'],
    ['USD', 'en-US'],
    ['JPY', 'ja-JP'],
    ['JPY', 'en-GB'],
  ];

  it.each(cases)('%s in %s', (currency, locale) => {
    const intl = new Intl.NumberFormat(locale, { style: 'currency', currency });
    // The oracle gets a plain number and Intl's own minor unit for the currency.
    const digits = intl.resolvedOptions().maximumFractionDigits ?? 0;
    fc.assert(
      fc.property(fc.integer({ min: -1_000_000_000, max: 100_000_000_000 }), (amount) => {
        expect(formatMoney(money(amount, currency), locale)).toBe(
          intl.format(amount / 10 ** digits),
        );
      }),
      RUNS,
    );
  });

  it('shows pounds in en-GB as the studio default', () => {
    expect(formatMoney(money(123450, 'GBP'))).toBe('£1,234.50');
  });
});

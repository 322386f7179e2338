import * as fc from 'fast-check';

import { readWrittenAmount } from '@/shared/money';

describe('readWrittenAmount', () => {
  it('reads the amounts makers write, into minor units (ISO 4217: GBP 2, JPY 0)', () => {
    for (const [text, amount] of [
      ['85', 8500],
      ['£85.00', 8500],
      ['85.00 GBP', 8500],
      ['GBP 85', 8500],
      ['1,250.00', 125_000],
      ['£1,250.50', 125_050],
      // A decimal comma, as de-DE and fr-FR write (Unicode CLDR number symbols).
      ['12,50', 1250],
      ['12,5', 1250],
      ['1.250,00', 125_000],
    ] as const) {
      expect([text, readWrittenAmount(text, 'GBP')]).toEqual([
        text,
        { ok: true, value: { amount, currency: 'GBP' } },
      ]);
    }
    expect(readWrittenAmount('¥1,250', 'JPY')).toMatchObject({ ok: false });
    expect(readWrittenAmount('1250', 'JPY')).toEqual({
      ok: true,
      value: { amount: 1250, currency: 'JPY' },
    });
  });

  it('reads back what Intl writes for the currency in en-GB, de-DE and fr-FR, with its sign', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 100_000_000 }),
        fc.constantFrom('en-GB', 'de-DE', 'fr-FR'),
        fc.constantFrom('GBP', 'EUR'),
        (amount, locale, currency) => {
          const written = new Intl.NumberFormat(locale, {
            style: 'currency',
            currency,
            currencyDisplay: 'narrowSymbol',
          }).format(amount / 100);
          expect(readWrittenAmount(written, currency)).toEqual({
            ok: true,
            value: { amount, currency },
          });
        },
      ),
    );
  });

  it('asks for 1,250 to be written unambiguously', () => {
    expect(readWrittenAmount('1,250', 'GBP')).toEqual({
      ok: false,
      message:
        '“1,250” could be 1250 or 1.25: write the price with a decimal point and no thousands separator, such as 1250.00 or 1.25.',
    });
    expect(readWrittenAmount('€1.250', 'EUR')).toMatchObject({ ok: false });
  });

  it('refuses another currency, text and more decimals than the currency has', () => {
    expect(readWrittenAmount('€85', 'GBP')).toEqual({
      ok: false,
      message:
        '“€85” is in €; the studio’s works are in GBP. Convert the price, or leave the row out.',
    });
    expect(readWrittenAmount('85 usd', 'GBP')).toMatchObject({
      ok: false,
      message:
        '“85 usd” is in USD; the studio’s works are in GBP. Convert the price, or leave the row out.',
    });
    expect(readWrittenAmount('$85', 'USD')).toEqual({
      ok: true,
      value: { amount: 8500, currency: 'USD' },
    });
    for (const text of ['twelve', '12.5055', '-5', '']) {
      expect(readWrittenAmount(text, 'GBP')).toEqual({
        ok: false,
        message: `Enter the price in GBP as a number such as 12.50, not “${text}”.`,
      });
    }
    expect(readWrittenAmount('12.5', 'JPY')).toEqual({
      ok: false,
      message: 'Enter the price in JPY as a whole number, not “12.5”.',
    });
  });
});

import * as fc from 'fast-check';

import { readWrittenDecimal } from '@/shared/format/written-decimal';

// The conventions come from Unicode CLDR's number symbols, as the JavaScript engine's Intl data
// carries them: en-GB groups with "," and marks decimals with "."; de-DE the other way round;
// fr-FR groups with a narrow no-break space and marks decimals with ","; de-CH groups with "’".
const locales = ['en-GB', 'de-DE', 'fr-FR', 'de-CH'] as const;

describe('readWrittenDecimal', () => {
  it('reads what Intl writes in each locale, with two decimals, back to the same digits', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 999_999_999 }),
        fc.integer({ min: 0, max: 99 }),
        fc.constantFrom(...locales),
        (whole, cents, locale) => {
          const written = new Intl.NumberFormat(locale, {
            minimumFractionDigits: 2,
            maximumFractionDigits: 2,
          }).format(whole + cents / 100);
          expect(readWrittenDecimal(written)).toEqual({
            kind: 'number',
            whole: String(whole),
            fraction: String(cents).padStart(2, '0'),
          });
        },
      ),
    );
  });

  it('flags a single mark before three digits, as en-GB and de-DE write thousands differently', () => {
    // Intl itself writes 1250 as "1,250" in en-GB and "1.250" in de-DE: the same marks, opposite
    // meanings to a reader of the other locale, so neither is guessed.
    expect(new Intl.NumberFormat('en-GB').format(1250)).toBe('1,250');
    expect(new Intl.NumberFormat('de-DE').format(1250)).toBe('1.250');
    expect(readWrittenDecimal('1,250')).toEqual({
      kind: 'ambiguous',
      grouped: '1250',
      decimal: '1.25',
    });
    expect(readWrittenDecimal('1.250')).toEqual({
      kind: 'ambiguous',
      grouped: '1250',
      decimal: '1.25',
    });
    expect(readWrittenDecimal('12,000')).toEqual({
      kind: 'ambiguous',
      grouped: '12000',
      decimal: '12',
    });
  });

  it('reads a mark that only one convention allows', () => {
    expect(readWrittenDecimal('12,50')).toEqual({ kind: 'number', whole: '12', fraction: '50' });
    expect(readWrittenDecimal('12,5')).toEqual({ kind: 'number', whole: '12', fraction: '5' });
    expect(readWrittenDecimal('1,250,000')).toEqual({
      kind: 'number',
      whole: '1250000',
      fraction: '',
    });
    expect(readWrittenDecimal('1.250.000')).toEqual({
      kind: 'number',
      whole: '1250000',
      fraction: '',
    });
    // A leading zero or more than three digits before it: no thousands group looks like that.
    expect(readWrittenDecimal('0,250')).toEqual({ kind: 'number', whole: '0', fraction: '250' });
    expect(readWrittenDecimal('1250,000')).toEqual({
      kind: 'number',
      whole: '1250',
      fraction: '000',
    });
    expect(readWrittenDecimal(' 85 ')).toEqual({ kind: 'number', whole: '85', fraction: '' });
  });

  it('refuses what is not one number', () => {
    for (const text of [
      '',
      'twelve',
      '-5',
      '1,2,3',
      '1.250,000.5',
      '12.',
      '1,25.000',
      '1 2',
      '1e3',
    ]) {
      expect([text, readWrittenDecimal(text)]).toEqual([text, { kind: 'invalid' }]);
    }
  });
});

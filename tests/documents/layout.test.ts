import fs from 'node:fs';

import * as fontkit from 'fontkit';

import { fonts, printable } from '@/documents/layout/fonts';
import { formatKilograms } from '@/documents/layout/format';
import { fileIdentifier } from '@/documents/layout/identity';
import { formatMoney } from '@/shared/money/format';

describe('formatKilograms', () => {
  it('writes grams as kilograms to one place', () => {
    expect(formatKilograms(18_640, 'en-GB')).toBe('18.6 kg');
    expect(formatKilograms(16_000, 'de-DE')).toBe('16,0 kg');
  });
});

describe('printable', () => {
  const text = fontkit.create(fs.readFileSync(fonts.text)) as fontkit.Font;
  const missing = (words: string) =>
    [...words].filter((char) => !text.hasGlyphForCodePoint(char.codePointAt(0)!));

  it('leaves no character the text font cannot draw in money written by common locales', () => {
    const amount = { amount: 123_456_789, currency: 'EUR' };
    expect(missing(formatMoney(amount, 'fr-FR'))).toEqual(['\u202f', '\u202f']);
    for (const [locale, currency] of [
      ['en-GB', 'GBP'],
      ['fr-FR', 'EUR'],
      ['de-CH', 'CHF'],
      ['nl-NL', 'EUR'],
      ['en-GB', 'JPY'],
      ['sv-SE', 'SEK'],
    ] as const) {
      const written = printable(formatMoney({ amount: 123_456_789, currency }, locale));
      expect({ locale, missing: missing(written) }).toEqual({ locale, missing: [] });
    }
  });
});

describe('fileIdentifier', () => {
  const photo = new Uint8Array([0xff, 0xd8, 1, 2, 3]);

  it('is 16 bytes (ISO 32000-1, 14.4) that depend on the data, not on its key order', () => {
    const a = fileIdentifier('labels', { reference: 'R1', photo, lines: [1, 2] });
    const b = fileIdentifier('labels', { lines: [1, 2], photo, reference: 'R1' });
    expect(a).toHaveLength(16);
    expect(a.equals(b)).toBe(true);
  });

  it('changes with one byte of a picture, and with the kind of document', () => {
    const a = fileIdentifier('labels', { photo });
    const b = fileIdentifier('labels', { photo: new Uint8Array([0xff, 0xd8, 1, 2, 4]) });
    const c = fileIdentifier('condition-report', { photo });
    expect(a.equals(b)).toBe(false);
    expect(a.equals(c)).toBe(false);
  });
});

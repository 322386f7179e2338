import * as fc from 'fast-check';

import { parseLengthMm, parseWeightGrams } from '@/shared/measurements';
import { workCreateSchema } from '@/shared/schemas/work';

const weightWords = {
  unreadable: 'Enter the weight in grams or kilograms, such as 850 g or 1.2 kg.',
  tooFine: 'Enter the weight to the nearest gram, such as 850 g or 1.25 kg.',
  tooSmall: 'The weight must be at least 1 g.',
  tooLarge: 'The weight must be at most 2,000 kg.',
};
const sizeWords = {
  unreadable: 'Enter the size in millimetres or centimetres, such as 140 mm or 14 cm.',
  tooFine: 'Enter the size to the nearest millimetre, such as 142 mm or 14.2 cm.',
  tooSmall: 'The size must be at least 1 mm.',
  tooLarge: 'The size must be at most 10,000 mm (10 m).',
};

describe('parseWeightGrams', () => {
  // 1 kg = 1000 g: the SI prefix kilo is 10^3 (BIPM, The International System of Units, 9th
  // edition, 2019, table 7).
  it.each([
    ['1.2 kg', 1200],
    ['1.2kg', 1200],
    ['1.2 KG', 1200],
    ['0.85 kilograms', 850],
    ['.5 kg', 500],
    ['2 kilos', 2000],
    ['1 250 g', 1250],
    ['1,2 kg', 1200],
    ['1200 g', 1200],
    ['1200 grams', 1200],
    ['450 grammes', 450],
    ['1.2000 kg', 1200],
  ])('reads %s as %i g', (text, grams) => {
    expect(parseWeightGrams(text)).toEqual({ ok: true, value: grams });
  });

  it('reads a bare number as grams, the field’s stated unit, with spaces around it', () => {
    expect(parseWeightGrams('  17250 ')).toEqual({ ok: true, value: 17250 });
    expect(parseWeightGrams('17 250')).toEqual({ ok: true, value: 17250 });
  });

  it('refuses what is not a weight in grams or kilograms, in one wording', () => {
    for (const text of ['', 'heavy', 'kg', '3 lb', '1.2.3 kg', '12 stone', '1e3']) {
      expect(parseWeightGrams(text)).toEqual({ ok: false, message: weightWords.unreadable });
    }
  });

  it('asks for whole grams rather than rounding a finer figure', () => {
    expect(parseWeightGrams('12.5')).toEqual({ ok: false, message: weightWords.tooFine });
    expect(parseWeightGrams('1.2345 kg')).toEqual({ ok: false, message: weightWords.tooFine });
  });

  it('keeps to 1 g up to 2,000 kg', () => {
    expect(parseWeightGrams('0')).toEqual({ ok: false, message: weightWords.tooSmall });
    expect(parseWeightGrams('0.0004 kg')).toEqual({ ok: false, message: weightWords.tooFine });
    expect(parseWeightGrams('-5 g')).toEqual({ ok: false, message: weightWords.tooSmall });
    expect(parseWeightGrams('1 g')).toEqual({ ok: true, value: 1 });
    expect(parseWeightGrams('2000 kg')).toEqual({ ok: true, value: 2_000_000 });
    expect(parseWeightGrams('2000.001 kg')).toEqual({ ok: false, message: weightWords.tooLarge });
    expect(parseWeightGrams('99999999999999999999999 g')).toEqual({
      ok: false,
      message: weightWords.tooLarge,
    });
  });

  it('gives back any whole number of grams in range written as grams or as kilograms', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 2_000_000 }), (grams) => {
        // Four decimal places: three could also be read as thousands grouped (see below).
        const kilograms = `${Math.trunc(grams / 1000)}.${String(grams % 1000).padStart(3, '0')}0`;
        expect(parseWeightGrams(`${grams} g`)).toEqual({ ok: true, value: grams });
        expect(parseWeightGrams(`${kilograms} kg`)).toEqual({ ok: true, value: grams });
      }),
    );
  });
});

describe('a mark either convention could mean', () => {
  // Unicode CLDR number symbols: en-GB writes 1,250.5 and de-DE 1.250,5, so "1,250" and "1.250"
  // are 1250 in one and 1.25 in the other.
  it('is refused with both readings, as prices are', () => {
    expect(parseWeightGrams('1,250 kg')).toEqual({
      ok: false,
      message:
        '“1,250 kg” could be 1250 or 1.25: write the weight with a decimal point and no thousands separator.',
    });
    expect(parseWeightGrams('1.250 kg')).toMatchObject({ ok: false });
    expect(parseLengthMm('1,250 mm')).toEqual({
      ok: false,
      message:
        '“1,250 mm” could be 1250 or 1.25: write the size with a decimal point and no thousands separator.',
    });
  });
});

describe('parseLengthMm', () => {
  // 1 cm = 10 mm and 1 m = 1000 mm: SI prefixes centi 10^-2 and milli 10^-3 (BIPM SI Brochure,
  // 9th edition, table 7).
  it.each([
    ['14 cm', 140],
    ['14cm', 140],
    ['14.2 cm', 142],
    ['140 mm', 140],
    ['140 millimetres', 140],
    ['35 centimeters', 350],
    ['1.2 m', 1200],
    ['14,5 cm', 145],
    ['140', 140],
  ])('reads %s as %i mm', (text, mm) => {
    expect(parseLengthMm(text)).toEqual({ ok: true, value: mm });
  });

  it('refuses what is not a size in millimetres, centimetres or metres, in one wording', () => {
    for (const text of ['', 'tall', 'cm', '6 in', '5 ft']) {
      expect(parseLengthMm(text)).toEqual({ ok: false, message: sizeWords.unreadable });
    }
  });

  it('asks for whole millimetres and keeps to 1 mm up to 10 m', () => {
    expect(parseLengthMm('14.25 cm')).toEqual({ ok: false, message: sizeWords.tooFine });
    expect(parseLengthMm('12.5')).toEqual({ ok: false, message: sizeWords.tooFine });
    expect(parseLengthMm('0 cm')).toEqual({ ok: false, message: sizeWords.tooSmall });
    expect(parseLengthMm('10 m')).toEqual({ ok: true, value: 10_000 });
    expect(parseLengthMm('1001 cm')).toEqual({ ok: false, message: sizeWords.tooLarge });
  });
});

describe('the work schema and the readers', () => {
  const issueOn = (field: string, value: unknown) =>
    workCreateSchema
      .safeParse({ title: 'Jug', retailPrice: { amount: 100, currency: 'GBP' }, [field]: value })
      .error?.issues.find((issue) => issue.path[0] === field)?.message;

  it('word a stored weight or size as the readers word the same figure typed', () => {
    for (const grams of [0, -3, 2.5, 2_000_001]) {
      const typed = parseWeightGrams(String(grams));
      expect(typed.ok).toBe(false);
      expect(issueOn('weightG', grams)).toBe(typed.ok ? undefined : typed.message);
    }
    for (const mm of [0, 12.5, 10_001]) {
      const typed = parseLengthMm(String(mm));
      expect(issueOn('depthMm', mm)).toBe(typed.ok ? undefined : typed.message);
    }
    expect(issueOn('weightG', 'heavy')).toBe(weightWords.unreadable);
    expect(issueOn('weightG', 1200)).toBeUndefined();
  });
});

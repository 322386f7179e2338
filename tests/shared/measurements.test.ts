import { parseLengthMm, parseWeightGrams } from '@/shared/measurements';

describe('parseWeightGrams', () => {
  it('reads grams and kilograms as people write them', () => {
    for (const [text, grams] of [
      ['1200', 1200],
      ['1200 g', 1200],
      ['1200g', 1200],
      ['1.2 kg', 1200],
      ['1.2kg', 1200],
      ['1,2 kg', 1200],
      ['0.35 kg', 350],
      ['2 kilos', 2000],
      ['1 250 g', 1250],
      ['16 KG', 16_000],
    ] as const) {
      expect([text, parseWeightGrams(text)]).toEqual([text, { ok: true, value: grams }]);
    }
  });

  it('converts pounds and ounces by their legal definition, to the nearest gram', () => {
    // International yard and pound agreement (1959): 1 lb = 0.45359237 kg exactly; 1 oz = 1/16 lb.
    expect(parseWeightGrams('1 lb')).toEqual({ ok: true, value: 454 });
    expect(parseWeightGrams('2.5 lbs')).toEqual({ ok: true, value: 1134 });
    expect(parseWeightGrams('8 oz')).toEqual({ ok: true, value: 227 });
  });

  it('refuses a bare fraction, a thousands mark that could be a decimal mark, and other units', () => {
    expect(parseWeightGrams('1.5')).toEqual({
      ok: false,
      message: '“1.5” has no unit: write 1.5 kg, or the weight in whole grams.',
    });
    expect(parseWeightGrams('1,250 kg')).toEqual({
      ok: false,
      message:
        '“1,250 kg” could be 1250 or 1.25: write the weight with a decimal point and no thousands separator.',
    });
    expect(parseWeightGrams('3 stone')).toEqual({
      ok: false,
      message:
        'Enter the weight as a number with its unit, such as 1200 g or 1.2 kg, not “3 stone”.',
    });
    expect(parseWeightGrams('heavy')).toEqual({
      ok: false,
      message: 'Enter the weight as a number with its unit, such as 1200 g or 1.2 kg, not “heavy”.',
    });
    expect(parseWeightGrams('')).toMatchObject({ ok: false });
  });
});

describe('parseLengthMm', () => {
  it('reads millimetres, centimetres, metres and inches', () => {
    for (const [text, mm] of [
      ['140', 140],
      ['140 mm', 140],
      ['14 cm', 140],
      ['14cm', 140],
      ['14,5 cm', 145],
      ['1.2 m', 1200],
      // 1 in = 25.4 mm exactly (international yard and pound agreement, 1959).
      ['5.5 in', 140],
      ['10"', 254],
    ] as const) {
      expect([text, parseLengthMm(text)]).toEqual([text, { ok: true, value: mm }]);
    }
  });

  it('refuses a bare fraction and text', () => {
    expect(parseLengthMm('14.5')).toEqual({
      ok: false,
      message: '“14.5” has no unit: write 14.5 cm, or the size in whole millimetres.',
    });
    expect(parseLengthMm('tall')).toEqual({
      ok: false,
      message: 'Enter the size as a number with its unit, such as 140 mm or 14 cm, not “tall”.',
    });
  });
});

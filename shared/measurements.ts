import { readWrittenDecimal } from './format/written-decimal';

type Measured = { ok: true; value: number } | { ok: false; message: string };

type Quantity = {
  /** "weight", "size" */
  name: string;
  /** the unit stored, in words: "grams" */
  base: string;
  /** how many of the stored unit one of each written unit is */
  units: Readonly<Record<string, number>>;
  example: string;
  /** a bare fraction's likely meaning, offered back: "kg" */
  larger: string;
};

// The pound and the inch are exact by definition (international yard and pound agreement, 1959):
// 1 lb = 453.59237 g, 1 oz = 1/16 lb, 1 in = 25.4 mm.
const weight: Quantity = {
  name: 'weight',
  base: 'grams',
  units: {
    ...Object.fromEntries(
      ['g', 'gm', 'gms', 'gram', 'grams', 'gramme', 'grammes'].map((u) => [u, 1]),
    ),
    ...Object.fromEntries(
      ['kg', 'kgs', 'kilo', 'kilos', 'kilogram', 'kilograms'].map((u) => [u, 1000]),
    ),
    ...Object.fromEntries(['lb', 'lbs', 'pound', 'pounds'].map((u) => [u, 453.59237])),
    ...Object.fromEntries(['oz', 'ounce', 'ounces'].map((u) => [u, 453.59237 / 16])),
  },
  example: '1200 g or 1.2 kg',
  larger: 'kg',
};

const length: Quantity = {
  name: 'size',
  base: 'millimetres',
  units: {
    ...Object.fromEntries(
      ['mm', 'millimetre', 'millimetres', 'millimeter', 'millimeters'].map((u) => [u, 1]),
    ),
    ...Object.fromEntries(
      ['cm', 'centimetre', 'centimetres', 'centimeter', 'centimeters'].map((u) => [u, 10]),
    ),
    ...Object.fromEntries(['m', 'metre', 'metres', 'meter', 'meters'].map((u) => [u, 1000])),
    ...Object.fromEntries(['in', 'inch', 'inches', '"', '”'].map((u) => [u, 25.4])),
  },
  example: '140 mm or 14 cm',
  larger: 'cm',
};

/**
 * A measurement as people write it ("1.2 kg", "14cm", "1 250 g"), in whole stored units.
 * A figure without a unit is in the stored unit and must be whole, since "1.5" in a weight column
 * is more likely kilograms than a gram and a half; with a unit it is converted and rounded.
 */
function measure(text: string, q: Quantity): Measured {
  const written = text.trim();
  const match = /^([\d.,\s\u00a0\u202f'’]*\d)\s*([^\d\s.,]*)\.?$/.exec(written);
  const unit = match?.[2]?.toLowerCase() ?? '';
  const factor = unit === '' ? 1 : q.units[unit];
  if (!match || factor === undefined) {
    return {
      ok: false,
      message: `Enter the ${q.name} as a number with its unit, such as ${q.example}, not “${written}”.`,
    };
  }
  const figure = readWrittenDecimal(match[1]!);
  if (figure.kind === 'invalid') {
    return {
      ok: false,
      message: `Enter the ${q.name} as a number such as ${q.example}, not “${written}”.`,
    };
  }
  if (figure.kind === 'ambiguous') {
    return {
      ok: false,
      message: `“${written}” could be ${figure.grouped} or ${figure.decimal}: write the ${q.name} with a decimal point and no thousands separator.`,
    };
  }
  const { whole, fraction } = figure;
  if (unit === '' && /[1-9]/.test(fraction)) {
    return {
      ok: false,
      message: `“${written}” has no unit: write ${whole}.${fraction} ${q.larger}, or the ${q.name} in whole ${q.base}.`,
    };
  }
  // Digits times the factor, then the decimal places taken off: exact for the metric units.
  const value = (Number(whole + fraction) * factor) / 10 ** fraction.length;
  return { ok: true, value: Math.round(value) };
}

/** A weight in whole grams: "1.2 kg", "1200 g", "1200", "2 lb". */
export function parseWeightGrams(text: string): Measured {
  return measure(text, weight);
}

/** A length in whole millimetres: "14 cm", "140 mm", "140", "5.5 in". */
export function parseLengthMm(text: string): Measured {
  return measure(text, length);
}

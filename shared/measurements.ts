/**
 * Sizes and weights as people say them ("1.2 kg", "1200 g", "14 cm", "140 mm", or a bare number
 * in the field's own unit), read exactly into whole grams and millimetres. The work schema judges
 * stored numbers through these same readers, so the form, the import and the server all word a
 * problem alike.
 */
import { readWrittenDecimal } from './format/written-decimal';

type MeasurementResult = { ok: true; value: number } | { ok: false; message: string };

type Scale = {
  /** "weight", "size" */
  name: string;
  /** The base unit's power of ten for each word a person may write after the number. */
  units: Record<string, number>;
  max: number;
  messages: { unreadable: string; tooFine: string; tooSmall: string; tooLarge: string };
};

const weight: Scale = {
  name: 'weight',
  units: {
    '': 0,
    g: 0,
    gram: 0,
    grams: 0,
    gramme: 0,
    grammes: 0,
    kg: 3,
    kgs: 3,
    kilo: 3,
    kilos: 3,
    kilogram: 3,
    kilograms: 3,
    kilogramme: 3,
    kilogrammes: 3,
  },
  max: 2_000_000,
  messages: {
    unreadable: 'Enter the weight in grams or kilograms, such as 850 g or 1.2 kg.',
    tooFine: 'Enter the weight to the nearest gram, such as 850 g or 1.25 kg.',
    tooSmall: 'The weight must be at least 1 g.',
    tooLarge: 'The weight must be at most 2,000 kg.',
  },
};

const length: Scale = {
  name: 'size',
  units: {
    '': 0,
    mm: 0,
    millimetre: 0,
    millimetres: 0,
    millimeter: 0,
    millimeters: 0,
    cm: 1,
    centimetre: 1,
    centimetres: 1,
    centimeter: 1,
    centimeters: 1,
    m: 3,
    metre: 3,
    metres: 3,
    meter: 3,
    meters: 3,
  },
  max: 10_000,
  messages: {
    unreadable: 'Enter the size in millimetres or centimetres, such as 140 mm or 14 cm.',
    tooFine: 'Enter the size to the nearest millimetre, such as 142 mm or 14.2 cm.',
    tooSmall: 'The size must be at least 1 mm.',
    tooLarge: 'The size must be at most 10,000 mm (10 m).',
  },
};

/** A sign, a number written either way (shared/format/written-decimal.ts), then a unit word. */
const pattern = /^([-+]?)\s*(\.?\d[\d.,\s\u00a0\u202f'’]*?)\s*([a-z]*)\.?$/;

function read(text: string, scale: Scale): MeasurementResult {
  const { messages } = scale;
  const written = text.trim();
  const match = pattern.exec(written.toLowerCase());
  if (match === null) return { ok: false, message: messages.unreadable };
  const [, sign = '', number = '', unit = ''] = match;
  const power = scale.units[unit];
  const figure = readWrittenDecimal(number.startsWith('.') ? `0${number}` : number);
  if (power === undefined || figure.kind === 'invalid') {
    return { ok: false, message: messages.unreadable };
  }
  if (figure.kind === 'ambiguous') {
    return {
      ok: false,
      message: `“${written}” could be ${figure.grouped} or ${figure.decimal}: write the ${scale.name} with a decimal point and no thousands separator.`,
    };
  }
  const { whole, fraction } = figure;
  const digits = `${whole}${fraction}`;
  // Exact decimal arithmetic: the digits shifted by the unit's power, never through a float.
  const shift = power - fraction.length;
  const kept = shift >= 0 ? `${digits}${'0'.repeat(shift)}` : digits.slice(0, shift);
  const dropped = shift >= 0 ? '' : digits.slice(shift);
  if (/[1-9]/.test(dropped)) return { ok: false, message: messages.tooFine };
  const significant = kept.replace(/^0+/, '');
  if (significant === '' || sign === '-') return { ok: false, message: messages.tooSmall };
  if (significant.length > String(scale.max).length) {
    return { ok: false, message: messages.tooLarge };
  }
  const value = Number(significant);
  if (value > scale.max) return { ok: false, message: messages.tooLarge };
  return { ok: true, value };
}

/** A weight as typed, in whole grams; a bare number is grams. */
export function parseWeightGrams(text: string): MeasurementResult {
  return read(text, weight);
}

/** A height, width or depth as typed, in whole millimetres; a bare number is millimetres. */
export function parseLengthMm(text: string): MeasurementResult {
  return read(text, length);
}

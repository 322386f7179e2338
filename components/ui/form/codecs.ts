import { parseLengthMm, parseWeightGrams } from '@/shared/measurements';
import { minorUnitOf, type Money } from '@/shared/schemas/money';

import { type Parsed, parseMoneyText, parsePercentText, wholeNumberValue } from '../decimal-text';

/**
 * How one form field's value (text as typed, or a choice) is read into a value of the request
 * body. A blank field reads as 'empty', and the field's binding says what blank means.
 */
export type Codec<FieldValue, BodyValue> = (value: FieldValue) => Parsed<BodyValue>;

const ok = <T>(value: T): Parsed<T> => ({ kind: 'ok', value });

/** Text as typed; the shared schema trims it and judges it. */
export const textCodec: Codec<string, string> = (text) =>
  text.trim() === '' ? { kind: 'empty' } : ok(text);

/**
 * A whole number as typed. Text that is not a number becomes NaN, so the shared schema says what
 * is wrong in its own words ("Enter the year as a number.").
 */
export const numberCodec: Codec<string, number> = (text) => {
  const value = wholeNumberValue(text);
  return value === null ? { kind: 'empty' } : ok(value);
};

/** A reader of a measurement as typed, as a codec: blank is empty, the reader's words otherwise. */
function measurementCodec(read: typeof parseWeightGrams): Codec<string, number> {
  return (text) => {
    if (text.trim() === '') return { kind: 'empty' };
    const result = read(text);
    return result.ok ? ok(result.value) : { kind: 'invalid', message: result.message };
  };
}

/** A weight as people say it ("1.2 kg", "850 g"; a bare number is grams), in whole grams. */
export const weightCodec = measurementCodec(parseWeightGrams);

/** A height, width or depth as people say it ("14 cm", "140 mm"; bare is mm), in whole mm. */
export const lengthCodec = measurementCodec(parseLengthMm);

/** An amount typed in major units ("45.50", "£1,250"), read exactly into minor units. */
export function moneyCodec(currency: string): Codec<string, Money> {
  return (text) => (isCurrency(currency) ? parseMoneyText(text, currency) : { kind: 'empty' });
}

function isCurrency(code: string): boolean {
  try {
    minorUnitOf(code);
    return true;
  } catch {
    return false;
  }
}

/** A percentage typed ("40", "17.5") as basis points, exactly. */
export const percentCodec: Codec<string, number> = parsePercentText;

/** A calendar date written YYYY-MM-DD (what a date input gives); the schema checks it is real. */
export const dateCodec: Codec<string, string> = textCodec;

/** One of a few values, kept as chosen. */
export const choiceCodec = <T extends string>(value: T): Parsed<T> => ok(value);

/** Yes or no, chosen from two buttons, as a boolean. */
export const yesNoCodec: Codec<'yes' | 'no', boolean> = (value) => ok(value === 'yes');

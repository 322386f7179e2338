import { toDecimalString } from '@/shared/money/format';
import { parseDecimalAmount } from '@/shared/money/parse';
import { minorUnitOf, type Money } from '@/shared/schemas/money';

import { currencySymbol } from './format';

export type Parsed<T> =
  { kind: 'empty' } | { kind: 'ok'; value: T } | { kind: 'invalid'; message: string };

/**
 * Digits of a decimal string scaled by 10^places as an exact integer, or null when the text has
 * more decimal places than allowed or is not a plain number. Never goes through floating point:
 * "12.34" at 2 places is "12" and "34" joined, 1234.
 */
function scaleDecimal(text: string, places: number): number | null {
  const match = /^(\d*)(?:\.(\d*))?$/.exec(text);
  if (match === null) return null;
  const whole = match[1] ?? '';
  const fraction = match[2] ?? '';
  if (whole === '' && fraction === '') return null;
  if (fraction.length > places) return null;
  const digits = `${whole}${fraction.padEnd(places, '0')}`.replace(/^0+(?=\d)/, '');
  if (digits.length > 15) return null;
  return Number(digits);
}

function majorName(currency: string): string {
  if (currency === 'GBP') return 'pounds and pence';
  const places = minorUnitOf(currency);
  if (places === 0) return `whole ${currency}, without decimals`;
  return `${currency} with up to ${places} decimals`;
}

/**
 * What a person typed as an amount ("45", "45.5", "£1,250.00") in exact minor units of the
 * currency, by the shared money parser; what it cannot read is refused in plain words.
 */
export function parseMoneyText(text: string, currency: string): Parsed<Money> {
  let cleaned = text.trim();
  if (cleaned === '') return { kind: 'empty' };
  for (const symbol of [currencySymbol(currency), currency]) cleaned = cleaned.replace(symbol, '');
  cleaned = cleaned.trim();
  const places = minorUnitOf(currency);
  const example = places === 0 ? '45' : `45 or 45.${'5'.padEnd(places, '0')}`;
  if (cleaned.startsWith('-')) return { kind: 'invalid', message: 'A price cannot be below zero.' };
  const amount = parseDecimalAmount(cleaned, currency);
  if (amount !== null) return { kind: 'ok', value: { amount, currency } };
  const tooPrecise = new RegExp(`^[\\d,]*\\.\\d{${places + 1},}$`).test(cleaned);
  return {
    kind: 'invalid',
    message: tooPrecise
      ? `Enter at most ${places} decimal places (${majorName(currency)}).`
      : `Enter the amount as a number, such as ${example}.`,
  };
}

/** An amount as the text a money field starts from: "45.00"; blank for none. */
export function moneyText(money: Money | null | undefined): string {
  return money ? toDecimalString(money) : '';
}

/** A percentage as typed ("40", "17.5", "12.25") in basis points, exactly. */
export function parsePercentText(text: string): Parsed<number> {
  const cleaned = text.trim().replace(/%$/, '').trim();
  if (cleaned === '') return { kind: 'empty' };
  if (cleaned.startsWith('-'))
    return { kind: 'invalid', message: 'A percentage cannot be below 0.' };
  const bp = scaleDecimal(cleaned, 2);
  if (bp === null) {
    return { kind: 'invalid', message: 'Enter a percentage such as 40 or 17.5.' };
  }
  if (bp > 10000) return { kind: 'invalid', message: 'A percentage cannot be above 100.' };
  return { kind: 'ok', value: bp };
}

/** Basis points as the percentage text a field shows: 4000 → "40", 1750 → "17.5". */
export function percentText(bp: number): string {
  const whole = Math.trunc(bp / 100);
  const rest = String(bp % 100)
    .padStart(2, '0')
    .replace(/0+$/, '');
  return rest === '' ? String(whole) : `${whole}.${rest}`;
}

/**
 * A whole number as typed; blank is none. Not-a-number text becomes NaN so the shared schema
 * says what is wrong in its own words.
 */
export function wholeNumberValue(text: string): number | null {
  const cleaned = text.trim().replace(/,/g, '');
  if (cleaned === '') return null;
  return /^-?\d+(\.\d+)?$/.test(cleaned) ? Number(cleaned) : Number.NaN;
}

export function numberText(value: number | null | undefined): string {
  return value === null || value === undefined ? '' : String(value);
}

import { MAX_MONEY_AMOUNT, minorUnitOf } from '../schemas/money';

const decimal = /^(\d{1,3}(?:,\d{3})+|\d+)(?:\.(\d*))?$/;

/**
 * An amount written in major units, as a spreadsheet holds it ("12.50", "1,250", "£8"), as whole
 * minor units of the currency (ISO 4217 minor unit), built from the digits, never through
 * floating point. Null when the text is not such an amount or has more decimals than the currency.
 */
export function parseDecimalAmount(text: string, currency: string): number | null {
  const digits = minorUnitOf(currency);
  const trimmed = text.trim().replace(/^[£$€¥]\s*/, '');
  const match = decimal.exec(trimmed);
  if (!match) return null;
  const whole = match[1]!.replace(/,/g, '');
  const fraction = match[2] ?? '';
  if (fraction.length > digits) return null;
  const amount = Number(whole + fraction.padEnd(digits, '0'));
  return Number.isSafeInteger(amount) && amount <= MAX_MONEY_AMOUNT ? amount : null;
}

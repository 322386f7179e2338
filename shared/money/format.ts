import { minorUnitOf, type Money } from '../schemas/money';

/**
 * An amount as a plain decimal in its currency's minor unit ("1234.50", JPY "1234", BHD "1.234"),
 * built from the integer's digits, never through floating point (ISO 4217 minor units).
 */
export function toDecimalString(money: Money): string {
  const digits = minorUnitOf(money.currency);
  const sign = money.amount < 0 ? '-' : '';
  const whole = String(Math.abs(money.amount));
  if (digits === 0) return sign + whole;
  const padded = whole.padStart(digits + 1, '0');
  return `${sign}${padded.slice(0, -digits)}.${padded.slice(-digits)}`;
}

const formatters = new Map<string, Intl.NumberFormat>();

/**
 * An amount for people, by the locale's conventions (Intl.NumberFormat, the reference named in
 * docs/money-rules.md), always showing the ISO 4217 minor unit: £1,234.50, €1.234,50 in de-DE, ¥1,234.
 */
export function formatMoney(money: Money, locale = 'en-GB'): string {
  const key = `${locale}|${money.currency}`;
  let formatter = formatters.get(key);
  if (formatter === undefined) {
    const digits = minorUnitOf(money.currency);
    formatter = new Intl.NumberFormat(locale, {
      style: 'currency',
      currency: money.currency,
      minimumFractionDigits: digits,
      maximumFractionDigits: digits,
    });
    formatters.set(key, formatter);
  }
  // A decimal string keeps every digit exact; a number would pass through floating point.
  return formatter.format(toDecimalString(money) as Intl.StringNumericLiteral);
}

import { readWrittenDecimal } from '../format/written-decimal';
import { MAX_MONEY_AMOUNT, minorUnitOf, type Money } from '../schemas/money';

type ReadAmount = { ok: true; value: Money } | { ok: false; message: string };

const symbols = /^[£€$¥]$/;

/** The sign the currency is written with in English, narrowly: "£", "€", "$" (USD, CAD, AUD…). */
function narrowSymbol(currency: string): string {
  const parts = new Intl.NumberFormat('en', {
    style: 'currency',
    currency,
    currencyDisplay: 'narrowSymbol',
  }).formatToParts(1);
  return parts.find((p) => p.type === 'currency')?.value ?? currency;
}

/** Splits off a currency sign or ISO 4217 code written before or after the figure. */
function splitCurrency(text: string): { sign: string | null; figure: string } {
  const before = /^([£€$¥]|[A-Za-z]{3})\s*(\d.*)$/.exec(text);
  if (before) return { sign: before[1]!, figure: before[2]! };
  const after = /^(.*\d)\s*([£€$¥]|[A-Za-z]{3})$/.exec(text);
  if (after) return { sign: after[2]!, figure: after[1]! };
  return { sign: null, figure: text };
}

/**
 * An amount as a spreadsheet cell holds it, in major units of the currency: "85", "£85.00",
 * "1,250.00", "12,50", "1.250,00 €". A sign or code of another currency is refused rather than
 * relabelled, and a figure either decimal convention could mean ("1,250") is refused with both
 * readings, never guessed. Exact minor units, never through floating point.
 */
export function readWrittenAmount(text: string, currency: string): ReadAmount {
  const written = text.trim();
  const { sign, figure } = splitCurrency(written);
  if (sign !== null) {
    const theirs = symbols.test(sign) ? sign : sign.toUpperCase();
    if (theirs !== currency && theirs !== narrowSymbol(currency)) {
      return {
        ok: false,
        message: `“${written}” is in ${theirs}; the studio’s works are in ${currency}. Convert the price, or leave the row out.`,
      };
    }
  }
  const read = readWrittenDecimal(figure);
  if (read.kind === 'ambiguous') {
    return {
      ok: false,
      message: `“${written}” could be ${read.grouped} or ${read.decimal}: write the price with a decimal point and no thousands separator, such as ${read.grouped}.00 or ${read.decimal}.`,
    };
  }
  const digits = minorUnitOf(currency);
  if (read.kind === 'invalid' || read.fraction.length > digits) {
    const decimals =
      digits === 0 ? 'a whole number' : `a number such as 12.${'5'.padEnd(digits, '0')}`;
    return {
      ok: false,
      message: `Enter the price in ${currency} as ${decimals}, not “${written}”.`,
    };
  }
  const amount = Number(read.whole + read.fraction.padEnd(digits, '0'));
  if (!Number.isSafeInteger(amount) || amount > MAX_MONEY_AMOUNT) {
    return { ok: false, message: `The price “${written}” is more than Saggar can hold.` };
  }
  return { ok: true, value: { amount, currency } };
}

import { type Dinero, dinero, halfUp, toSnapshot, transformScale } from 'dinero.js';
import * as bundledCurrencies from 'dinero.js/currencies';
import { z } from 'zod';

/** The currency data dinero.js carries (ISO 4217: code, base, exponent). */
export type Currency = (typeof bundledCurrencies)[keyof typeof bundledCurrencies];

/**
 * Currencies the product accepts: ISO 4217 codes dinero.js knows with a decimal minor unit. Two
 * (MGA, MRU) are modelled by dinero.js in fifths, which ISO 4217's minor unit does not describe.
 */
const currencyByCode: ReadonlyMap<string, Currency> = new Map(
  Object.values(bundledCurrencies)
    .filter((currency) => currency.base === 10)
    .map((currency) => [currency.code, currency]),
);

export const currencyCodes: readonly string[] = [...currencyByCode.keys()].sort();

export function isCurrencyCode(code: string): boolean {
  return currencyByCode.has(code);
}

/** The dinero.js currency for an ISO 4217 code; throws on a code the product does not accept. */
export function currencyFor(code: string): Currency {
  const currency = currencyByCode.get(code);
  if (currency === undefined) throw new RangeError(`Unknown currency code: ${code}`);
  return currency;
}

/** Digits after the decimal point for a currency (ISO 4217 minor unit: GBP 2, JPY 0, BHD 3). */
export function minorUnitOf(code: string): number {
  return currencyFor(code).exponent;
}

/**
 * Largest amount, in minor units, the engine accepts. Rates are applied as amount × basis points,
 * so this keeps every product well inside the range where integers are exact (2^53).
 */
export const MAX_MONEY_AMOUNT = 100_000_000_000;

export const currencyCodeSchema = z
  .string({ error: 'Enter a currency code such as GBP.' })
  .refine(isCurrencyCode, { error: 'Use a three-letter ISO 4217 currency code such as GBP.' });

function amountSchema(min: number, belowMinMessage: string) {
  return z
    .number({ error: 'Enter the amount as a whole number of minor units (pence for GBP).' })
    .int({ error: 'Enter the amount as a whole number of minor units (pence for GBP).' })
    .min(min, { error: belowMinMessage })
    .max(MAX_MONEY_AMOUNT, { error: 'That amount is too large for the product to handle.' });
}

/** Money as JSON: an integer amount in the currency's minor unit, and its ISO 4217 code. */
export const moneySchema = z.strictObject({
  amount: amountSchema(-MAX_MONEY_AMOUNT, 'That amount is too large for the product to handle.'),
  currency: currencyCodeSchema,
});
export type Money = z.infer<typeof moneySchema>;

/** A price: money that cannot be below zero. */
export const priceSchema = z.strictObject({
  amount: amountSchema(0, 'A price cannot be below zero.'),
  currency: currencyCodeSchema,
});

/** An amount that must be above zero, such as a wanted net or a price step. */
export const positiveMoneySchema = z.strictObject({
  amount: amountSchema(1, 'Enter an amount above zero.'),
  currency: currencyCodeSchema,
});

/** A dinero.js value for a money object, at the currency's own scale. */
export function toDinero(money: Money): Dinero<number> {
  return dinero({ amount: money.amount, currency: currencyFor(money.currency) });
}

/**
 * A money object from a dinero.js value. A value at a finer scale (after a multiplication) is
 * brought back to the currency's minor unit half-up, the rounding HMRC VATREC12030 describes;
 * dinero.js would otherwise round down.
 */
export function fromDinero(value: Dinero<number>): Money {
  const { currency } = toSnapshot(value);
  const scaled = toSnapshot(transformScale(value, currency.exponent, halfUp));
  return { amount: scaled.amount, currency: currency.code };
}

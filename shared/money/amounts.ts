import { currencyFor, MAX_MONEY_AMOUNT, type Money } from '../schemas/money';
import { MoneyRuleError } from './errors';

/** A money object in a currency's minor unit (ISO 4217: pence for GBP, yen for JPY). */
export function money(amount: number, currency: string): Money {
  currencyFor(currency);
  assertAmount(amount, -MAX_MONEY_AMOUNT);
  return { amount, currency };
}

/** Refuses an amount that is not a whole number of minor units within the product's range. */
export function assertAmount(amount: number, min = 0): void {
  if (!Number.isSafeInteger(amount) || amount < min || amount > MAX_MONEY_AMOUNT) {
    throw new MoneyRuleError(
      'invalid-amount',
      min >= 0
        ? 'Enter the amount as a whole number of minor units, not below zero.'
        : 'Enter the amount as a whole number of minor units.',
    );
  }
}

/** Refuses money in another currency: amounts in different currencies never add up. */
export function assertCurrency(value: Money, currency: string): void {
  if (value.currency !== currency) {
    throw new MoneyRuleError(
      'currency-mismatch',
      `An amount in ${value.currency} cannot be used with ${currency} amounts.`,
    );
  }
}

/**
 * The exact sum of amounts in one currency: totals are worked out, never copied (a published
 * example once added £75 + £37.50 to £115.50). Refused outside the range where integers are exact.
 */
export function sumMoney(values: readonly Money[], currency: string): Money {
  let total = 0;
  for (const value of values) {
    assertCurrency(value, currency);
    total += value.amount;
  }
  if (!Number.isSafeInteger(total)) {
    throw new MoneyRuleError(
      'invalid-amount',
      'That total is too large for the product to handle.',
    );
  }
  return { amount: total, currency };
}

/** a − b, exactly, in one currency. */
export function subtractMoney(a: Money, b: Money): Money {
  assertCurrency(b, a.currency);
  return { amount: a.amount - b.amount, currency: a.currency };
}

import { dinero, multiply } from 'dinero.js';
import { GBP } from 'dinero.js/currencies';
import * as fc from 'fast-check';

import {
  fromDinero,
  moneySchema,
  positiveMoneySchema,
  priceSchema,
  toDinero,
} from '@/shared/schemas/money';

import { currencyArb, RUNS } from '../money/arbitraries';

const messages = (result: { success: boolean; error?: { issues: { message: string }[] } }) =>
  result.error?.issues.map((issue) => issue.message);

describe('moneySchema', () => {
  it('accepts an integer amount of minor units in an ISO 4217 currency', () => {
    expect(moneySchema.parse({ amount: 12345, currency: 'GBP' })).toEqual({
      amount: 12345,
      currency: 'GBP',
    });
    expect(moneySchema.safeParse({ amount: -5, currency: 'JPY' }).success).toBe(true);
  });

  it('says what is wrong in plain words', () => {
    expect(messages(moneySchema.safeParse({ amount: 12.5, currency: 'GBP' }))).toEqual([
      'Enter the amount as a whole number of minor units (pence for GBP).',
    ]);
    expect(messages(moneySchema.safeParse({ amount: 1, currency: 'XYZ' }))).toEqual([
      'Use a three-letter ISO 4217 currency code such as GBP.',
    ]);
    expect(messages(priceSchema.safeParse({ amount: -1, currency: 'GBP' }))).toEqual([
      'A price cannot be below zero.',
    ]);
    expect(messages(positiveMoneySchema.safeParse({ amount: 0, currency: 'GBP' }))).toEqual([
      'Enter an amount above zero.',
    ]);
    expect(moneySchema.safeParse({ amount: 1, currency: 'GBP', scale: 2 }).success).toBe(false);
  });
});

describe('dinero.js conversions', () => {
  it('round-trips any amount in any accepted currency', () => {
    fc.assert(
      fc.property(currencyArb, fc.integer({ min: -1e11, max: 1e11 }), (currency, amount) => {
        expect(fromDinero(toDinero({ amount, currency }))).toEqual({ amount, currency });
      }),
      RUNS,
    );
  });

  it('brings a finer scale back half-up (VATREC12030), where dinero.js alone rounds down', () => {
    // 5p × 0.5 = 2.5p → 3p.
    const half = multiply(dinero({ amount: 5, currency: GBP }), { amount: 5, scale: 1 });
    expect(fromDinero(half)).toEqual({ amount: 3, currency: 'GBP' });
  });
});

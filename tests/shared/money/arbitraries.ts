import * as fc from 'fast-check';

import { currencyCodes, type Money } from '@/shared/schemas/money';
import {
  commissionVatModes,
  discountRules,
  insurers,
  paymentTermsStarts,
  type Terms,
  venueRoles,
} from '@/shared/schemas/terms';

/** Enough runs for rare rounding cases to turn up. */
export const RUNS = { numRuns: 10000 } as const;

export const currencyArb = fc.constantFrom(...currencyCodes);

/** Rates as terms use them: the usual ones often, any basis point sometimes. */
export const rateArb = fc.oneof(
  fc.constantFrom(0, 500, 1500, 1750, 2000, 3000, 4000, 5000, 6000, 10000),
  fc.integer({ min: 0, max: 10000 }),
);

/** Amounts from a few minor units to the engine's limit, small ones most often. */
export const amountArb = fc.oneof(
  fc.integer({ min: 0, max: 200 }),
  fc.integer({ min: 0, max: 1_000_000 }),
  fc.integer({ min: 0, max: 100_000_000_000 }),
);

export function termsArb(currency: string): fc.Arbitrary<Terms> {
  return fc
    .record({
      commissionRateBp: rateArb,
      vatRateBp: rateArb,
      venueRole: fc.constantFrom(...venueRoles),
      commissionVat: fc.constantFrom(...commissionVatModes),
      makerVatRegistered: fc.boolean(),
      discountRule: fc.constantFrom(...discountRules),
      insuranceBasis: fc.constantFrom('maker-net', 'retail', 'agreed'),
      agreed: amountArb,
      insuredBy: fc.constantFrom(...insurers),
      insuredInTransitBy: fc.constantFrom(...insurers),
      days: fc.integer({ min: 0, max: 365 }),
      from: fc.constantFrom(...paymentTermsStarts),
    })
    .map(({ agreed, days, from, ...rest }) => ({
      ...rest,
      currency,
      ...(rest.insuranceBasis === 'agreed'
        ? { agreedInsuranceValue: { amount: agreed, currency } }
        : {}),
      paymentTerms: { days, from },
    }));
}

/** Terms in any accepted currency with a list price and a sale price at or below it. */
export const saleArb = currencyArb
  .chain((currency) =>
    fc.record({
      terms: termsArb(currency),
      listPrice: amountArb.map((amount): Money => ({ amount, currency })),
      discountBp: fc.oneof(fc.constant(0), fc.integer({ min: 0, max: 10000 })),
    }),
  )
  .map(({ terms, listPrice, discountBp }) => ({
    terms,
    listPrice,
    // A sale price derived from the list price by a discount, so it never exceeds it.
    salePrice: {
      amount: listPrice.amount - Math.floor((listPrice.amount * discountBp) / 10000),
      currency: listPrice.currency,
    },
  }));

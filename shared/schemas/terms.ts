import { z } from 'zod';

import { currencyCodeSchema, moneySchema, positiveMoneySchema, priceSchema } from './money';

export const venueRoles = ['agent', 'sale-or-return'] as const;
export const venueRoleSchema = z.enum(venueRoles, {
  error: 'Choose whether the venue sells as your agent or buys on sale or return.',
});
export type VenueRole = z.infer<typeof venueRoleSchema>;

/** `none`: venue not VAT-registered; `added`: VAT on top of the commission; `included`: within it. */
export const commissionVatModes = ['none', 'added', 'included'] as const;
export const commissionVatSchema = z.enum(commissionVatModes, {
  error: 'Choose whether VAT on commission is none, added on top, or included in the rate.',
});
export type CommissionVat = z.infer<typeof commissionVatSchema>;

/** Who bears a discount: both (commission on the actual price), the venue, or the maker. */
export const discountRules = ['shared', 'venue', 'maker'] as const;
export const discountRuleSchema = z.enum(discountRules, {
  error: 'Choose who bears a discount: shared, the venue or the maker.',
});
export type DiscountRule = z.infer<typeof discountRuleSchema>;

export const insuranceBases = ['maker-net', 'retail', 'agreed'] as const;
export const insuranceBasisSchema = z.enum(insuranceBases, {
  error: 'Choose the insurance basis: maker’s net, retail, or an agreed value.',
});
export type InsuranceBasis = z.infer<typeof insuranceBasisSchema>;

export const insurers = ['venue', 'maker'] as const;
export const insurerSchema = z.enum(insurers, {
  error: 'Choose who insures the work: the venue or the maker.',
});
export type Insurer = z.infer<typeof insurerSchema>;

export const paymentTermsStarts = ['sale', 'month-end', 'closing'] as const;
export const paymentTermsSchema = z.strictObject({
  days: z
    .number({ error: 'Enter the number of days for payment.' })
    .int({ error: 'Enter the payment days as a whole number.' })
    .min(0, { error: 'Payment days cannot be below zero.' })
    .max(365, { error: 'Payment days cannot be more than 365.' }),
  from: z.enum(paymentTermsStarts, {
    error: 'Choose when the days count from: the sale, the end of the month, or the closing.',
  }),
});
export type PaymentTerms = z.infer<typeof paymentTermsSchema>;

function rateBpSchema(what: string) {
  return z
    .number({ error: `Enter the ${what} in basis points (4000 is 40%).` })
    .int({ error: `Enter the ${what} as a whole number of basis points (4000 is 40%).` })
    .min(0, { error: `The ${what} cannot be below 0%.` })
    .max(10000, { error: `The ${what} cannot be above 100%.` });
}

/** The terms agreed with a venue, copied onto each consignment (docs/money-rules.md, "Terms"). */
export const termsSchema = z
  .strictObject({
    currency: currencyCodeSchema,
    commissionRateBp: rateBpSchema('commission rate'),
    vatRateBp: rateBpSchema('VAT rate'),
    venueRole: venueRoleSchema,
    commissionVat: commissionVatSchema,
    makerVatRegistered: z.boolean({ error: 'Say whether the maker is VAT-registered.' }),
    discountRule: discountRuleSchema,
    insuranceBasis: insuranceBasisSchema,
    agreedInsuranceValue: priceSchema.optional(),
    /** Who insures the work on the venue's premises. */
    insuredBy: insurerSchema,
    /** Who insures it in transit, both ways; venues often cover their premises only. */
    insuredInTransitBy: insurerSchema.default('maker'),
    paymentTerms: paymentTermsSchema,
  })
  .superRefine((terms, ctx) => {
    const agreed = terms.agreedInsuranceValue;
    if (terms.insuranceBasis === 'agreed' && agreed === undefined) {
      ctx.addIssue({
        code: 'custom',
        path: ['agreedInsuranceValue'],
        message: 'Enter the agreed insurance value.',
      });
    }
    if (agreed !== undefined && agreed.currency !== terms.currency) {
      ctx.addIssue({
        code: 'custom',
        path: ['agreedInsuranceValue', 'currency'],
        message: `The agreed insurance value must be in ${terms.currency}, the terms’ currency.`,
      });
    }
  });
export type Terms = z.infer<typeof termsSchema>;

/** Where a venue form starts: the usual UK craft-shop terms (docs/money-rules.md; common practice). */
export const defaultTerms: Readonly<Terms> = Object.freeze({
  currency: 'GBP',
  commissionRateBp: 4000,
  vatRateBp: 2000,
  venueRole: 'agent',
  commissionVat: 'none',
  makerVatRegistered: false,
  discountRule: 'shared',
  insuranceBasis: 'maker-net',
  insuredBy: 'venue',
  insuredInTransitBy: 'maker',
  paymentTerms: Object.freeze({ days: 30, from: 'month-end' }),
} as const);

function sameCurrency(
  ctx: z.RefinementCtx,
  currency: string,
  fields: Record<string, { currency: string }>,
) {
  for (const [field, money] of Object.entries(fields)) {
    if (money.currency !== currency) {
      ctx.addIssue({
        code: 'custom',
        path: [field, 'currency'],
        message: `Enter this amount in ${currency}, the terms’ currency.`,
      });
    }
  }
}

/** `POST /api/quotes/split`: the split of one sale under some terms. */
export const splitQuoteRequestSchema = z
  .strictObject({ terms: termsSchema, listPrice: priceSchema, salePrice: priceSchema })
  .superRefine((request, ctx) => {
    const { terms, listPrice, salePrice } = request;
    sameCurrency(ctx, terms.currency, { listPrice, salePrice });
    if (salePrice.amount > listPrice.amount) {
      ctx.addIssue({
        code: 'custom',
        path: ['salePrice', 'amount'],
        message: 'The sale price cannot be above the list price.',
      });
    }
  });
export type SplitQuoteRequest = z.infer<typeof splitQuoteRequestSchema>;

/**
 * One sale's split. With `included` VAT on commission, `commission` is the VAT-inclusive figure
 * and `vatOnCommission` the part of it that is VAT; with `added`, the VAT is on top.
 */
export const saleSplitSchema = z.object({
  commission: moneySchema,
  vatOnCommission: moneySchema,
  makerShare: moneySchema,
  makerOutputVat: moneySchema,
  makerReclaimableVat: moneySchema,
  insuranceValue: moneySchema,
});
export type SaleSplit = z.infer<typeof saleSplitSchema>;
export const splitQuoteResponseSchema = saleSplitSchema;

/** `POST /api/quotes/price-plan`: the list price that nets the maker at least `wantedNet`. */
export const pricePlanRequestSchema = z
  .strictObject({ terms: termsSchema, wantedNet: positiveMoneySchema, step: positiveMoneySchema })
  .superRefine((request, ctx) => {
    const { terms, wantedNet, step } = request;
    sameCurrency(ctx, terms.currency, { wantedNet, step });
  });
export type PricePlanRequest = z.infer<typeof pricePlanRequestSchema>;

export const pricePlanResponseSchema = z.object({
  listPrice: moneySchema,
  split: saleSplitSchema,
});
export type PricePlanResponse = z.infer<typeof pricePlanResponseSchema>;

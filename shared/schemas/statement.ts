import { z } from 'zod';

import { isoDateSchema } from './dates';
import { moneySchema, positiveMoneySchema } from './money';
import { termsSchema } from './terms';
import { optionalText } from './text';

const id = (what: string) =>
  z
    .number({ error: `Choose the ${what}.` })
    .int()
    .positive({ error: `Choose the ${what}.` });

/**
 * `POST /api/statements`: for one consignment, or for a venue and a period (stock that stays out
 * from show to show). Either way it starts as a draft whose figures follow the sales.
 */
export const statementCreateSchema = z.union(
  [
    z.strictObject({ consignmentId: id('consignment') }),
    z
      .strictObject({
        venueId: id('venue'),
        periodStart: isoDateSchema,
        periodEnd: isoDateSchema,
      })
      .refine((s) => s.periodStart <= s.periodEnd, {
        path: ['periodEnd'],
        error: 'The period cannot end before it starts.',
      }),
  ],
  { error: 'Give a consignment, or a venue and a period.' },
);
export type StatementCreate = z.input<typeof statementCreateSchema>;

export const statementStates = ['draft', 'issued', 'settled', 'void'] as const;
export const statementStateSchema = z.enum(statementStates);
export type StatementState = z.infer<typeof statementStateSchema>;

export const paymentMethods = ['bank-transfer', 'cheque', 'cash', 'online'] as const;
export const paymentMethodSchema = z.enum(paymentMethods, {
  error: 'Choose how it was paid: bank transfer, cheque, cash or online.',
});
export type PaymentMethod = z.infer<typeof paymentMethodSchema>;

/** `POST /api/statements/:id/payments`: a remittance received, recorded by hand. */
export const paymentCreateSchema = z.strictObject({
  amount: positiveMoneySchema,
  receivedOn: isoDateSchema,
  method: paymentMethodSchema,
  reference: optionalText('reference', 120),
});
export type PaymentCreate = z.input<typeof paymentCreateSchema>;

/** What can explain a difference between the balance owed and what the venue paid. */
export const adjustmentKinds = [
  'unreported-sale',
  'discount-not-agreed',
  'fee-deducted',
  'rounding',
  'other',
] as const;

/**
 * `POST /api/statements/:id/adjustments`: part of a difference, explained. `amount` is taken off the
 * balance owed (a fee the venue deducted); negative, it adds to it (a sale the venue did not report).
 */
export const adjustmentCreateSchema = z.strictObject({
  kind: z.enum(adjustmentKinds, { error: 'Choose what explains the difference.' }),
  amount: moneySchema.refine((m) => m.amount !== 0, { error: 'Enter an amount other than zero.' }),
  note: optionalText('note', 500, 'lines'),
});
export type AdjustmentCreate = z.input<typeof adjustmentCreateSchema>;

export const statementParamsSchema = z.strictObject({
  id: z.coerce.number({ error: 'The id must be a number.' }).int().positive(),
});

export const statementLineSchema = z.object({
  lineId: z.number().int(),
  consignmentId: z.number().int(),
  consignmentReference: z.string(),
  stockNumber: z.string(),
  title: z.string(),
  soldOn: isoDateSchema,
  salePrice: moneySchema,
  commission: moneySchema,
  vatOnCommission: moneySchema,
  makerShare: moneySchema,
});
export type StatementLine = z.infer<typeof statementLineSchema>;

export const statementTotalsSchema = z.object({
  sales: moneySchema,
  commission: moneySchema,
  vatOnCommission: moneySchema,
  makerShare: moneySchema,
  makerOutputVat: moneySchema,
  makerReclaimableVat: moneySchema,
});

export const statementPaymentSchema = z.object({
  id: z.number().int(),
  amount: moneySchema,
  receivedOn: isoDateSchema.nullable(),
  method: paymentMethodSchema,
  reference: z.string().nullable(),
});

export const statementAdjustmentSchema = z.object({
  id: z.number().int(),
  kind: z.enum(adjustmentKinds),
  amount: moneySchema,
  note: z.string().nullable(),
});

/** `GET /api/statements/:id` */
export const statementSchema = z.object({
  id: z.number().int(),
  reference: z.string(),
  state: statementStateSchema,
  currency: z.string(),
  venue: z.object({ id: z.number().int(), name: z.string() }),
  consignment: z
    .object({ id: z.number().int(), reference: z.string(), title: z.string() })
    .nullable(),
  periodStart: isoDateSchema,
  periodEnd: isoDateSchema,
  issuedAt: z.string().nullable(),
  /** When the balance falls due, from the payment terms; null with nothing sold. */
  dueDate: isoDateSchema.nullable(),
  terms: termsSchema,
  lines: z.array(statementLineSchema),
  totals: statementTotalsSchema,
  payments: z.array(statementPaymentSchema),
  adjustments: z.array(statementAdjustmentSchema),
  /** The payments received. */
  paid: moneySchema,
  /** The maker's share less the payments and the explained differences. */
  balance: moneySchema,
});
export type Statement = z.infer<typeof statementSchema>;

/** `GET /api/statements` */
export const statementListSchema = z.object({
  items: z.array(
    statementSchema
      .pick({
        id: true,
        reference: true,
        state: true,
        currency: true,
        venue: true,
        consignment: true,
        periodStart: true,
        periodEnd: true,
        issuedAt: true,
        dueDate: true,
        balance: true,
      })
      // The maker's share the statement covers.
      .extend({ owed: moneySchema }),
  ),
});
export type StatementList = z.infer<typeof statementListSchema>;

/**
 * `POST /api/statements/:id/checkout`: where to send the venue to pay the balance online, the
 * payment provider's hosted checkout page.
 */
export const checkoutSchema = z.object({ url: z.url() });
export type Checkout = z.infer<typeof checkoutSchema>;

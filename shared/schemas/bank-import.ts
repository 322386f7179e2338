import { z } from 'zod';

import { isoDateSchema } from './dates';
import { moneySchema } from './money';
import { lineText } from './text';

/** Which column of a bank's CSV holds what. A credit is a positive amount. */
export const bankColumnsSchema = z.strictObject({
  date: lineText('date column', 100).min(1, { error: 'Choose the column with the date.' }),
  amount: lineText('amount column', 100).min(1, { error: 'Choose the column with the amount.' }),
  reference: lineText('reference column', 100).min(1, {
    error: 'Choose the column with the reference or description.',
  }),
});
export type BankColumns = z.infer<typeof bankColumnsSchema>;

/**
 * `POST /api/bank-imports/matches`: a bank statement as CSV text, with its columns (remembered for
 * next time) or without (the last ones used, or found by their headings).
 */
export const bankMatchRequestSchema = z.strictObject({
  csv: z
    .string({ error: 'Choose the bank statement’s CSV file.' })
    .min(1, { error: 'The file is empty.' })
    .max(1_000_000, { error: 'A bank statement file can be up to 1 MB.' }),
  columns: bankColumnsSchema.optional(),
});
export type BankMatchRequest = z.input<typeof bankMatchRequestSchema>;

/** One credit of the bank statement, and the open statement it seems to pay. */
export const bankCreditSchema = z.object({
  row: z.number().int(),
  receivedOn: isoDateSchema,
  amount: moneySchema,
  reference: z.string(),
  match: z
    .object({
      statementId: z.number().int(),
      reference: z.string(),
      venueName: z.string(),
      balance: moneySchema,
      /** What matched: the reference and the balance, or only one of them. */
      by: z.enum(['reference-and-amount', 'reference', 'amount']),
    })
    .nullable(),
});

export const bankMatchResponseSchema = z.object({
  headers: z.array(z.string()),
  columns: bankColumnsSchema.nullable(),
  credits: z.array(bankCreditSchema),
  /** Rows that were not credits in the studio's currency, or could not be read, with why. */
  skipped: z.array(z.object({ row: z.number().int(), reason: z.string() })),
});
export type BankMatchResponse = z.infer<typeof bankMatchResponseSchema>;

import { z } from 'zod';

import { formatStockNumber, maxStockNumberLength } from '../works/stock-number';
import { isSafeLine } from './text';

/**
 * Stock-number patterns: `{YYYY}` or `{YY}` for the year, `{N…}` for a counter padded to as many
 * digits as there are Ns (`{YYYY}-{NNN}` gives 2026-007). Any other text is kept as written.
 */
export const stockNumberPatternSchema = z
  .string({ error: 'Enter a stock-number pattern such as {YYYY}-{NNN}.' })
  .trim()
  .min(1, { error: 'Enter a stock-number pattern such as {YYYY}-{NNN}.' })
  .max(40, { error: 'Keep the pattern to 40 characters or fewer.' })
  .refine((p) => /\{N+\}/.test(p), { error: 'Include a counter such as {NNN} in the pattern.' })
  .refine((p) => (p.match(/\{N+\}/g) ?? []).length === 1, {
    error: 'Use one counter only.',
  })
  .refine((p) => !/\{(?!N+\}|YYYY\}|YY\})[^}]*\}/.test(p), {
    error: 'Use only {YYYY}, {YY} and {NNN} in braces.',
  })
  .refine(isSafeLine, {
    error: 'The pattern has a hidden control or text-direction character; retype it without.',
  })
  // Room for the counter to grow four digits past its padding within the stock-number limit.
  .refine((p) => formatStockNumber(p, 2026, 1n).length <= maxStockNumberLength - 4, {
    error: `Shorten the pattern: its stock numbers must fit in ${maxStockNumberLength} characters.`,
  });

/** `GET /api/studio`: the settings a work form needs. */
export const studioSettingsSchema = z.object({
  id: z.number().int(),
  name: z.string(),
  currency: z.string(),
  locale: z.string(),
  timeZone: z.string(),
  vatNumber: z.string().nullable(),
  stockNumberPattern: z.string(),
  /** minor units */
  priceStep: z.number().int(),
  nextStockNumber: z.string(),
});
export type StudioSettings = z.infer<typeof studioSettingsSchema>;

/** `PATCH /api/studio` (owner only) */
export const studioSettingsUpdateSchema = z
  .strictObject({
    stockNumberPattern: stockNumberPatternSchema,
    priceStep: z
      .number({ error: 'Enter the price step in minor units (500 is £5).' })
      .int({ error: 'Enter the price step as a whole number of minor units.' })
      .min(1, { error: 'The price step must be at least 1.' })
      .max(1_000_000, { error: 'That price step is too large.' }),
  })
  .partial();
export type StudioSettingsUpdate = z.infer<typeof studioSettingsUpdateSchema>;

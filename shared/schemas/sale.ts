import { z } from 'zod';

import { consignmentLineSchema } from './consignment';
import { isoDateSchema } from './dates';
import { priceSchema } from './money';
import { saleSplitSchema } from './terms';
import { optionalText } from './text';

const lineId = z
  .number({ error: 'Choose the piece.' })
  .int()
  .positive({ error: 'Choose the piece.' });

const saleFields = {
  soldOn: isoDateSchema,
  salePrice: priceSchema,
  /** Why the price paid is below the list price; blank when it is not. */
  discountReason: optionalText('discount reason', 200),
};

/** `POST /api/consignment-lines/:lineId/sale`: one piece sold. */
export const saleInputSchema = z.strictObject(saleFields);
export type SaleInput = z.input<typeof saleInputSchema>;
export type SaleInputParsed = z.output<typeof saleInputSchema>;

/** `POST /api/consignments/:id/sales`: a till receipt of several pieces, all recorded or none. */
export const saleBatchSchema = z
  .strictObject({
    sales: z
      .array(z.strictObject({ lineId, ...saleFields }), { error: 'List the pieces sold.' })
      .min(1, { error: 'List the pieces sold.' })
      .max(200, { error: 'Record at most 200 sales at once.' }),
  })
  .superRefine(({ sales }, ctx) => {
    const seen = new Set<number>();
    sales.forEach((sale, i) => {
      if (seen.has(sale.lineId)) {
        ctx.addIssue({
          code: 'custom',
          path: ['sales', i, 'lineId'],
          message: 'That piece is already on this receipt.',
        });
      }
      seen.add(sale.lineId);
    });
  });
export type SaleBatch = z.input<typeof saleBatchSchema>;
export type SaleBatchParsed = z.output<typeof saleBatchSchema>;

/** Ways a piece leaves a consignment other than a sale. Withdrawing is the studio's alone. */
export const resolveStates = ['returned', 'damaged', 'lost', 'withdrawn'] as const;
export type ResolveState = (typeof resolveStates)[number];

/** `POST /api/consignment-lines/:lineId/resolve` */
export const lineResolveSchema = z.strictObject({
  state: z.enum(resolveStates, { error: 'Choose returned, damaged, lost or withdrawn.' }),
  on: isoDateSchema,
  note: optionalText('note', 2000, 'lines'),
  /** A photo of the damage, sent first to `POST /api/condition-photos`. */
  photoFileId: z.number().int().positive().nullable().optional(),
});
export type LineResolve = z.input<typeof lineResolveSchema>;
export type LineResolveParsed = z.output<typeof lineResolveSchema>;

/** A sale recorded: the line as it now stands, and the split of the price paid. */
export const saleResultSchema = z.object({ line: consignmentLineSchema, split: saleSplitSchema });
export type SaleResult = z.infer<typeof saleResultSchema>;

export const saleBatchResultSchema = z.object({ sales: z.array(saleResultSchema) });
export type SaleBatchResult = z.infer<typeof saleBatchResultSchema>;

/** A line after its sale was undone or it was resolved. */
export const lineResultSchema = z.object({ line: consignmentLineSchema });
export type LineResult = z.infer<typeof lineResultSchema>;

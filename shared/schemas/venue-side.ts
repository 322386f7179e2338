import { z } from 'zod';

import {
  consignmentLineSchema,
  consignmentSchema,
  consignmentSummarySchema,
  lineStateSchema,
} from './consignment';
import { isoDateSchema } from './dates';
import { moneySchema } from './money';
import { lineText } from './text';

const named = z.object({ id: z.number().int(), name: z.string() });

/**
 * `GET /api/venue/consignments`: what a person's venues hold, from every studio they work with
 * as a venue's staff (each item marked with its maker), whichever studio is active.
 */
export const venueHomeSchema = z.object({
  places: z.array(z.object({ studio: named, venue: named })),
  consignments: z.array(consignmentSummarySchema.extend({ studio: named })),
});
export type VenueHome = z.infer<typeof venueHomeSchema>;

/** `GET /api/venue/pieces?q=`: the counter list, searched by stock number or title. */
export const venuePiecesQuerySchema = z.strictObject({
  q: lineText('search', 100).optional(),
});
export type VenuePiecesQuery = z.input<typeof venuePiecesQuerySchema>;

export const venueCounterPieceSchema = z.object({
  studio: named,
  consignment: consignmentSchema.pick({ id: true, reference: true, title: true, state: true }),
  line: consignmentLineSchema
    .pick({
      id: true,
      stockNumber: true,
      title: true,
      thumbnailUrl: true,
      listPrice: true,
      state: true,
    })
    .extend({ soldOn: isoDateSchema.nullable(), salePrice: moneySchema.nullable() }),
});
export type VenueCounterPiece = z.infer<typeof venueCounterPieceSchema>;

export const venuePiecesSchema = z.object({
  items: z.array(venueCounterPieceSchema),
  /** How many pieces each state has, over all the person's venues, before the search. */
  counts: z.partialRecord(lineStateSchema, z.number().int()),
});
export type VenuePieces = z.infer<typeof venuePiecesSchema>;

/** `GET /api/venue/consignments/:id`: one consignment as its venue sees it, with its maker. */
export const venueConsignmentSchema = consignmentSchema.extend({ studio: named });
export type VenueConsignment = z.infer<typeof venueConsignmentSchema>;

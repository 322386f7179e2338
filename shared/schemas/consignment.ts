import { z } from 'zod';

/** A batch's life: put together, terms agreed, sent, open to buyers, over, and paid up. */
export const consignmentStates = [
  'draft',
  'agreed',
  'dispatched',
  'on-show',
  'closed',
  'settled',
  'cancelled',
] as const;
export const consignmentStateSchema = z.enum(consignmentStates);
export type ConsignmentState = z.infer<typeof consignmentStateSchema>;

/** States in which the work has left the studio and is not yet accounted for. */
export const consignmentOutStates = [
  'dispatched',
  'on-show',
  'closed',
] as const satisfies readonly ConsignmentState[];

export const lineStates = [
  'consigned',
  'sold',
  'returned',
  'damaged',
  'lost',
  'withdrawn',
] as const;
export const lineStateSchema = z.enum(lineStates);
export type LineState = z.infer<typeof lineStateSchema>;

export const isoDateSchema = z.iso.date();

/** One consignment as a list shows it, for the studio and for the venue. */
export const consignmentSummarySchema = z.object({
  id: z.number().int(),
  reference: z.string(),
  title: z.string(),
  state: consignmentStateSchema,
  venueId: z.number().int(),
  venueName: z.string(),
  dispatchDate: isoDateSchema.nullable(),
  openingDate: isoDateSchema.nullable(),
  closingDate: isoDateSchema.nullable(),
  returnDueDate: isoDateSchema.nullable(),
  lineCount: z.number().int(),
  linesOut: z.number().int(),
  linesSold: z.number().int(),
});
export type ConsignmentSummary = z.infer<typeof consignmentSummarySchema>;

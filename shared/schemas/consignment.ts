import { z } from 'zod';

import {
  arrivalReportSchema,
  conditionCheckSchema,
  conditionDifferenceSchema,
  conditionPhotoSchema,
} from './condition';
import { isoDateSchema } from './dates';
import { moneySchema, priceSchema } from './money';
import { saleSplitSchema, termsSchema } from './terms';
import { linesText, lineText } from './text';

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

/** The dates of a show; each optional, and in order when given. */
const consignmentDates = {
  dispatchDate: isoDateSchema.nullable().optional(),
  openingDate: isoDateSchema.nullable().optional(),
  closingDate: isoDateSchema.nullable().optional(),
  returnDueDate: isoDateSchema.nullable().optional(),
};

type Dates = { [K in keyof typeof consignmentDates]?: string | null };

/**
 * Dispatch, opening, closing and return come in that order (a date may equal the one before):
 * the issues of the dates given that break it. The server checks a draft's dates again once an
 * edit is merged into them.
 */
export function consignmentDateIssues(dates: Dates) {
  const order = [
    ['dispatchDate', 'sending'],
    ['openingDate', 'opening'],
    ['closingDate', 'closing'],
    ['returnDueDate', 'return'],
  ] as const;
  const issues: { path: string[]; message: string }[] = [];
  let latest: { word: string; date: string } | null = null;
  for (const [field, word] of order) {
    const date = dates[field];
    if (!date) continue;
    if (latest && date < latest.date) {
      issues.push({
        path: [field],
        message: `The ${word} date cannot come before the ${latest.word} date.`,
      });
    }
    latest = { word, date };
  }
  return issues;
}

function datesInOrder(dates: Dates, ctx: z.RefinementCtx) {
  for (const issue of consignmentDateIssues(dates)) ctx.addIssue({ code: 'custom', ...issue });
}

/** `POST /api/consignments`: a new draft for one venue; its terms start from the venue's. */
export const consignmentCreateSchema = z
  .strictObject({
    venueId: z
      .number({ error: 'Choose the venue.' })
      .int()
      .positive({ error: 'Choose the venue.' }),
    title: lineText('title', 200).min(1, { error: 'Give the show or batch a title.' }),
    ...consignmentDates,
    terms: termsSchema.optional(),
  })
  .superRefine(datesInOrder);
export type ConsignmentCreate = z.input<typeof consignmentCreateSchema>;
export type ConsignmentCreateParsed = z.output<typeof consignmentCreateSchema>;

/** `PATCH /api/consignments/:id`, while it is a draft. */
export const consignmentUpdateSchema = z
  .strictObject({
    title: lineText('title', 200).min(1, { error: 'Give the show or batch a title.' }),
    ...consignmentDates,
    terms: termsSchema,
    notes: linesText('notes', 4000)
      .transform((v) => (v === '' ? null : v))
      .nullable(),
  })
  .partial()
  .superRefine(datesInOrder);
export type ConsignmentUpdate = z.input<typeof consignmentUpdateSchema>;
export type ConsignmentUpdateParsed = z.output<typeof consignmentUpdateSchema>;

/** `POST /api/consignments/:id/lines` */
export const lineCreateSchema = z.strictObject({
  workId: z.number({ error: 'Choose a work.' }).int().positive({ error: 'Choose a work.' }),
  listPrice: priceSchema.optional(),
});
export type LineCreate = z.infer<typeof lineCreateSchema>;

/** `PATCH /api/consignments/:id/lines/:lineId`, while the consignment is a draft. */
export const lineUpdateSchema = z.strictObject({ listPrice: priceSchema });
export type LineUpdate = z.infer<typeof lineUpdateSchema>;

export const consignmentParamsSchema = z.strictObject({
  id: z.coerce.number({ error: 'The id must be a number.' }).int().positive(),
});
export const lineParamsSchema = z.strictObject({
  id: z.coerce.number({ error: 'The id must be a number.' }).int().positive(),
  lineId: z.coerce.number({ error: 'The line id must be a number.' }).int().positive(),
});
export const lineOnlyParamsSchema = z.strictObject({
  lineId: z.coerce.number({ error: 'The line id must be a number.' }).int().positive(),
});

/** `GET /api/consignments` */
export const consignmentListQuerySchema = z.strictObject({
  state: consignmentStateSchema.optional(),
  venueId: z.coerce.number<number | string>().int().positive().optional(),
});
export type ConsignmentListQuery = z.input<typeof consignmentListQuerySchema>;

export const consignmentListItemSchema = consignmentSummarySchema.extend({
  /** Insurance value of the pieces still out, per the money engine's exposure. */
  insuredOut: moneySchema.nullable(),
  currency: z.string().nullable(),
});
export type ConsignmentListItem = z.infer<typeof consignmentListItemSchema>;

export const consignmentListSchema = z.object({
  items: z.array(consignmentListItemSchema),
  total: z.number().int(),
});
export type ConsignmentList = z.infer<typeof consignmentListSchema>;

/** Where a work is held when another consignment wants it. */
export const workHoldSchema = z.object({
  consignmentId: z.number().int(),
  reference: z.string(),
  title: z.string(),
  state: consignmentStateSchema,
});
export type WorkHold = z.infer<typeof workHoldSchema>;

/** Which side entered a sale or a return: the venue's staff, or the studio for a venue that phoned. */
export const enteredBySchema = z.enum(['venue', 'studio']);
export type EnteredBy = z.infer<typeof enteredBySchema>;

export const consignmentLineSchema = z.object({
  id: z.number().int(),
  workId: z.number().int(),
  stockNumber: z.string(),
  title: z.string(),
  thumbnailUrl: z.string().nullable(),
  listPrice: moneySchema,
  insuranceValue: moneySchema,
  state: lineStateSchema,
  /** A sale at the list price under the consignment's terms, by the money engine. */
  split: saleSplitSchema.nullable(),
  dispatchCheck: conditionCheckSchema.nullable(),
  arrivalCheck: conditionCheckSchema.nullable(),
  /** What the arrival check found that the dispatch check did not (or no longer). */
  differences: z.array(conditionDifferenceSchema),
  /** The check when the piece came back to the studio. */
  returnCheck: conditionCheckSchema.nullable(),
  /**
   * New damage: what the return check found that the dispatch check did not, with who insured the
   * piece where it most likely happened (the copied terms) and its insurance value.
   */
  newDamage: z
    .object({
      differences: z.array(conditionDifferenceSchema),
      /** Seen on arrival already: in transit to the venue; otherwise at the venue or on the way back. */
      where: z.enum(['in-transit', 'at-venue']),
      insuredBy: z.enum(['maker', 'venue']),
      insuranceValue: moneySchema,
    })
    .nullable(),
  weightG: z.number().int().nullable(),
  /** The sale, once sold: when, for how much, and its split under the consignment's terms. */
  sale: z
    .object({
      soldOn: isoDateSchema,
      price: moneySchema,
      split: saleSplitSchema,
      /** The list price less the price paid, when it was less. */
      discount: moneySchema.nullable(),
      discountReason: z.string().nullable(),
      enteredBy: enteredBySchema,
      recordedBy: z.string().nullable(),
      recordedAt: z.string().nullable(),
      /** On an issued statement: the sale can no longer be undone. */
      lockedBy: z.string().nullable(),
    })
    .nullable(),
  /** How the piece left the consignment other than by a sale: returned, damaged, lost, withdrawn. */
  resolution: z
    .object({
      on: isoDateSchema,
      note: z.string().nullable(),
      photo: conditionPhotoSchema.nullable(),
      enteredBy: enteredBySchema,
      recordedBy: z.string().nullable(),
    })
    .nullable(),
});
export type ConsignmentLine = z.infer<typeof consignmentLineSchema>;

export const consignmentTotalsSchema = z.object({
  listPrice: moneySchema,
  commission: moneySchema,
  vatOnCommission: moneySchema,
  makerShare: moneySchema,
  insuranceValue: moneySchema,
});

/** `GET /api/consignments/:id` */
export const consignmentSchema = z.object({
  id: z.number().int(),
  reference: z.string(),
  title: z.string(),
  state: consignmentStateSchema,
  venue: z.object({
    id: z.number().int(),
    name: z.string(),
    email: z.string().nullable(),
    contactName: z.string().nullable(),
  }),
  dispatchDate: isoDateSchema.nullable(),
  openingDate: isoDateSchema.nullable(),
  closingDate: isoDateSchema.nullable(),
  returnDueDate: isoDateSchema.nullable(),
  terms: termsSchema,
  notes: z.string().nullable(),
  agreedAt: z.string().nullable(),
  dispatchedAt: z.string().nullable(),
  acknowledgedAt: z.string().nullable(),
  acknowledgedBy: z.string().nullable(),
  lines: z.array(consignmentLineSchema),
  /** Null while the consignment has no pieces. */
  totals: consignmentTotalsSchema.nullable(),
  /** The insurance value of the pieces still out now. */
  insuredOut: moneySchema,
  createdAt: z.string(),
  /** Today in the studio's time zone: the day a sale or return defaults to. */
  today: isoDateSchema,
});
export type Consignment = z.infer<typeof consignmentSchema>;

/**
 * `GET /api/venue/lines/:lineId`: one piece a venue holds, as its shelf label opens it, whichever
 * of the person's studios is active; with the terms its sale is split by.
 */
export const venuePieceSchema = z.object({
  studio: z.object({ id: z.number().int(), name: z.string() }),
  consignment: consignmentSchema.pick({
    id: true,
    reference: true,
    title: true,
    state: true,
    dispatchDate: true,
    terms: true,
    today: true,
  }),
  line: consignmentLineSchema,
});
export type VenuePiece = z.infer<typeof venuePieceSchema>;

/** `POST /api/consignments/:id/acknowledge` (the venue): what arrived and in what state. */
export const acknowledgeSchema = z.strictObject({
  reports: z
    .array(arrivalReportSchema, { error: 'Send a condition check for each piece.' })
    .min(1, { error: 'Send a condition check for each piece.' })
    .max(500),
});
export type Acknowledge = z.infer<typeof acknowledgeSchema>;

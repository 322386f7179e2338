import { z } from 'zod';

import { consignmentSummarySchema, enteredBySchema } from './consignment';
import { isoDateSchema } from './dates';
import { moneySchema } from './money';
import { workStatusSchema } from './work';

/** `GET /api/overview`: the studio's figures at a glance. */
export const overviewSchema = z.object({
  studio: z.object({ id: z.number().int(), name: z.string(), currency: z.string() }),
  works: z.object({
    total: z.number().int(),
    byStatus: z.record(workStatusSchema, z.number().int()),
  }),
  venues: z.object({ total: z.number().int() }),
  consignments: z.object({
    outCount: z.number().int(),
    out: z.array(consignmentSummarySchema),
  }),
  /** The latest sales, newest first, with what each leaves the maker. */
  recentSales: z.array(
    z.object({
      lineId: z.number().int(),
      consignmentId: z.number().int(),
      reference: z.string(),
      venueName: z.string(),
      stockNumber: z.string(),
      title: z.string(),
      soldOn: isoDateSchema,
      price: moneySchema,
      makerShare: moneySchema,
      enteredBy: enteredBySchema,
    }),
  ),
  /**
   * What is at risk: the insurance value of every piece out, per venue and in all, one entry per
   * currency (amounts in different currencies are never added together).
   */
  exposure: z.array(
    z.object({
      currency: z.string(),
      total: moneySchema,
      lineCount: z.number().int(),
      byVenue: z.array(
        z.object({
          venueId: z.number().int(),
          venueName: z.string(),
          value: moneySchema,
          lineCount: z.number().int(),
        }),
      ),
    }),
  ),
});
export type Overview = z.infer<typeof overviewSchema>;

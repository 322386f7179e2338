import { z } from 'zod';

import { consignmentSummarySchema } from './consignment';
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

/** `GET /api/venue/consignments`: what one venue holds from the active studio. */
export const venueHomeSchema = z.object({
  studio: z.object({ id: z.number().int(), name: z.string() }),
  venue: z.object({ id: z.number().int(), name: z.string() }),
  consignments: z.array(consignmentSummarySchema),
});
export type VenueHome = z.infer<typeof venueHomeSchema>;

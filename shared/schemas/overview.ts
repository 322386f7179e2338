import { z } from 'zod';

import { consignmentSummarySchema } from './consignment';
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
});
export type Overview = z.infer<typeof overviewSchema>;

/** `GET /api/venue/consignments`: what one venue holds from the active studio. */
export const venueHomeSchema = z.object({
  studio: z.object({ id: z.number().int(), name: z.string() }),
  venue: z.object({ id: z.number().int(), name: z.string() }),
  consignments: z.array(consignmentSummarySchema),
});
export type VenueHome = z.infer<typeof venueHomeSchema>;

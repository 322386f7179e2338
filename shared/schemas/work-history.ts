import { z } from 'zod';

import { conditionGradeSchema, conditionStageSchema } from './condition';
import { consignmentStateSchema, lineStateSchema } from './consignment';
import { isoDateSchema } from './dates';
import { moneySchema } from './money';

/** `GET /api/works/:id/history`: every consignment the work has been on, newest first. */
export const workHistorySchema = z.object({
  consignments: z.array(
    z.object({
      lineId: z.number().int(),
      consignmentId: z.number().int(),
      reference: z.string(),
      title: z.string(),
      consignmentState: consignmentStateSchema,
      venueName: z.string(),
      lineState: lineStateSchema,
      listPrice: moneySchema,
      salePrice: moneySchema.nullable(),
      soldOn: isoDateSchema.nullable(),
      dispatchDate: isoDateSchema.nullable(),
    }),
  ),
  conditionReports: z.array(
    z.object({
      id: z.number().int(),
      stage: conditionStageSchema,
      grade: conditionGradeSchema,
      examinedOn: isoDateSchema,
      examinerName: z.string(),
      findingCount: z.number().int(),
    }),
  ),
});
export type WorkHistory = z.infer<typeof workHistorySchema>;

import { type Expression, type ExpressionBuilder, sql } from 'kysely';

import { type ConsignmentState, type LineState } from '@/shared/schemas/consignment';
import { type WorkStatus } from '@/shared/schemas/work';

import { type Database } from '../db/schema';

/** Consignments still being put together: their pieces have not left the studio. */
export const reservingStates = ['draft', 'agreed'] as const satisfies readonly ConsignmentState[];

/**
 * The status a work's latest consignment line gives it, so it is never stored twice
 * (docs/states.md): no line, or a withdrawn one, means it is in the studio, and so does a line
 * on a consignment not yet sent (the work is reserved for it); a consigned line on a sent
 * consignment means on consignment; otherwise the line's own end (sold, returned, damaged, lost).
 */
export function statusFromLatestLine(
  lineState: Expression<LineState | null>,
  consignmentState: Expression<ConsignmentState | null>,
) {
  return sql<WorkStatus>`case
    when (${lineState}) is null or (${lineState}) = 'withdrawn' then 'in-studio'
    when (${lineState}) = 'consigned' then
      case when (${consignmentState}) in (${sql.join(reservingStates.map((s) => sql.lit(s)))})
        then 'in-studio' else 'on-consignment' end
    else (${lineState}) end`;
}

/** The id of the latest consignment line of the `works` row in scope (served by an index). */
export const latestLineId = sql<number>`(select max(consignment_lines.id) from consignment_lines
  where consignment_lines.work_id = works.id)`;

/** A work's status as an SQL expression over `works`, for queries that do not join its line. */
export function workStatus(eb: ExpressionBuilder<Database, 'works'>) {
  const latest = eb
    .selectFrom('consignment_lines')
    .innerJoin('consignments', 'consignments.id', 'consignment_lines.consignment_id')
    .select((inner) =>
      statusFromLatestLine(
        inner.ref('consignment_lines.state'),
        inner.ref('consignments.state'),
      ).as('status'),
    )
    .whereRef('consignment_lines.work_id', '=', 'works.id')
    .orderBy('consignment_lines.id', 'desc')
    .limit(1);
  return sql<WorkStatus>`coalesce((${latest}), 'in-studio')`;
}

import { type Expression, type ExpressionBuilder, sql } from 'kysely';

import { type LineState } from '@/shared/schemas/consignment';
import { type WorkStatus } from '@/shared/schemas/work';

import { type Database } from '../db/schema';

/**
 * The status a work's latest consignment line gives it, so it is never stored twice: no line, or
 * a withdrawn one, means it is in the studio; a consigned one, on consignment; otherwise the
 * line's own end (sold, returned, damaged, lost).
 */
export function statusFromLatestLine(
  state: Expression<LineState | null> | Expression<{ state: LineState } | undefined>,
) {
  return sql<WorkStatus>`case coalesce((${state}), 'withdrawn')
    when 'withdrawn' then 'in-studio'
    when 'consigned' then 'on-consignment'
    else (${state}) end`;
}

/** The id of the latest consignment line of the `works` row in scope (served by an index). */
export const latestLineId = sql<number>`(select max(consignment_lines.id) from consignment_lines
  where consignment_lines.work_id = works.id)`;

/** A work's status as an SQL expression over `works`, for queries that do not join its line. */
export function workStatus(eb: ExpressionBuilder<Database, 'works'>) {
  const latestLineState = eb
    .selectFrom('consignment_lines')
    .select('consignment_lines.state')
    .whereRef('consignment_lines.work_id', '=', 'works.id')
    .orderBy('consignment_lines.id', 'desc')
    .limit(1);
  return statusFromLatestLine(latestLineState);
}

import { type ExpressionBuilder, sql } from 'kysely';

import { type WorkStatus } from '@/shared/schemas/work';

import { type Database } from '../db/schema';

/**
 * A work's status as an SQL expression over `works`: the state of its latest consignment line,
 * so it is never stored twice. No line, or a withdrawn one, means it is in the studio.
 */
export function workStatus(eb: ExpressionBuilder<Database, 'works'>) {
  const latestLineState = eb
    .selectFrom('consignment_lines')
    .select('consignment_lines.state')
    .whereRef('consignment_lines.work_id', '=', 'works.id')
    .orderBy('consignment_lines.id', 'desc')
    .limit(1);
  return sql<WorkStatus>`case coalesce((${latestLineState}), 'withdrawn')
    when 'withdrawn' then 'in-studio'
    when 'consigned' then 'on-consignment'
    else coalesce((${latestLineState}), 'in-studio') end`;
}

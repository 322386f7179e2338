import { type Expression, type SqlBool } from 'kysely';

import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { containsWord } from '../db/text-search';

/** The consignment a line belongs to, if the scope may see the line. */
export async function findConsignmentOfLine(db: Db, scope: Scope, lineId: number) {
  const row = await scoped
    .consignmentLines(db, scope)
    .select('consignments.id')
    .where('consignment_lines.id', '=', lineId)
    .executeTakeFirst();
  return row?.id;
}

/**
 * The pieces a venue holds from one studio, from dispatch on (a piece on a consignment not yet
 * sent is still in the studio).
 */
function heldPieces(db: Db, scope: Scope) {
  return scoped
    .consignmentLines(db, scope)
    .where('consignments.state', 'in', ['dispatched', 'on-show', 'closed'])
    .where('consignment_lines.state', '!=', 'withdrawn');
}

/** How many of the pieces a venue holds from one studio are in each state. */
export async function countVenuePieces(db: Db, scope: Scope) {
  return heldPieces(db, scope)
    .select(['consignment_lines.state', (eb) => eb.fn.countAll<number>().as('count')])
    .groupBy('consignment_lines.state')
    .execute();
}

/** Those pieces, each word of `search` in its stock number or title. */
export async function listVenuePieces(db: Db, scope: Scope, search: string) {
  let q = heldPieces(db, scope)
    .innerJoin('works', 'works.id', 'consignment_lines.work_id')
    .leftJoin('work_photos as cover', (join) =>
      join.onRef('cover.work_id', '=', 'works.id').on('cover.position', '=', 0),
    )
    .select([
      'consignment_lines.id',
      'consignment_lines.currency',
      'consignment_lines.list_price',
      'consignment_lines.state',
      'consignment_lines.sold_on',
      'consignment_lines.sale_price',
      'consignments.id as consignment_id',
      'consignments.reference',
      'consignments.title as consignment_title',
      'consignments.state as consignment_state',
      'works.stock_number',
      'works.title',
      'cover.id as cover_photo_id',
    ]);
  for (const word of search.split(/\s+/).filter(Boolean)) {
    q = q.where((eb) =>
      eb.or([
        containsWord(db, 'works.stock_number', word),
        containsWord(db, 'works.title', word),
      ] as Expression<SqlBool>[]),
    );
  }
  return q.orderBy('works.stock_number').execute();
}

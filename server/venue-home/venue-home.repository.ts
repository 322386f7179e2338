import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';

/** The consignment a line belongs to, if the scope may see the line. */
export async function findConsignmentOfLine(db: Db, scope: Scope, lineId: number) {
  const row = await scoped
    .consignmentLines(db, scope)
    .select('consignments.id')
    .where('consignment_lines.id', '=', lineId)
    .executeTakeFirst();
  return row?.id;
}

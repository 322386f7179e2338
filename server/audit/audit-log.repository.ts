import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';

/** One row of who changed what; `before` and `after` hold JSON of the changed fields. */
export async function writeAudit(
  db: Db,
  scope: Scope,
  entry: {
    action: string;
    entity: string;
    entityId: number | string;
    before: unknown;
    after: unknown;
  },
): Promise<void> {
  await db
    .insertInto('audit_log')
    .values({
      studio_id: scope.studioId,
      user_id: scope.userId,
      action: entry.action,
      entity: entry.entity,
      entity_id: String(entry.entityId),
      before: JSON.stringify(entry.before),
      after: JSON.stringify(entry.after),
    })
    .execute();
}

import { type Generated, type Insertable, type Selectable } from 'kysely';

/** Who changed what: `before` and `after` hold JSON of the changed fields. */
export interface AuditLogTable {
  id: Generated<number>;
  studio_id: number;
  user_id: string | null;
  action: string;
  entity: string;
  entity_id: string;
  before: string | null;
  after: string | null;
  created_at: Generated<string>;
}
export type AuditLogRow = Selectable<AuditLogTable>;
export type NewAuditLogRow = Insertable<AuditLogTable>;

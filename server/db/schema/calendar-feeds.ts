import { type Generated } from 'kysely';

/** A studio's private calendar address, by the hash of its token. */
export interface CalendarFeedsTable {
  id: Generated<number>;
  studio_id: number;
  token_hash: string;
  created_by: string | null;
  created_at: string;
  revoked_at: string | null;
}

import { type Generated, type Insertable, type Selectable } from 'kysely';

import { type Role } from '@/shared/schemas/membership';

export interface MembershipsTable {
  id: Generated<number>;
  user_id: string;
  studio_id: number;
  role: Role;
  /** set for the gallery role only */
  venue_id: number | null;
  created_at: Generated<string>;
}
export type MembershipRow = Selectable<MembershipsTable>;
export type NewMembershipRow = Insertable<MembershipsTable>;

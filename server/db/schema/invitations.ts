import { type Generated, type Insertable, type Selectable } from 'kysely';

import { type Role } from '@/shared/schemas/membership';

export interface InvitationsTable {
  id: Generated<number>;
  studio_id: number;
  email: string;
  role: Role;
  venue_id: number | null;
  /** SHA-256 of the token sent by e-mail; the token itself is never stored */
  token_hash: string;
  invited_by: string | null;
  expires_at: string;
  accepted_at: string | null;
  created_at: Generated<string>;
}
export type InvitationRow = Selectable<InvitationsTable>;
export type NewInvitationRow = Insertable<InvitationsTable>;

import { type Generated, type Selectable } from 'kysely';

/** better-auth's session model plus the membership the person is working in. */
export interface SessionsTable {
  id: string;
  user_id: string;
  token: string;
  expires_at: string;
  ip_address: string | null;
  user_agent: string | null;
  active_membership_id: number | null;
  created_at: Generated<string>;
  updated_at: Generated<string>;
}
export type SessionRow = Selectable<SessionsTable>;

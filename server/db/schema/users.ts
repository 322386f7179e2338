import { type Generated, type Insertable, type Selectable } from 'kysely';

/** better-auth's user model, fields mapped to snake_case. */
export interface UsersTable {
  id: string;
  name: string;
  email: string;
  email_verified: number;
  image: string | null;
  created_at: Generated<string>;
  updated_at: Generated<string>;
}
export type UserRow = Selectable<UsersTable>;
export type NewUserRow = Insertable<UsersTable>;

import { type Generated, type Insertable } from 'kysely';

/** better-auth's credential store; `password` holds the scrypt hash for e-mail sign-in. */
export interface AccountsTable {
  id: string;
  user_id: string;
  account_id: string;
  provider_id: string;
  access_token: string | null;
  refresh_token: string | null;
  id_token: string | null;
  access_token_expires_at: string | null;
  refresh_token_expires_at: string | null;
  scope: string | null;
  password: string | null;
  created_at: Generated<string>;
  updated_at: Generated<string>;
}
export type NewAccountRow = Insertable<AccountsTable>;

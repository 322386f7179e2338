import { type Generated } from 'kysely';

export interface VerificationsTable {
  id: string;
  identifier: string;
  value: string;
  expires_at: string;
  created_at: Generated<string>;
  updated_at: Generated<string>;
}

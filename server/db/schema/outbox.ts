import { type Generated, type Insertable, type Selectable } from 'kysely';

export type OutboxState = 'queued' | 'sent' | 'failed';

/** E-mail waiting to go, or gone; written in the same transaction as the change it reports. */
export interface OutboxTable {
  id: Generated<number>;
  studio_id: number | null;
  to_address: string;
  subject: string;
  text_body: string;
  html_body: string | null;
  /** JSON array of file ids */
  attachments: Generated<string>;
  state: Generated<OutboxState>;
  attempts: Generated<number>;
  last_error: string | null;
  created_at: Generated<string>;
  sent_at: string | null;
}
export type OutboxRow = Selectable<OutboxTable>;
export type NewOutboxRow = Insertable<OutboxTable>;

import { type Generated, type Insertable, type Selectable, type Updateable } from 'kysely';

export type OutboxState = 'queued' | 'sent' | 'failed';

/**
 * E-mail waiting to go, or gone; written in the same transaction as the change it reports, and
 * delivered by the mail worker (server/mail/mail-worker.ts).
 */
export interface OutboxTable {
  id: Generated<number>;
  studio_id: number | null;
  /** What the message is about: 'consignment-dispatch', 'invitation', 'sale'… ('other' before). */
  kind: Generated<string>;
  to_address: string;
  subject: string;
  text_body: string;
  html_body: string | null;
  /**
   * JSON array of attachment recipes, `{ filename, contentType, recipe: { kind, … } }`: rendered
   * when the message is sent or read, never stored as bytes.
   */
  attachments: Generated<string>;
  state: Generated<OutboxState>;
  attempts: Generated<number>;
  last_error: string | null;
  created_at: Generated<string>;
  /** When a queued message is next due (ISO-8601); moved on by the back-off after a failure. */
  next_attempt_at: Generated<string>;
  /** Held by one worker until this time; another may take it over once it has passed. */
  claimed_until: string | null;
  /** The claim's own token: only the worker holding it may record the outcome. */
  claim_token: string | null;
  /** The Message-ID the message went out with. */
  message_id: string | null;
  /** The From address it went out with (the setting may change later). */
  from_address: string | null;
  sent_at: string | null;
}
export type OutboxRow = Selectable<OutboxTable>;
export type NewOutboxRow = Insertable<OutboxTable>;
export type OutboxUpdate = Updateable<OutboxTable>;

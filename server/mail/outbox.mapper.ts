import { z } from 'zod';

import {
  type MailAttachment,
  mailAttachmentSchema,
  mailKindSchema,
  type OutboxMessage,
  type OutboxSummary,
} from '@/shared/schemas/outbox';

import { type OutboxRow } from '../db/schema/outbox';

const attachmentsSchema = z.array(mailAttachmentSchema);
/** A kind written by a newer version of the server still lists, as "other". */
const storedKindSchema = mailKindSchema.catch('other');

export type OutboxSummaryColumns = Pick<
  OutboxRow,
  | 'id'
  | 'kind'
  | 'to_address'
  | 'subject'
  | 'state'
  | 'attempts'
  | 'last_error'
  | 'created_at'
  | 'next_attempt_at'
  | 'sent_at'
  | 'attachments'
>;
export type OutboxMessageColumns = OutboxSummaryColumns &
  Pick<OutboxRow, 'text_body' | 'html_body' | 'message_id' | 'from_address'>;

/** The attachment recipes a row holds, checked as they were when written. */
export function attachmentsOf(row: Pick<OutboxRow, 'attachments'>): MailAttachment[] {
  return attachmentsSchema.parse(JSON.parse(row.attachments));
}

export function toOutboxSummary(row: OutboxSummaryColumns): OutboxSummary {
  return {
    id: row.id,
    kind: storedKindSchema.parse(row.kind),
    to: row.to_address,
    subject: row.subject,
    state: row.state,
    attempts: row.attempts,
    lastError: row.last_error,
    createdAt: row.created_at,
    nextAttemptAt: row.state === 'queued' ? row.next_attempt_at : null,
    sentAt: row.sent_at,
    attachments: attachmentsOf(row).map((a, index) => ({
      index,
      filename: a.filename,
      contentType: a.contentType,
    })),
  };
}

/** A message with its bodies; `from` is what it went out with, or what it will go out with. */
export function toOutboxMessage(row: OutboxMessageColumns, configuredFrom: string): OutboxMessage {
  return {
    ...toOutboxSummary(row),
    from: row.from_address ?? configuredFrom,
    text: row.text_body,
    html: row.html_body,
    messageId: row.message_id,
  };
}

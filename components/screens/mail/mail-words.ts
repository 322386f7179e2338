import { formatDateTime } from '@/components/ui/format';
import { outboxStateLooks, type StateLook } from '@/constants/states';
import { type MailKind, type OutboxSummary } from '@/shared/schemas/outbox';

export const mailKindWords: Record<MailKind, string> = {
  'consignment-dispatch': 'Consignment sent',
  invitation: 'Invitation to sign in',
  sale: 'Sale',
  statement: 'Statement',
  'password-reset': 'New password link',
  other: 'Message',
};

/** The state as the maker reads it: a waiting message that has failed before says so. */
export function outboxLook(message: Pick<OutboxSummary, 'state' | 'attempts'>): StateLook {
  return message.state === 'queued' && message.attempts > 0
    ? outboxStateLooks.retrying
    : outboxStateLooks[message.state];
}

/** When it went, or when it is next tried, or when it was given up. */
export function whenWords(message: OutboxSummary, timeZone: string): string {
  if (message.state === 'sent' && message.sentAt) {
    return `Sent ${formatDateTime(message.sentAt, timeZone)}`;
  }
  if (message.state === 'queued' && message.attempts > 0 && message.nextAttemptAt) {
    return `Next try ${formatDateTime(message.nextAttemptAt, timeZone)}`;
  }
  if (message.state === 'failed') {
    return `Given up after ${message.attempts} ${message.attempts === 1 ? 'attempt' : 'attempts'}`;
  }
  return `Written ${formatDateTime(message.createdAt, timeZone)}`;
}

/** The studio's clock when the settings have arrived; London's (the product's default) before. */
export const defaultTimeZone = 'Europe/London';

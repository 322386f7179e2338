import { type OutgoingMail } from '@/shared/schemas/outbox';

import { type Db } from '../db/database';

/** What a composer is given: the queued message it writes again. */
export type ComposedFor = { id: number; studioId: number | null; to: string };

/**
 * Writes a queued message again from the data it reports, just before it is sent (and when it
 * is read while still queued): news that gathers (sales within minutes of each other) is
 * recorded cheaply and put into words once. Null when nothing is left to say: the message is
 * dropped.
 */
export type MailComposer = (db: Db, message: ComposedFor) => Promise<OutgoingMail | null>;

/** One composer per message kind that has one: `{ sale: composeSaleNotice }`. */
export type MailComposers = Readonly<Record<string, MailComposer>>;

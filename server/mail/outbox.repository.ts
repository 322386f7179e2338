import { randomUUID } from 'node:crypto';

import { type OutboxState, type OutgoingMail, outgoingMailSchema } from '@/shared/schemas/outbox';

import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { lockedForShare } from '../db/dialect';
import { type OutboxRow } from '../db/schema/outbox';
import { type OutboxMessageColumns, type OutboxSummaryColumns } from './outbox.mapper';
import { nudgeOutbox } from './outbox-nudge';

/**
 * Writes an e-mail to the outbox. Pass the transaction that makes the change the e-mail reports:
 * both are written, or neither. Attachments are recipes, rendered when the message goes. Answers
 * the message's id; the mail worker sends it once the transaction has committed.
 */
export async function enqueueMail(
  db: Db,
  mail: OutgoingMail,
  now = new Date(),
  /** Held until then, so that news arriving in the meantime can join it (see `replaceHeldMail`). */
  dueAt = now,
): Promise<number> {
  const parsed = outgoingMailSchema.parse(mail);
  const at = now.toISOString();
  const { id } = await db
    .insertInto('outbox')
    .values({
      studio_id: parsed.studioId,
      kind: parsed.kind,
      to_address: parsed.to,
      subject: parsed.subject,
      text_body: parsed.text,
      html_body: parsed.html,
      attachments: JSON.stringify(parsed.attachments),
      state: 'queued',
      created_at: at,
      next_attempt_at: dueAt.toISOString(),
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  nudgeOutbox();
  return id;
}

/**
 * A message of `kind` to `to` still held back (queued, never tried, unclaimed and not yet due):
 * one that news of the same kind can still be added to before it goes. Share-locked until the
 * transaction ends (on PostgreSQL), so a worker cannot claim and word it while news joins it,
 * though other news may join it at the same time.
 */
export async function findHeldMail(
  db: Db,
  studioId: number,
  kind: string,
  to: string,
  now = new Date(),
) {
  return db
    .selectFrom('outbox')
    .select(['id', 'next_attempt_at'])
    .where('studio_id', '=', studioId)
    .where('kind', '=', kind)
    .where('to_address', '=', to)
    .where('state', '=', 'queued')
    .where('attempts', '=', 0)
    .where('claim_token', 'is', null)
    .where('next_attempt_at', '>', now.toISOString())
    .orderBy('id')
    .$call(lockedForShare(db))
    .executeTakeFirst();
}

// The page: the studio's own messages, through the scoped builder.

const summaryColumns = [
  'outbox.id',
  'outbox.kind',
  'outbox.to_address',
  'outbox.subject',
  'outbox.state',
  'outbox.attempts',
  'outbox.last_error',
  'outbox.created_at',
  'outbox.next_attempt_at',
  'outbox.sent_at',
  'outbox.attachments',
] as const;

const messageColumns = [
  ...summaryColumns,
  'outbox.text_body',
  'outbox.html_body',
  'outbox.message_id',
  'outbox.from_address',
] as const;

/** A page of the studio's messages, newest first, and how many there are in all. */
export async function listOutboxRows(
  db: Db,
  scope: Scope,
  filter: { state?: OutboxState; page: number; pageSize: number },
): Promise<{ rows: OutboxSummaryColumns[]; total: number }> {
  let base = scoped.outbox(db, scope);
  if (filter.state) base = base.where('outbox.state', '=', filter.state);
  const rows = await base
    .select(summaryColumns)
    .orderBy('outbox.id', 'desc')
    .limit(filter.pageSize)
    .offset((filter.page - 1) * filter.pageSize)
    .execute();
  const { total } = await base
    .select((eb) => eb.fn.countAll<number>().as('total'))
    .executeTakeFirstOrThrow();
  return { rows, total: Number(total) };
}

export async function findOutboxRow(
  db: Db,
  scope: Scope,
  id: number,
): Promise<OutboxMessageColumns | undefined> {
  return scoped
    .outbox(db, scope)
    .select(messageColumns)
    .where('outbox.id', '=', id)
    .executeTakeFirst();
}

/**
 * Puts a failed or waiting message back in the queue, due now, with a fresh count of attempts.
 * Answers whether it did: a sent message (or another studio's) is left alone.
 */
export async function requeueOutboxRow(
  db: Db,
  scope: Scope,
  id: number,
  now: Date,
): Promise<boolean> {
  const result = await db
    .updateTable('outbox')
    .set({ state: 'queued', attempts: 0, next_attempt_at: now.toISOString() })
    .where('outbox.studio_id', '=', scope.studioId)
    .where('outbox.id', '=', id)
    .where('outbox.state', 'in', ['queued', 'failed'])
    .executeTakeFirst();
  const requeued = result.numUpdatedRows === 1n;
  if (requeued) nudgeOutbox();
  return requeued;
}

// Delivery: the worker serves every studio, so these are deliberately not scoped. Each one that
// changes a claimed message names the claim's token, so only the worker holding it can.

/** A claimed message: the row as it was when claimed, and the token that holds it. */
export type ClaimedMail = { row: OutboxRow; token: string };

/**
 * Claims the next due message for `leaseMs`, or answers undefined when none is due. The claim is
 * a conditional UPDATE that changes the row only while it is still queued, due and unclaimed (or
 * its claim has lapsed): when several workers, in any number of processes, go for the same
 * message, the database lets one of them change it, and the others move on to the next.
 */
export async function claimDueMail(
  db: Db,
  now: Date,
  leaseMs: number,
): Promise<ClaimedMail | undefined> {
  const at = now.toISOString();
  const candidates = await db
    .selectFrom('outbox')
    .select('id')
    .where('state', '=', 'queued')
    .where('next_attempt_at', '<=', at)
    .where((eb) => eb.or([eb('claimed_until', 'is', null), eb('claimed_until', '<', at)]))
    .orderBy('next_attempt_at')
    .orderBy('id')
    .limit(10)
    .execute();
  for (const { id } of candidates) {
    const token = randomUUID();
    const result = await db
      .updateTable('outbox')
      .set({ claimed_until: new Date(now.getTime() + leaseMs).toISOString(), claim_token: token })
      .where('id', '=', id)
      .where('state', '=', 'queued')
      .where('next_attempt_at', '<=', at)
      .where((eb) => eb.or([eb('claimed_until', 'is', null), eb('claimed_until', '<', at)]))
      .executeTakeFirst();
    if (result.numUpdatedRows !== 1n) continue;
    const row = await db
      .selectFrom('outbox')
      .selectAll()
      .where('id', '=', id)
      .where('claim_token', '=', token)
      .executeTakeFirst();
    if (row) return { row, token };
  }
  return undefined;
}

/** Records that the claimed message went; answers false if the claim had been lost meanwhile. */
export async function markMailSent(
  db: Db,
  claim: ClaimedMail,
  sent: { messageId: string; from: string; at: Date },
): Promise<boolean> {
  const result = await db
    .updateTable('outbox')
    .set((eb) => ({
      state: 'sent',
      sent_at: sent.at.toISOString(),
      message_id: sent.messageId,
      from_address: sent.from,
      attempts: eb('attempts', '+', 1),
      last_error: null,
      claimed_until: null,
      claim_token: null,
    }))
    .where('id', '=', claim.row.id)
    .where('claim_token', '=', claim.token)
    .executeTakeFirst();
  return result.numUpdatedRows === 1n;
}

/**
 * Records a failed attempt: the error, one more attempt, and either when to try next (queued)
 * or that it is given up (failed). Answers false if the claim had been lost meanwhile.
 */
export async function markMailAttemptFailed(
  db: Db,
  claim: ClaimedMail,
  outcome: { error: string; state: 'queued' | 'failed'; nextAttemptAt: Date },
): Promise<boolean> {
  const result = await db
    .updateTable('outbox')
    .set((eb) => ({
      state: outcome.state,
      last_error: outcome.error,
      attempts: eb('attempts', '+', 1),
      next_attempt_at: outcome.nextAttemptAt.toISOString(),
      claimed_until: null,
      claim_token: null,
    }))
    .where('id', '=', claim.row.id)
    .where('claim_token', '=', claim.token)
    .executeTakeFirst();
  return result.numUpdatedRows === 1n;
}

/** Rewrites a claimed message with what its composer made of it; false if the claim was lost. */
export async function rewriteClaimedMail(
  db: Db,
  claim: ClaimedMail,
  mail: OutgoingMail,
): Promise<boolean> {
  const parsed = outgoingMailSchema.parse(mail);
  const result = await db
    .updateTable('outbox')
    .set({
      subject: parsed.subject,
      text_body: parsed.text,
      html_body: parsed.html,
      attachments: JSON.stringify(parsed.attachments),
    })
    .where('id', '=', claim.row.id)
    .where('claim_token', '=', claim.token)
    .executeTakeFirst();
  return Number(result.numUpdatedRows) === 1;
}

/** Drops a claimed message its composer had nothing left to say in. */
export async function dropClaimedMail(db: Db, claim: ClaimedMail): Promise<void> {
  await db
    .deleteFrom('outbox')
    .where('id', '=', claim.row.id)
    .where('claim_token', '=', claim.token)
    .execute();
}

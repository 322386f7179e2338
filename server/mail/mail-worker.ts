import { type Logger } from 'pino';

import { type Db } from '../db/database';
import { type AttachmentRenderer } from './attachments';
import { type MailComposers } from './composers';
import { attachmentsOf } from './outbox.mapper';
import {
  claimDueMail,
  type ClaimedMail,
  dropClaimedMail,
  markMailAttemptFailed,
  markMailSent,
  rewriteClaimedMail,
} from './outbox.repository';
import { onOutboxNudge } from './outbox-nudge';
import { mailFromDomain, type MailTransport } from './transport';

const second = 1000;
const minute = 60 * second;
const hour = 60 * minute;

/**
 * How long to wait after the `attempts`-th failed attempt: 15 s, doubling each time (30 s,
 * 1 min, 2 min…), never more than an hour.
 */
export function backoffMs(attempts: number): number {
  return Math.min(15 * second * 2 ** Math.max(0, attempts - 1), hour);
}

export type MailWorkerOptions = {
  db: Db;
  transport: MailTransport;
  /** The From address every message goes out with. */
  from: string;
  renderAttachment: AttachmentRenderer;
  /** Kinds of message written again just before they go (see `MailComposer`). */
  composeMail?: MailComposers;
  logger: Logger;
  /** The clock; tests move it on instead of waiting. */
  now?: () => Date;
  /** How often to look for due messages without being nudged. */
  intervalMs?: number;
  /** How long a claim holds: longer than rendering and sending one message can take. */
  leaseMs?: number;
  /** Attempts before a message is given up as failed (then only "Send again" sends it). */
  maxAttempts?: number;
  /** How long after a nudge to look, so several messages written together go in one run. */
  nudgeDelayMs?: number;
};

export type MailWorker = {
  /** Sends what is due now, then again on every nudge and every interval. */
  start(): void;
  /** Stops looking; resolves once the message in hand (if any) is sent or given back. */
  stop(): Promise<void>;
  /** Sends every message due now, one at a time; answers how many it tried. */
  runOnce(): Promise<number>;
};

/** What a failed attempt leaves in `last_error`: the mail server's answer when there was one. */
function describeError(err: unknown): string {
  const message = err instanceof Error ? err.message : String(err);
  return message.trim().slice(0, 1000) || 'The message could not be sent.';
}

/**
 * A mail server that answers 5xx has refused the message for good (RFC 5321 §4.2.1: a
 * permanent negative completion reply), so it is not tried again until someone asks.
 */
function isPermanent(err: unknown): boolean {
  const code = (err as { responseCode?: unknown } | null)?.responseCode;
  return typeof code === 'number' && code >= 500 && code < 600;
}

/**
 * Delivers the outbox: claims one due message at a time (see `claimDueMail`), renders its
 * attachments, sends it, and records the outcome. A failure never loses the message: it stays
 * queued with its error and is tried again after a back-off, until `maxAttempts` have failed.
 * The worker runs in the server process beside the app; any number of them, in any number of
 * processes sharing the database, send each message once.
 */
export function createMailWorker(options: MailWorkerOptions): MailWorker {
  const {
    db,
    transport,
    from,
    renderAttachment,
    composeMail = {},
    logger,
    now = () => new Date(),
    intervalMs = 15 * second,
    leaseMs = 5 * minute,
    maxAttempts = 12,
    nudgeDelayMs = 50,
  } = options;
  const domain = mailFromDomain(from);
  let stopping = false;
  let current: Promise<number> | null = null;
  let again = false;
  let interval: NodeJS.Timeout | null = null;
  let nudgeTimer: NodeJS.Timeout | null = null;
  let unsubscribe: (() => void) | null = null;

  /** The same Message-ID on every attempt, so a message sent twice can be told for one. */
  const messageIdFor = (row: ClaimedMail['row']) =>
    `<saggar.${row.id}.${Date.parse(row.created_at) || 0}@${domain}>`;

  /** The claimed message as it goes: composed again from its data when its kind has a composer. */
  async function composed(claim: ClaimedMail): Promise<ClaimedMail['row'] | null> {
    const { row } = claim;
    const compose = Object.hasOwn(composeMail, row.kind) ? composeMail[row.kind] : undefined;
    if (!compose) return row;
    const mail = await compose(db, { id: row.id, studioId: row.studio_id, to: row.to_address });
    if (!mail) {
      await dropClaimedMail(db, claim);
      logger.info({ outboxId: row.id }, 'mail dropped: nothing left to say');
      return null;
    }
    await rewriteClaimedMail(db, claim, mail);
    return {
      ...row,
      subject: mail.subject,
      text_body: mail.text,
      html_body: mail.html ?? null,
      attachments: JSON.stringify(mail.attachments ?? []),
    };
  }

  async function deliver(claim: ClaimedMail): Promise<void> {
    let row = claim.row;
    let messageId: string;
    try {
      const message = await composed(claim);
      if (!message) return;
      row = message;
      const attachments = await Promise.all(
        attachmentsOf(row).map(async (a) => ({
          filename: a.filename,
          contentType: a.contentType,
          ...(a.contentId ? { cid: a.contentId } : {}),
          content: await renderAttachment(a.recipe, db, { studioId: message.studio_id }),
        })),
      );
      const info = await transport.sendMail({
        from,
        to: row.to_address,
        subject: row.subject,
        text: row.text_body,
        ...(row.html_body === null ? {} : { html: row.html_body }),
        attachments,
        messageId: messageIdFor(row),
      });
      messageId = info.messageId;
    } catch (err) {
      const attempts = row.attempts + 1;
      const giveUp = isPermanent(err) || attempts >= maxAttempts;
      const error = describeError(err);
      await markMailAttemptFailed(db, claim, {
        error,
        state: giveUp ? 'failed' : 'queued',
        nextAttemptAt: giveUp ? now() : new Date(now().getTime() + backoffMs(attempts)),
      });
      logger.warn({ outboxId: row.id, attempts, giveUp, error }, 'mail not sent');
      return;
    }
    // Sent: if this write fails, the claim lapses and the message goes again, with the same
    // Message-ID (at least once, never silently lost).
    const kept = await markMailSent(db, claim, { messageId, from, at: now() });
    if (kept) logger.info({ outboxId: row.id, messageId }, 'mail sent');
    else logger.warn({ outboxId: row.id, messageId }, 'mail sent after its claim had lapsed');
  }

  async function drain(): Promise<number> {
    let handled = 0;
    while (!stopping) {
      const claim = await claimDueMail(db, now(), leaseMs);
      if (!claim) break;
      await deliver(claim);
      handled += 1;
    }
    return handled;
  }

  function runOnce(): Promise<number> {
    if (current) {
      // A nudge while a run is under way: look once more when it ends.
      again = true;
      return current;
    }
    const run = (async () => {
      let handled = 0;
      try {
        do {
          again = false;
          handled += await drain();
        } while (again && !stopping);
      } finally {
        current = null;
      }
      return handled;
    })();
    current = run;
    return run;
  }

  /** A run the timer or a nudge started: a fault (the database, say) is logged, not thrown. */
  function runInBackground() {
    runOnce().catch((err: unknown) => logger.error({ err }, 'mail worker run failed'));
  }

  return {
    start() {
      if (interval) return;
      stopping = false;
      interval = setInterval(runInBackground, intervalMs);
      unsubscribe = onOutboxNudge(() => {
        if (stopping || nudgeTimer) return;
        nudgeTimer = setTimeout(() => {
          nudgeTimer = null;
          runInBackground();
        }, nudgeDelayMs);
      });
      runInBackground();
    },
    async stop() {
      stopping = true;
      if (interval) clearInterval(interval);
      if (nudgeTimer) clearTimeout(nudgeTimer);
      interval = null;
      nudgeTimer = null;
      unsubscribe?.();
      unsubscribe = null;
      await current?.catch(() => undefined);
    },
    runOnce,
  };
}

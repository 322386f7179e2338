import { type OutboxMessage } from '@/shared/schemas/outbox';

import { type Scope } from '../access/viewer';
import { type AppContext } from '../context';
import { HttpError, notFound } from '../http/http-error';
import { attachmentsOf, toOutboxMessage } from './outbox.mapper';
import { findOutboxRow, requeueOutboxRow } from './outbox.repository';

type MailContext = Pick<AppContext, 'db' | 'mailFrom' | 'renderAttachment' | 'composeMail'>;

/** A message still waiting, as its composer would write it now (what the worker will send). */
async function asItWillGo<Row extends NonNullable<Awaited<ReturnType<typeof findOutboxRow>>>>(
  db: MailContext['db'],
  composeMail: MailContext['composeMail'],
  studioId: number,
  row: Row,
): Promise<Row> {
  const compose = Object.hasOwn(composeMail, row.kind) ? composeMail[row.kind] : undefined;
  if (!compose || row.state !== 'queued') return row;
  const mail = await compose(db, { id: row.id, studioId, to: row.to_address });
  if (!mail) return row;
  return {
    ...row,
    subject: mail.subject,
    text_body: mail.text,
    html_body: mail.html ?? null,
    attachments: JSON.stringify(mail.attachments ?? []),
  };
}

/**
 * A message as the owner reads it on Sent mail. Pictures sent inside the message (`cid:`) are
 * written into its HTML as data, since the page shows it in a frame that reaches nothing else; one
 * that cannot be made is left out, as a mail program would.
 */
export async function getOutboxMessage(
  { db, mailFrom, renderAttachment, composeMail }: MailContext,
  scope: Scope,
  id: number,
): Promise<OutboxMessage> {
  const stored = await findOutboxRow(db, scope, id);
  if (!stored) throw notFound('That message');
  const row = await asItWillGo(db, composeMail, scope.studioId, stored);
  const message = toOutboxMessage(row, mailFrom);
  let html = message.html;
  for (const attachment of attachmentsOf(row)) {
    if (html === null || !attachment.contentId) continue;
    const content = await renderAttachment(attachment.recipe, db, {
      studioId: scope.studioId,
    }).catch(() => null);
    const src = content
      ? `data:${attachment.contentType};base64,${content.toString('base64')}`
      : '';
    html = html.replaceAll(`cid:${attachment.contentId}`, src);
  }
  return { ...message, html };
}

/** An attachment's bytes, made from its recipe as the worker makes them when it sends. */
export async function renderOutboxAttachment(
  { db, renderAttachment }: MailContext,
  scope: Scope,
  id: number,
  index: number,
): Promise<{ filename: string; contentType: string; content: Buffer }> {
  const row = await findOutboxRow(db, scope, id);
  if (!row) throw notFound('That message');
  const attachment = attachmentsOf(row)[index];
  if (!attachment) throw notFound('That attachment');
  const content = await renderAttachment(attachment.recipe, db, { studioId: scope.studioId });
  return { filename: attachment.filename, contentType: attachment.contentType, content };
}

/** "Send again": the message is queued, due now, and the worker is told. */
export async function retryOutboxMessage(
  context: MailContext,
  scope: Scope,
  id: number,
): Promise<OutboxMessage> {
  const current = await getOutboxMessage(context, scope, id);
  if (current.state === 'sent') {
    throw new HttpError('conflict', 'That message has already been sent.');
  }
  if (!(await requeueOutboxRow(context.db, scope, id, new Date()))) {
    throw new HttpError('conflict', 'That message has just been sent.');
  }
  return getOutboxMessage(context, scope, id);
}

import { type OutboxMessage } from '@/shared/schemas/outbox';

import { type Scope } from '../access/viewer';
import { type AppContext } from '../context';
import { HttpError, notFound } from '../http/http-error';
import { attachmentsOf, toOutboxMessage } from './outbox.mapper';
import { findOutboxRow, requeueOutboxRow } from './outbox.repository';

type MailContext = Pick<AppContext, 'db' | 'mailFrom' | 'renderAttachment'>;

/**
 * A message as the owner reads it on Sent mail. Pictures sent inside the message (`cid:`) are
 * written into its HTML as data, since the page shows it in a frame that reaches nothing else; one
 * that cannot be made is left out, as a mail program would.
 */
export async function getOutboxMessage(
  { db, mailFrom, renderAttachment }: MailContext,
  scope: Scope,
  id: number,
): Promise<OutboxMessage> {
  const row = await findOutboxRow(db, scope, id);
  if (!row) throw notFound('That message');
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

import express from 'express';

import {
  outboxAttachmentParamsSchema,
  outboxIdParamsSchema,
  type OutboxList,
  outboxListQuerySchema,
} from '@/shared/schemas/outbox';

import { requireRole, scopeOf } from '../access/authenticate';
import { type AppContext } from '../context';
import { validate } from '../http/validate';
import { toOutboxSummary } from './outbox.mapper';
import { listOutboxRows } from './outbox.repository';
import { getOutboxMessage, renderOutboxAttachment, retryOutboxMessage } from './outbox.service';

const list = validate({ query: outboxListQuerySchema });
const byId = validate({ params: outboxIdParamsSchema });
const attachment = validate({ params: outboxAttachmentParamsSchema });

/** `/api/outbox`: the studio's e-mail, what went and what did not. The owner's to read. */
export function outboxRouter(context: AppContext) {
  return express
    .Router()
    .use(requireRole('owner'))
    .get('/', list, async (_req, res) => {
      const { state, page, pageSize } = list.input(res).query;
      const { rows, total } = await listOutboxRows(context.db, scopeOf(res), {
        state,
        page,
        pageSize,
      });
      const body: OutboxList = { items: rows.map(toOutboxSummary), total };
      res.json(body);
    })
    .get('/:id', byId, async (_req, res) => {
      res.json(await getOutboxMessage(context, scopeOf(res), byId.input(res).params.id));
    })
    .get('/:id/attachments/:index', attachment, async (_req, res) => {
      const { id, index } = attachment.input(res).params;
      const file = await renderOutboxAttachment(context, scopeOf(res), id, index);
      res.attachment(file.filename);
      // As the recipe states it: Express's own setters would add a charset to text types.
      res.setHeader('Content-Type', file.contentType);
      res.set('Cache-Control', 'private, no-store');
      res.send(file.content);
    })
    .post('/:id/retry', byId, async (_req, res) => {
      res.json(await retryOutboxMessage(context, scopeOf(res), byId.input(res).params.id));
    });
}

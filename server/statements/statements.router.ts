import { create as contentDisposition } from 'content-disposition';
import express from 'express';

import {
  adjustmentCreateSchema,
  paymentCreateSchema,
  statementCreateSchema,
  statementParamsSchema,
} from '@/shared/schemas/statement';

import { requireRole, scopeOf } from '../access/authenticate';
import { type AppContext } from '../context';
import { validate } from '../http/validate';
import { renderStatementDocument } from './statement-document';
import {
  createStatement,
  explainDifference,
  getStatement,
  issueStatement,
  listStatements,
  recordPayment,
} from './statements.service';

const create = validate({ body: statementCreateSchema });
const byId = validate({ params: statementParamsSchema });
const pay = validate({ params: statementParamsSchema, body: paymentCreateSchema });
const explain = validate({ params: statementParamsSchema, body: adjustmentCreateSchema });

const readers = requireRole('owner', 'assistant', 'gallery');
// Money owed and received is the owner's business (docs/domain.md, roles).
const owner = requireRole('owner');

/** `/api/statements`: what a venue owes for the sales of a show or a period, and what it paid. */
export function statementsRouter({ db, appUrl }: AppContext) {
  return (
    express
      .Router()
      .get('/', readers, async (_req, res) => {
        res.json(await listStatements(db, scopeOf(res)));
      })
      .post('/', owner, create, async (_req, res) => {
        res.status(201).json(await createStatement(db, scopeOf(res), create.input(res).body));
      })
      // Before `/:id`, which would read "12.pdf" as an id.
      .get('/:id.pdf', readers, byId, async (_req, res) => {
        const document = await renderStatementDocument(
          db,
          scopeOf(res),
          byId.input(res).params.id,
          {
            appUrl,
          },
        );
        res.type('application/pdf');
        res.set('Content-Disposition', contentDisposition(document.fileName, { type: 'inline' }));
        res.set('Cache-Control', 'private, no-store');
        res.send(document.bytes);
      })
      .get('/:id', readers, byId, async (_req, res) => {
        res.json(await getStatement(db, scopeOf(res), byId.input(res).params.id));
      })
      .post('/:id/issue', owner, byId, async (_req, res) => {
        res.json(await issueStatement(db, scopeOf(res), byId.input(res).params.id, { appUrl }));
      })
      .post('/:id/payments', owner, pay, async (_req, res) => {
        const { params, body } = pay.input(res);
        res.status(201).json(await recordPayment(db, scopeOf(res), params.id, body));
      })
      .post('/:id/adjustments', owner, explain, async (_req, res) => {
        const { params, body } = explain.input(res);
        res.status(201).json(await explainDifference(db, scopeOf(res), params.id, body));
      })
  );
}

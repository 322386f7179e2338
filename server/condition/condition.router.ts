import express from 'express';

import { conditionReportCreateSchema } from '@/shared/schemas/condition';
import { lineOnlyParamsSchema } from '@/shared/schemas/consignment';

import { requireRole, scopeOf } from '../access/authenticate';
import { type AppContext } from '../context';
import { validate } from '../http/validate';
import { getCheck, recordCheck } from './condition.service';

const report = validate({ params: lineOnlyParamsSchema, body: conditionReportCreateSchema });

/** `/api/consignment-lines/:lineId/condition-reports`: one piece's condition at one stage. */
export function conditionReportsRouter({ db }: AppContext) {
  return express
    .Router({ mergeParams: true })
    .use(requireRole('owner', 'assistant', 'gallery'))
    .post('/', report, async (_req, res) => {
      const scope = scopeOf(res);
      const { params, body } = report.input(res);
      const { stage, ...input } = body;
      const id = await db
        .transaction()
        .execute((trx) => recordCheck(trx, scope, params.lineId, stage, input));
      res.status(201).json(await getCheck(db, scope, params.lineId, id));
    });
}

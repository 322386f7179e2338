import express from 'express';

import { conditionReportCreateSchema } from '@/shared/schemas/condition';
import { lineOnlyParamsSchema } from '@/shared/schemas/consignment';

import { scopeOf } from '../access/authenticate';
import { requireAnyRole, requireScopeOf } from '../access/resource-scope';
import { studioOf } from '../access/resource-studio.repository';
import { type AppContext } from '../context';
import { validate } from '../http/validate';
import { getCheck, recordCheck } from './condition.service';

const report = validate({ params: lineOnlyParamsSchema, body: conditionReportCreateSchema });
const roles = ['owner', 'assistant', 'gallery'] as const;

/** `/api/consignment-lines/:lineId/condition-reports`: one piece's condition at one stage. */
export function conditionReportsRouter({ db }: AppContext) {
  // The piece's own studio: a venue's staff check arrivals for any maker without switching.
  const lineScope = requireScopeOf(
    db,
    'That piece',
    (d, res) => studioOf.line(d, report.input(res).params.lineId),
    ...roles,
  );
  return express
    .Router({ mergeParams: true })
    .post('/', requireAnyRole(...roles), report, lineScope, async (_req, res) => {
      const scope = scopeOf(res);
      const { params, body } = report.input(res);
      const { stage, ...input } = body;
      const id = await db
        .transaction()
        .execute((trx) => recordCheck(trx, scope, params.lineId, stage, input));
      res.status(201).json(await getCheck(db, scope, params.lineId, id));
    });
}

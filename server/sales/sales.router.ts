import express from 'express';

import { consignmentParamsSchema, lineOnlyParamsSchema } from '@/shared/schemas/consignment';
import { lineResolveSchema, saleBatchSchema, saleInputSchema } from '@/shared/schemas/sale';

import { scopeOf } from '../access/authenticate';
import { requireAnyRole, requireScopeOf } from '../access/resource-scope';
import { studioOf } from '../access/resource-studio.repository';
import { type AppContext } from '../context';
import { validate } from '../http/validate';
import { recordSale, recordSales, resolveLine, undoSale } from './sales.service';

const roles = ['owner', 'assistant', 'gallery'] as const;
const anyRole = requireAnyRole(...roles);
const sell = validate({ params: lineOnlyParamsSchema, body: saleInputSchema });
const byLine = validate({ params: lineOnlyParamsSchema });
const resolve = validate({ params: lineOnlyParamsSchema, body: lineResolveSchema });
const sellSeveral = validate({ params: consignmentParamsSchema, body: saleBatchSchema });

/**
 * `/api/consignment-lines/:lineId`: a piece sold, its sale undone, or returned, damaged, lost or
 * withdrawn. The scope is the piece's own studio, so a venue's staff need not switch studio.
 */
export function lineSalesRouter({ db, appUrl }: AppContext) {
  const lineScope = (validator: typeof byLine | typeof sell | typeof resolve) =>
    requireScopeOf(
      db,
      'That piece',
      (d, res) => studioOf.line(d, validator.input(res).params.lineId),
      ...roles,
    );
  return express
    .Router({ mergeParams: true })
    .post('/sale', anyRole, sell, lineScope(sell), async (_req, res) => {
      const { params, body } = sell.input(res);
      res.status(201).json(await recordSale(db, scopeOf(res), params.lineId, body, { appUrl }));
    })
    .delete('/sale', anyRole, byLine, lineScope(byLine), async (_req, res) => {
      res.json(await undoSale(db, scopeOf(res), byLine.input(res).params.lineId));
    })
    .post('/resolve', anyRole, resolve, lineScope(resolve), async (_req, res) => {
      const { params, body } = resolve.input(res);
      res.json(await resolveLine(db, scopeOf(res), params.lineId, body));
    });
}

/** `/api/consignments/:id/sales`: a till receipt of several pieces, all recorded or none. */
export function consignmentSalesRouter({ db, appUrl }: AppContext) {
  return express.Router({ mergeParams: true }).post(
    '/',
    anyRole,
    sellSeveral,
    requireScopeOf(
      db,
      'That consignment',
      (d, res) => studioOf.consignment(d, sellSeveral.input(res).params.id),
      ...roles,
    ),
    async (_req, res) => {
      const { params, body } = sellSeveral.input(res);
      res.status(201).json(await recordSales(db, scopeOf(res), params.id, body, { appUrl }));
    },
  );
}

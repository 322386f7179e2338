import express from 'express';

import { quotePricePlan, quoteSplit } from '@/shared/money';
import { pricePlanRequestSchema, splitQuoteRequestSchema } from '@/shared/schemas/terms';

import { requireRole } from '../access/authenticate';
import { type AppContext } from '../context';
import { validate } from '../http/validate';

const split = validate({ body: splitQuoteRequestSchema });
const pricePlan = validate({ body: pricePlanRequestSchema });

/** The money engine on request: what a sale or a planned price yields under some terms. */
export function quotesRouter(_context: AppContext) {
  return express
    .Router()
    .use(requireRole('owner', 'assistant'))
    .post('/split', split, (_req, res) => {
      res.json(quoteSplit(split.input(res).body));
    })
    .post('/price-plan', pricePlan, (_req, res) => {
      res.json(quotePricePlan(pricePlan.input(res).body));
    });
}

import express from 'express';

import { bankMatchRequestSchema } from '@/shared/schemas/bank-import';

import { requireRole, scopeOf } from '../access/authenticate';
import { type AppContext } from '../context';
import { validate } from '../http/validate';
import { matchBankCredits } from './bank-imports.service';

const match = validate({ body: bankMatchRequestSchema });

/** `/api/bank-imports`: a bank statement's credits matched to the statements they pay (owner). */
export function bankImportsRouter({ db }: AppContext) {
  return express
    .Router()
    .use(requireRole('owner'))
    .post('/matches', match, async (_req, res) => {
      res.json(await matchBankCredits(db, scopeOf(res), match.input(res).body));
    });
}

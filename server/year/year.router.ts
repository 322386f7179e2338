import express, { type Response } from 'express';

import { yearQuerySchema } from '@/shared/schemas/year';

import { requireRole, scopeOf } from '../access/authenticate';
import { type Scope } from '../access/viewer';
import { type AppContext } from '../context';
import { type Db } from '../db/database';
import { validate } from '../http/validate';
import { paymentsCsv, salesCsv, statementsCsv } from './accounts-csv';
import { getYear } from './year.service';

const byYear = validate({ query: yearQuerySchema });

const files: Record<string, (db: Db, scope: Scope, year: number) => Promise<string>> = {
  'sales.csv': salesCsv,
  'payments.csv': paymentsCsv,
  'statements.csv': statementsCsv,
};

/** `/api/year`: the maker's year and the accountant's files; the owner's only (docs/domain.md). */
export function yearRouter({ db }: AppContext) {
  const router = express
    .Router()
    .use(requireRole('owner'))
    .get('/', byYear, async (_req, res) => {
      res.json(await getYear(db, scopeOf(res), byYear.input(res).query.year));
    });
  for (const [name, make] of Object.entries(files)) {
    router.get(`/${name}`, byYear, async (_req, res: Response) => {
      const { year } = byYear.input(res).query;
      res
        .type('text/csv; charset=utf-8')
        .attachment(`${name.replace('.csv', '')}-${year}.csv`)
        .set('Cache-Control', 'no-store')
        .send(await make(db, scopeOf(res), year));
    });
  }
  return router;
}

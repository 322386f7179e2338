import express from 'express';

import { requireRole, scopeOf } from '../access/authenticate';
import { type AppContext } from '../context';
import { getOverview } from './overview.service';

export function overviewRouter({ db }: AppContext) {
  return express
    .Router()
    .use(requireRole('owner', 'assistant'))
    .get('/', async (_req, res) => {
      res.json(await getOverview(db, scopeOf(res)));
    });
}

import express from 'express';

import { requireRole, scopeOf } from '../access/authenticate';
import { type AppContext } from '../context';
import { getVenueHome } from './venue-home.service';

/** The gallery side's home: the consignments its venue holds from the active studio. */
export function venueHomeRouter({ db }: AppContext) {
  return express
    .Router()
    .use(requireRole('gallery'))
    .get('/consignments', async (_req, res) => {
      res.json(await getVenueHome(db, scopeOf(res)));
    });
}

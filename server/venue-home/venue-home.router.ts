import express from 'express';

import { lineOnlyParamsSchema } from '@/shared/schemas/consignment';

import { requireRole, scopeOf } from '../access/authenticate';
import { type AppContext } from '../context';
import { validate } from '../http/validate';
import { getVenueHome, getVenuePiece } from './venue-home.service';

const byLine = validate({ params: lineOnlyParamsSchema });

/** The gallery side: the consignments its venue holds from the active studio, and each piece. */
export function venueHomeRouter({ db }: AppContext) {
  return express
    .Router()
    .use(requireRole('gallery'))
    .get('/consignments', async (_req, res) => {
      res.json(await getVenueHome(db, scopeOf(res)));
    })
    .get('/lines/:lineId', byLine, async (_req, res) => {
      res.json(await getVenuePiece(db, scopeOf(res), byLine.input(res).params.lineId));
    });
}

import express from 'express';

import { consignmentParamsSchema, lineOnlyParamsSchema } from '@/shared/schemas/consignment';
import { venuePiecesQuerySchema } from '@/shared/schemas/venue-side';

import { scopeOf, viewerOf } from '../access/authenticate';
import { requireAnyRole, requireScopeOf } from '../access/resource-scope';
import { studioOf } from '../access/resource-studio.repository';
import { type AppContext } from '../context';
import { validate } from '../http/validate';
import {
  getVenueConsignment,
  getVenueHome,
  getVenuePiece,
  getVenuePieces,
} from './venue-home.service';

const byLine = validate({ params: lineOnlyParamsSchema });
const byConsignment = validate({ params: consignmentParamsSchema });
const search = validate({ query: venuePiecesQuerySchema });

/**
 * The gallery side, across every studio the person works with as a venue's staff: a scanned
 * label opens its piece whichever studio is active.
 */
export function venueHomeRouter({ db }: AppContext) {
  const lineScope = requireScopeOf(
    db,
    'That piece',
    (d, res) => studioOf.line(d, byLine.input(res).params.lineId),
    'gallery',
  );
  const consignmentScope = requireScopeOf(
    db,
    'That consignment',
    (d, res) => studioOf.consignment(d, byConsignment.input(res).params.id),
    'gallery',
  );
  return express
    .Router()
    .use(requireAnyRole('gallery'))
    .get('/consignments', async (_req, res) => {
      res.json(await getVenueHome(db, viewerOf(res)));
    })
    .get('/consignments/:id', byConsignment, consignmentScope, async (_req, res) => {
      const { id } = byConsignment.input(res).params;
      res.json(await getVenueConsignment(db, scopeOf(res), id));
    })
    .get('/pieces', search, async (_req, res) => {
      res.json(await getVenuePieces(db, viewerOf(res), search.input(res).query.q ?? ''));
    })
    .get('/lines/:lineId', byLine, lineScope, async (_req, res) => {
      res.json(await getVenuePiece(db, scopeOf(res), byLine.input(res).params.lineId));
    });
}

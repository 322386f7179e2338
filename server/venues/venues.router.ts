import express from 'express';

import {
  venueCreateSchema,
  type VenueList,
  venueListQuerySchema,
  venueUpdateSchema,
} from '@/shared/schemas/venue';
import { idParamsSchema } from '@/shared/schemas/work';

import { requireRole, scopeOf } from '../access/authenticate';
import { type Scope } from '../access/viewer';
import { type AppContext } from '../context';
import { HttpError } from '../http/http-error';
import { validate } from '../http/validate';
import { toVenue } from './venues.mapper';
import { listVenueRows } from './venues.repository';
import { createVenue, getVenueDetail, updateVenue } from './venues.service';

const list = validate({ query: venueListQuerySchema });
const create = validate({ body: venueCreateSchema });
const byId = validate({ params: idParamsSchema });
const update = validate({ params: idParamsSchema, body: venueUpdateSchema });

/** Venues' terms are the owner's to set (docs/domain.md, roles); an assistant keeps the details. */
function checkTermsAllowed(scope: Scope, body: { defaultTerms?: unknown }) {
  if (body.defaultTerms !== undefined && scope.role !== 'owner') {
    throw new HttpError('forbidden', 'Only the studio’s owner can set a venue’s terms.');
  }
}

/** `/api/venues`: where the studio sends work, with the terms each starts from. */
export function venuesRouter({ db }: AppContext) {
  return express
    .Router()
    .use(requireRole('owner', 'assistant'))
    .get('/', list, async (_req, res) => {
      const rows = await listVenueRows(db, scopeOf(res), list.input(res).query.archived);
      const body: VenueList = { items: rows.map(toVenue), total: rows.length };
      res.json(body);
    })
    .post('/', create, async (_req, res) => {
      const { body } = create.input(res);
      checkTermsAllowed(scopeOf(res), body);
      res.status(201).json(await createVenue(db, scopeOf(res), body));
    })
    .get('/:id', byId, async (_req, res) => {
      res.json(await getVenueDetail(db, scopeOf(res), byId.input(res).params.id));
    })
    .patch('/:id', update, async (_req, res) => {
      const { params, body } = update.input(res);
      checkTermsAllowed(scopeOf(res), body);
      res.json(await updateVenue(db, scopeOf(res), params.id, body));
    });
}

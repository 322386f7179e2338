import express from 'express';

import { type VenueHome } from '@/shared/schemas/overview';

import { requireRole, scopeOf } from '../access/authenticate';
import { scoped } from '../access/scoped';
import { listConsignmentSummaries } from '../consignments/consignments.repository';
import { type AppContext } from '../context';
import { notFound } from '../http/http-error';

/** The gallery side's home: the consignments its venue holds from the active studio. */
export function venueHomeRouter({ db }: AppContext) {
  return express
    .Router()
    .use(requireRole('gallery'))
    .get('/consignments', async (_req, res) => {
      const scope = scopeOf(res);
      const venue = await scoped
        .venues(db, scope)
        .innerJoin('studios', 'studios.id', 'venues.studio_id')
        .select([
          'venues.id',
          'venues.name',
          'studios.id as studio_id',
          'studios.name as studio_name',
        ])
        .executeTakeFirst();
      if (!venue) throw notFound('Your venue');
      const body: VenueHome = {
        studio: { id: venue.studio_id, name: venue.studio_name },
        venue: { id: venue.id, name: venue.name },
        consignments: await listConsignmentSummaries(db, scope),
      };
      res.json(body);
    });
}

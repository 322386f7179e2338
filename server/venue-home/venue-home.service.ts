import { type VenueHome } from '@/shared/schemas/overview';

import { type Scope } from '../access/viewer';
import { listConsignmentSummaries } from '../consignments/consignments.repository';
import { type Db } from '../db/database';
import { notFound } from '../http/http-error';
import { findVenueWithStudio } from '../venues/venues.repository';

/** The gallery side's home: the consignments its venue holds from the active studio. */
export async function getVenueHome(db: Db, scope: Scope): Promise<VenueHome> {
  const venue = await findVenueWithStudio(db, scope);
  if (!venue) throw notFound('Your venue');
  return {
    studio: { id: venue.studio_id, name: venue.studio_name },
    venue: { id: venue.id, name: venue.name },
    consignments: await listConsignmentSummaries(db, scope),
  };
}

import { type VenuePiece } from '@/shared/schemas/consignment';
import { type VenueHome } from '@/shared/schemas/overview';

import { type Scope } from '../access/viewer';
import { listConsignmentSummaries } from '../consignments/consignments.repository';
import { getConsignment } from '../consignments/consignments.service';
import { type Db } from '../db/database';
import { notFound } from '../http/http-error';
import { findVenueWithStudio } from '../venues/venues.repository';
import { findConsignmentOfLine } from './venue-home.repository';

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

/** One piece the venue holds, as its shelf label's QR code opens it. */
export async function getVenuePiece(db: Db, scope: Scope, lineId: number): Promise<VenuePiece> {
  const consignmentId = await findConsignmentOfLine(db, scope, lineId);
  const venue = await findVenueWithStudio(db, scope);
  if (consignmentId === undefined || !venue) throw notFound('That piece');
  const consignment = await getConsignment(db, scope, consignmentId);
  const line = consignment.lines.find((l) => l.id === lineId);
  if (!line) throw notFound('That piece');
  return {
    studio: { id: venue.studio_id, name: venue.studio_name },
    consignment: {
      id: consignment.id,
      reference: consignment.reference,
      title: consignment.title,
      state: consignment.state,
    },
    line,
  };
}

import { type VenuePiece } from '@/shared/schemas/consignment';
import { type Membership } from '@/shared/schemas/membership';
import {
  type VenueConsignment,
  type VenueCounterPiece,
  type VenueHome,
  type VenuePieces,
} from '@/shared/schemas/venue-side';

import { type Scope, scopeFor, type Viewer } from '../access/viewer';
import { listConsignmentSummaries } from '../consignments/consignments.repository';
import { getConsignment } from '../consignments/consignments.service';
import { type Db } from '../db/database';
import { notFound } from '../http/http-error';
import { findVenueWithStudio } from '../venues/venues.repository';
import { countVenuePieces, findConsignmentOfLine, listVenuePieces } from './venue-home.repository';

/** A Scope for each studio the person works with as a venue's staff, whichever is active. */
function galleryScopes(viewer: Viewer): Scope[] {
  return viewer.memberships
    .filter((m: Membership) => m.role === 'gallery')
    .map((m) => scopeFor({ ...viewer, active: m }));
}

async function venueOf(db: Db, scope: Scope) {
  const venue = await findVenueWithStudio(db, scope);
  if (!venue) throw notFound('Your venue');
  return venue;
}

/** The gallery side's home: what the person's venues hold, from every studio they work with. */
export async function getVenueHome(db: Db, viewer: Viewer): Promise<VenueHome> {
  const home: VenueHome = { places: [], consignments: [] };
  for (const scope of galleryScopes(viewer)) {
    const venue = await venueOf(db, scope);
    const studio = { id: venue.studio_id, name: venue.studio_name };
    home.places.push({ studio, venue: { id: venue.id, name: venue.name } });
    const consignments = await listConsignmentSummaries(db, scope);
    home.consignments.push(...consignments.map((c) => ({ ...c, studio })));
  }
  return home;
}

/**
 * The counter list: every piece the person's venues hold from all their studios, each marked
 * with its maker; pieces still out first.
 */
export async function getVenuePieces(db: Db, viewer: Viewer, search = ''): Promise<VenuePieces> {
  const items: VenueCounterPiece[] = [];
  const counts: VenuePieces['counts'] = {};
  for (const scope of galleryScopes(viewer)) {
    const venue = await venueOf(db, scope);
    for (const row of await listVenuePieces(db, scope, search)) {
      items.push({
        studio: { id: venue.studio_id, name: venue.studio_name },
        consignment: {
          id: row.consignment_id,
          reference: row.reference,
          title: row.consignment_title,
          state: row.consignment_state,
        },
        line: {
          id: row.id,
          stockNumber: row.stock_number,
          title: row.title,
          thumbnailUrl:
            row.cover_photo_id === null ? null : `/api/photos/${row.cover_photo_id}/thumbnail`,
          listPrice: { amount: row.list_price, currency: row.currency },
          state: row.state,
          soldOn: row.sold_on,
          salePrice:
            row.sale_price === null ? null : { amount: row.sale_price, currency: row.currency },
        },
      });
    }
    for (const { state, count } of await countVenuePieces(db, scope)) {
      counts[state] = (counts[state] ?? 0) + Number(count);
    }
  }
  const out = (p: VenueCounterPiece) => (p.line.state === 'consigned' ? 0 : 1);
  items.sort((a, b) => out(a) - out(b));
  return { items, counts };
}

/** One consignment as its venue sees it, with its maker, in the consignment's own studio. */
export async function getVenueConsignment(
  db: Db,
  scope: Scope,
  id: number,
): Promise<VenueConsignment> {
  const venue = await venueOf(db, scope);
  const consignment = await getConsignment(db, scope, id);
  return { ...consignment, studio: { id: venue.studio_id, name: venue.studio_name } };
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
      dispatchDate: consignment.dispatchDate,
      terms: consignment.terms,
      today: consignment.today,
    },
    line,
  };
}

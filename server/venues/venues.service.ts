import {
  type Venue,
  type VenueCreateParsed,
  venueCreateSchema,
  type VenueDetail,
  type VenueUpdateParsed,
} from '@/shared/schemas/venue';

import { type Scope } from '../access/viewer';
import { listConsignmentSummaries } from '../consignments/consignments.repository';
import { type Db } from '../db/database';
import { notFound } from '../http/http-error';
import { studioDefaultTerms } from '../studio/studio.mapper';
import { getStudio } from '../studio/studio.service';
import { toVenue, toVenueDraft, toVenueRow } from './venues.mapper';
import { findVenueRow, insertVenue, listVenueStaff, updateVenueRow } from './venues.repository';

export async function getVenue(db: Db, scope: Scope, id: number): Promise<Venue> {
  const row = await findVenueRow(db, scope, id);
  if (!row) throw notFound('That venue');
  return toVenue(row);
}

/** A new venue; without terms it starts from the studio's default terms. */
export async function createVenue(db: Db, scope: Scope, input: VenueCreateParsed): Promise<Venue> {
  const defaultTerms = input.defaultTerms ?? studioDefaultTerms(await getStudio(db, scope));
  const id = await insertVenue(db, scope, toVenueRow({ ...input, defaultTerms }));
  return getVenue(db, scope, id);
}

/**
 * Applies the fields sent, then checks the whole venue again, so a postcode is checked against
 * the venue's country even when only one of them changes.
 */
export async function updateVenue(
  db: Db,
  scope: Scope,
  id: number,
  input: VenueUpdateParsed,
): Promise<Venue> {
  const current = await getVenue(db, scope, id);
  const sent = Object.fromEntries(Object.entries(input).filter(([, v]) => v !== undefined));
  const merged = venueCreateSchema.parse({ ...toVenueDraft(current), ...sent });
  await updateVenueRow(
    db,
    scope,
    id,
    toVenueRow({ ...merged, defaultTerms: merged.defaultTerms ?? current.defaultTerms }),
  );
  return getVenue(db, scope, id);
}

export async function getVenueDetail(db: Db, scope: Scope, id: number): Promise<VenueDetail> {
  const venue = await getVenue(db, scope, id);
  return {
    venue,
    consignments: await listConsignmentSummaries(db, scope, { venueId: id }),
    staff: await listVenueStaff(db, scope, id),
  };
}

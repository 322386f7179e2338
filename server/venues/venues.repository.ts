import { sql } from 'kysely';

import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { ignoringCase } from '../db/dialect';
import { type NewVenueRow } from '../db/schema/venues';
import { type VenueColumns } from './venues.mapper';

const columns = [
  'venues.id',
  'venues.name',
  'venues.kind',
  'venues.address_line1',
  'venues.address_line2',
  'venues.town',
  'venues.postcode',
  'venues.country',
  'venues.contact_name',
  'venues.email',
  'venues.phone',
  'venues.vat_number',
  'venues.default_terms',
  'venues.notes',
  'venues.archived_at',
  'venues.created_at',
  'venues.updated_at',
] as const;

export async function listVenueRows(
  db: Db,
  scope: Scope,
  archived: 'exclude' | 'include' | 'only',
): Promise<VenueColumns[]> {
  let q = scoped.venues(db, scope).select(columns);
  if (archived === 'exclude') q = q.where('venues.archived_at', 'is', null);
  if (archived === 'only') q = q.where('venues.archived_at', 'is not', null);
  return q
    .orderBy(ignoringCase(db, sql.ref('venues.name')))
    .orderBy('venues.id')
    .execute();
}

export async function findVenueRow(
  db: Db,
  scope: Scope,
  id: number,
): Promise<VenueColumns | undefined> {
  return scoped.venues(db, scope).select(columns).where('venues.id', '=', id).executeTakeFirst();
}

export async function insertVenue(
  db: Db,
  scope: Scope,
  row: Omit<NewVenueRow, 'studio_id'>,
): Promise<number> {
  const { id } = await db
    .insertInto('venues')
    .values({ ...row, studio_id: scope.studioId })
    .returning('id')
    .executeTakeFirstOrThrow();
  return id;
}

export async function updateVenueRow(
  db: Db,
  scope: Scope,
  id: number,
  row: Omit<NewVenueRow, 'studio_id'>,
): Promise<void> {
  await db
    .updateTable('venues')
    .set({ ...row, updated_at: new Date().toISOString() })
    .where('venues.studio_id', '=', scope.studioId)
    .where('venues.id', '=', id)
    .execute();
}

/** People with a gallery membership for the venue: who may sign in for it. */
export async function listVenueStaff(db: Db, scope: Scope, venueId: number) {
  return scoped
    .memberships(db, scope)
    .innerJoin('users', 'users.id', 'memberships.user_id')
    .select(['users.id as userId', 'users.name', 'users.email'])
    .where('memberships.role', '=', 'gallery')
    .where('memberships.venue_id', '=', venueId)
    .orderBy(ignoringCase(db, sql.ref('users.name')))
    .execute();
}

/** The venue a gallery member works for, with its studio's name: the venue side's heading. */
export async function findVenueWithStudio(db: Db, scope: Scope) {
  return scoped
    .venues(db, scope)
    .innerJoin('studios', 'studios.id', 'venues.studio_id')
    .select(['venues.id', 'venues.name', 'studios.id as studio_id', 'studios.name as studio_name'])
    .executeTakeFirst();
}

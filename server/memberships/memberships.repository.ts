import { type Membership } from '@/shared/schemas/membership';

import { type Db } from '../db/database';

/** Every membership of one person, with the names the client shows. */
export async function listMembershipsOfUser(db: Db, userId: string): Promise<Membership[]> {
  const rows = await db
    .selectFrom('memberships')
    .innerJoin('studios', 'studios.id', 'memberships.studio_id')
    .leftJoin('venues', (join) =>
      join
        .onRef('venues.id', '=', 'memberships.venue_id')
        .onRef('venues.studio_id', '=', 'memberships.studio_id'),
    )
    .select([
      'memberships.id',
      'memberships.studio_id',
      'studios.name as studio_name',
      'memberships.role',
      'memberships.venue_id',
      'venues.name as venue_name',
    ])
    .where('memberships.user_id', '=', userId)
    .orderBy('studios.name')
    .orderBy('memberships.id')
    .execute();
  return rows.map((r) => ({
    id: r.id,
    studioId: r.studio_id,
    studioName: r.studio_name,
    role: r.role,
    venueId: r.venue_id,
    venueName: r.venue_name,
  }));
}

export async function addMembership(
  db: Db,
  membership: Pick<Membership, 'studioId' | 'role' | 'venueId'> & { userId: string },
): Promise<number> {
  const { id } = await db
    .insertInto('memberships')
    .values({
      user_id: membership.userId,
      studio_id: membership.studioId,
      role: membership.role,
      venue_id: membership.venueId,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return id;
}

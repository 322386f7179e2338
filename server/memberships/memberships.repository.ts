import { type Membership } from '@/shared/schemas/membership';

import { type Db } from '../db/database';

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

import { type Membership } from '@/shared/schemas/membership';

import { type Db } from '../db/database';

/**
 * A live session by its token, with its person and every membership, in one query: what each
 * request needs to know who is asking. An expired or signed-out session answers undefined.
 */
export async function findLiveSession(db: Db, token: string, now: Date) {
  const rows = await db
    .selectFrom('sessions')
    .innerJoin('users', 'users.id', 'sessions.user_id')
    .leftJoin('memberships', 'memberships.user_id', 'users.id')
    .leftJoin('studios', 'studios.id', 'memberships.studio_id')
    .leftJoin('venues', (join) =>
      join
        .onRef('venues.id', '=', 'memberships.venue_id')
        .onRef('venues.studio_id', '=', 'memberships.studio_id'),
    )
    .select([
      'sessions.id as session_id',
      'sessions.expires_at',
      'sessions.active_membership_id',
      'users.id as user_id',
      'users.name as user_name',
      'users.email as user_email',
      'memberships.id as membership_id',
      'memberships.studio_id',
      'studios.name as studio_name',
      'memberships.role',
      'memberships.venue_id',
      'venues.name as venue_name',
    ])
    .where('sessions.token', '=', token)
    .where('sessions.expires_at', '>', now.toISOString())
    .orderBy('studios.name')
    .orderBy('memberships.id')
    .execute();
  const first = rows[0];
  if (!first) return undefined;
  const memberships: Membership[] = [];
  for (const r of rows) {
    if (r.membership_id === null || r.studio_id === null || r.role === null) continue;
    memberships.push({
      id: r.membership_id,
      studioId: r.studio_id,
      studioName: r.studio_name ?? '',
      role: r.role,
      venueId: r.venue_id,
      venueName: r.venue_name,
    });
  }
  return {
    sessionId: first.session_id,
    expiresAt: first.expires_at,
    activeMembershipId: first.active_membership_id,
    user: { id: first.user_id, name: first.user_name, email: first.user_email },
    memberships,
  };
}

export async function setActiveMembershipId(
  db: Db,
  sessionId: string,
  membershipId: number,
): Promise<void> {
  await db
    .updateTable('sessions')
    .set({ active_membership_id: membershipId })
    .where('id', '=', sessionId)
    .execute();
}

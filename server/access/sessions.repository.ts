import { type CompiledQuery } from 'kysely';

import { type Membership } from '@/shared/schemas/membership';

import { type Db } from '../db/database';

function liveSessionQuery(db: Db, token: string, nowIso: string) {
  return db
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
    .where('sessions.expires_at', '>', nowIso)
    .orderBy('studios.name')
    .orderBy('memberships.id');
}

type LiveSessionRow = Awaited<ReturnType<ReturnType<typeof liveSessionQuery>['execute']>>[number];

/**
 * The session query is built and compiled once per database and run with each request's token:
 * every API request asks it, and building it anew cost more than running it.
 */
const compiledSessionQueries = new WeakMap<Db, CompiledQuery<LiveSessionRow>>();
const tokenSlot = '\u0000token';
const nowSlot = '\u0000now';

/**
 * A live session by its token, with its person and every membership, in one query: what each
 * request needs to know who is asking. An expired or signed-out session answers undefined.
 */
export async function findLiveSession(db: Db, token: string, now: Date) {
  let compiled = compiledSessionQueries.get(db);
  if (!compiled) {
    compiled = liveSessionQuery(db, tokenSlot, nowSlot).compile();
    compiledSessionQueries.set(db, compiled);
  }
  const nowIso = now.toISOString();
  const parameters = compiled.parameters.map((p) =>
    p === tokenSlot ? token : p === nowSlot ? nowIso : p,
  );
  const { rows } = await db.executeQuery<LiveSessionRow>({ ...compiled, parameters });
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

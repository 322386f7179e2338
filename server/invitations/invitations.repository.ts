import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';

/** A new invitation for a venue's staff; the token's hash is kept, never the token. */
export async function insertInvitation(
  db: Db,
  scope: Scope,
  invitation: { email: string; venueId: number; tokenHash: string; expiresAt: string },
): Promise<number> {
  const { id } = await db
    .insertInto('invitations')
    .values({
      studio_id: scope.studioId,
      email: invitation.email,
      role: 'gallery',
      venue_id: invitation.venueId,
      token_hash: invitation.tokenHash,
      invited_by: scope.userId,
      expires_at: invitation.expiresAt,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return id;
}

/**
 * An invitation by its token's hash, with its studio and venue names. Unscoped on purpose: the
 * person holding the link is not signed in; the token is what admits them.
 */
export async function findInvitationByHash(db: Db, tokenHash: string) {
  return db
    .selectFrom('invitations')
    .innerJoin('studios', 'studios.id', 'invitations.studio_id')
    .leftJoin('venues', 'venues.id', 'invitations.venue_id')
    .select([
      'invitations.id',
      'invitations.studio_id',
      'invitations.email',
      'invitations.role',
      'invitations.venue_id',
      'invitations.expires_at',
      'invitations.accepted_at',
      'studios.name as studio_name',
      'venues.name as venue_name',
    ])
    .where('invitations.token_hash', '=', tokenHash)
    .executeTakeFirst();
}

/** Marks an invitation used, once: answers whether this call was the one that used it. */
export async function markAccepted(db: Db, id: number, at: string): Promise<boolean> {
  const result = await db
    .updateTable('invitations')
    .set({ accepted_at: at })
    .where('id', '=', id)
    .where('accepted_at', 'is', null)
    .executeTakeFirst();
  return Number(result.numUpdatedRows) === 1;
}

/** Whether someone with this e-mail already signs in for the venue. */
export async function isVenueMember(db: Db, scope: Scope, venueId: number, email: string) {
  const row = await scoped
    .memberships(db, scope)
    .innerJoin('users', 'users.id', 'memberships.user_id')
    .select('memberships.id')
    .where('memberships.venue_id', '=', venueId)
    .where('users.email', '=', email.toLowerCase())
    .executeTakeFirst();
  return row !== undefined;
}

export async function findUserByEmail(db: Db, email: string) {
  return db
    .selectFrom('users')
    .select(['users.id', 'users.name', 'users.email'])
    .where('users.email', '=', email.toLowerCase())
    .executeTakeFirst();
}

/** Adds a membership unless the person already has one in the studio (then undefined). */
export async function insertMembershipIfNone(
  db: Db,
  membership: { userId: string; studioId: number; venueId: number },
): Promise<number | undefined> {
  const row = await db
    .insertInto('memberships')
    .values({
      user_id: membership.userId,
      studio_id: membership.studioId,
      role: 'gallery',
      venue_id: membership.venueId,
    })
    .onConflict((oc) => oc.columns(['user_id', 'studio_id']).doNothing())
    .returning('id')
    .executeTakeFirst();
  return row?.id;
}

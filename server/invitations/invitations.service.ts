import { createHash, randomBytes } from 'node:crypto';

import { type InvitationAccept, type InvitationSummary } from '@/shared/schemas/invitation';

import { type Scope } from '../access/viewer';
import { createUserWithPassword, passwordMatches } from '../auth/passwords';
import { type Db } from '../db/database';
import { HttpError } from '../http/http-error';
import {
  findInvitationByHash,
  findUserByEmail,
  insertInvitation,
  insertMembershipIfNone,
  isVenueMember,
  markAccepted,
} from './invitations.repository';

/** An invitation link works for 14 days, once. */
export const invitationLifetimeDays = 14;

const hashOf = (token: string) => createHash('sha256').update(token).digest('hex');

/**
 * Invites the venue's contact to sign in as its staff, inside the caller's transaction: answers
 * the token for the link, or null when there is nobody to invite (no e-mail, or already staff).
 */
export async function inviteVenueStaff(
  trx: Db,
  scope: Scope,
  venue: { id: number; email: string | null },
  now = new Date(),
): Promise<{ token: string; expiresAt: string } | null> {
  if (!venue.email || (await isVenueMember(trx, scope, venue.id, venue.email))) return null;
  const token = randomBytes(32).toString('base64url');
  const expiresAt = new Date(now.getTime() + invitationLifetimeDays * 86_400_000).toISOString();
  await insertInvitation(trx, scope, {
    email: venue.email.toLowerCase(),
    venueId: venue.id,
    tokenHash: hashOf(token),
    expiresAt,
  });
  return { token, expiresAt };
}

function stateOf(invitation: { accepted_at: string | null; expires_at: string }, now: Date) {
  if (invitation.accepted_at !== null) return 'used' as const;
  return invitation.expires_at <= now.toISOString() ? ('expired' as const) : ('open' as const);
}

const unknownLink = () =>
  new HttpError(
    'not_found',
    'This invitation link is not one Saggar knows. Ask the studio to send a new one.',
  );

/** What the invitation page shows before anyone types anything. */
export async function lookupInvitation(db: Db, token: string): Promise<InvitationSummary> {
  const invitation = await findInvitationByHash(db, hashOf(token));
  if (!invitation) throw unknownLink();
  return {
    state: stateOf(invitation, new Date()),
    email: invitation.email,
    studioName: invitation.studio_name,
    venueName: invitation.venue_name,
    expiresAt: invitation.expires_at,
    existingAccount: (await findUserByEmail(db, invitation.email)) !== undefined,
  };
}

/**
 * Joins the invited person as the venue's staff, once: a new account with the name and password
 * given, or, for an e-mail that has one, a membership added to it once its password is given.
 * Answers the e-mail, to sign in with.
 */
export async function acceptInvitation(db: Db, input: InvitationAccept): Promise<string> {
  return db.transaction().execute(async (trx) => {
    const invitation = await findInvitationByHash(trx, hashOf(input.token));
    if (!invitation || invitation.venue_id === null) throw unknownLink();
    const state = stateOf(invitation, new Date());
    if (state === 'used') {
      throw new HttpError(
        'conflict',
        'This invitation has been used already. Sign in with your e-mail address and password.',
      );
    }
    if (state === 'expired') {
      throw new HttpError(
        'conflict',
        `This invitation expired on ${invitation.expires_at.slice(0, 10)}. Ask the studio to send a new one.`,
      );
    }
    const existing = await findUserByEmail(trx, invitation.email);
    let userId: string;
    if (existing) {
      if (!(await passwordMatches(trx, existing.id, input.password))) {
        throw new HttpError('invalid_credentials', 'Some fields need attention.', [
          {
            path: ['password'],
            message: `${invitation.email} already has an account: enter its password.`,
          },
        ]);
      }
      userId = existing.id;
    } else {
      if (!input.name) {
        throw new HttpError('invalid_request', 'Some fields need attention.', [
          { path: ['name'], message: 'Enter your name.' },
        ]);
      }
      userId = await createUserWithPassword(trx, {
        name: input.name,
        email: invitation.email,
        password: input.password,
      });
    }
    const membership = await insertMembershipIfNone(trx, {
      userId,
      studioId: invitation.studio_id,
      venueId: invitation.venue_id,
    });
    if (membership === undefined) {
      throw new HttpError(
        'conflict',
        `${invitation.email} already belongs to ${invitation.studio_name}. Sign in instead.`,
      );
    }
    if (!(await markAccepted(trx, invitation.id, new Date().toISOString()))) {
      throw new HttpError('conflict', 'This invitation has been used already.');
    }
    return invitation.email;
  });
}

import { setTimeout as sleep } from 'node:timers/promises';

import { isAPIError } from 'better-auth/api';

import { type PasswordReset, type PasswordResetLink } from '@/shared/schemas/password-reset';

import { type AppContext } from '../context';
import { type Db } from '../db/database';
import { HttpError } from '../http/http-error';
import { enqueueMail } from '../mail/outbox.repository';
import { passwordResetMail } from '../mail/templates/password-reset';
import { findLinkHistory, recordLinkSent, recordLinkUsed } from './password-reset-links.repository';
import { countResetRequest } from './reset-requests';
import { accountAttemptsKey } from './sign-in-attempts';
import { forgetAttempts } from './sign-in-limits.repository';

/** A link to choose a new password works once, for this long (better-auth's token lifetime). */
export const resetLinkLifetimeMinutes = 60;

/**
 * A request is answered no sooner than this after it arrived, so that an address with an account
 * (a token made, an e-mail written) takes as long to answer as one without.
 */
export const resetAnswerFloorMs = 500;

/** How long a link's history is kept, so one opened days later still says what became of it. */
const historyMs = 30 * 24 * 60 * 60 * 1000;

type ResetContext = Pick<AppContext, 'db' | 'auth'>;

/**
 * better-auth's `sendResetPassword`: writes the e-mail with the link to the outbox, with no
 * studio (so no studio's Sent mail lists it), and the link's history in the same transaction.
 */
export async function sendResetLink(
  db: Db,
  appUrl: string,
  { user, token }: { user: { id: string; name: string; email: string }; token: string },
  now = new Date(),
): Promise<void> {
  const { subject, html, text } = passwordResetMail({
    name: user.name,
    email: user.email,
    url: `${appUrl}/reset-password/${token}`,
    lifetimeMinutes: resetLinkLifetimeMinutes,
  });
  await db.transaction().execute(async (trx) => {
    await recordLinkSent(trx, token, user.id, new Date(now.getTime() + historyMs));
    await enqueueMail(
      trx,
      { studioId: null, kind: 'password-reset', to: user.email, subject, text, html },
      now,
    );
  });
}

/**
 * Counts the request, then has better-auth send a link if the address has an account. Answers
 * the refusal when over a limit; otherwise nothing, whatever it found.
 */
export async function requestPasswordReset(
  { db, auth }: ResetContext,
  email: string,
  address: string,
) {
  const started = Date.now();
  const counted = await countResetRequest(db, email, address);
  if (counted.refused) return counted;
  await auth.api.requestPasswordReset({ body: { email } });
  await sleep(Math.max(0, started + resetAnswerFloorMs - Date.now()));
  return null;
}

type LinkState =
  { state: 'open'; email: string; userId: string; expiresAt: Date } | { state: 'used' | 'expired' };

/**
 * A link as better-auth holds it (its row, `reset-password:<token>`, until used or cleaned away
 * after expiry), or else as its history tells.
 */
async function findLink({ db, auth }: ResetContext, token: string): Promise<LinkState> {
  const { internalAdapter } = await auth.$context;
  const held = await internalAdapter.findVerificationValue(`reset-password:${token}`);
  if (held && held.expiresAt > new Date()) {
    const user = await internalAdapter.findUserById(held.value);
    if (user)
      return { state: 'open', email: user.email, userId: user.id, expiresAt: held.expiresAt };
  }
  const history = await findLinkHistory(db, token);
  if (history.used) return { state: 'used' };
  if (history.sent) return { state: 'expired' };
  throw new HttpError(
    'not_found',
    'This link is not one Saggar knows. Check that it was copied whole, or ask for a new one.',
  );
}

/** What the page shows before a password is typed. */
export async function lookupResetLink(
  context: ResetContext,
  token: string,
): Promise<PasswordResetLink> {
  const link = await findLink(context, token);
  return link.state === 'open' ? { state: 'open', email: link.email } : { state: link.state };
}

const closed = (state: 'used' | 'expired') =>
  new HttpError(
    'conflict',
    state === 'used'
      ? 'This link has been used already: the password was changed with it. Sign in, or ask for a new link.'
      : `This link has expired: a link works for ${resetLinkLifetimeMinutes} minutes. Ask for a new one.`,
  );

/**
 * Sets the new password through better-auth, which spends the link and signs the person out
 * everywhere; their failed sign-ins are forgotten, since they have just proved who they are.
 */
export async function resetPassword(context: ResetContext, { token, password }: PasswordReset) {
  const link = await findLink(context, token);
  if (link.state !== 'open') throw closed(link.state);
  try {
    await context.auth.api.resetPassword({ body: { token, newPassword: password } });
  } catch (error) {
    // Spent a moment ago by another request, or run out in the meantime.
    if (isAPIError(error) && error.body?.code === 'INVALID_TOKEN') {
      throw closed(link.expiresAt > new Date() ? 'used' : 'expired');
    }
    throw error;
  }
  await recordLinkUsed(context.db, token, link.userId, new Date(Date.now() + historyMs));
  await forgetAttempts(context.db, accountAttemptsKey(link.email));
}

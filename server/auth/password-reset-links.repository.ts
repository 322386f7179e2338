import { createHash, randomUUID } from 'node:crypto';

import { type Db } from '../db/database';

/**
 * What became of each link to choose a new password, kept beside better-auth's own rows in
 * `verifications` (which it deletes once a link is used or has expired, so a link opened later
 * could not otherwise say which). Keyed by a hash of the token: the table holds no working link.
 * better-auth's clean-up removes these rows too once `expires_at` has passed.
 */
const keyOf = (event: 'sent' | 'used', token: string) =>
  `password-reset-${event}:${createHash('sha256').update(token).digest('hex')}`;

async function record(
  db: Db,
  event: 'sent' | 'used',
  token: string,
  userId: string,
  keepUntil: Date,
) {
  await db
    .insertInto('verifications')
    .values({
      id: randomUUID(),
      identifier: keyOf(event, token),
      value: userId,
      expires_at: keepUntil.toISOString(),
    })
    .execute();
}

export const recordLinkSent = (db: Db, token: string, userId: string, keepUntil: Date) =>
  record(db, 'sent', token, userId, keepUntil);

export const recordLinkUsed = (db: Db, token: string, userId: string, keepUntil: Date) =>
  record(db, 'used', token, userId, keepUntil);

/** Whether the link was sent, and whether it has been used, as far as its history reaches. */
export async function findLinkHistory(db: Db, token: string) {
  const rows = await db
    .selectFrom('verifications')
    .select('identifier')
    .where('identifier', 'in', [keyOf('sent', token), keyOf('used', token)])
    .execute();
  const has = (event: 'sent' | 'used') => rows.some((r) => r.identifier === keyOf(event, token));
  return { sent: has('sent'), used: has('used') };
}

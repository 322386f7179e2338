import { sql } from 'kysely';

import { type Db } from '../db/database';

/**
 * Counts one sign-in attempt under `key` and answers the count in the current window, which starts
 * again once it has ended. One statement, so attempts racing each other are all counted.
 */
export async function countAttempt(db: Db, key: string, now: Date, windowMs: number) {
  const nowIso = now.toISOString();
  const endsAt = new Date(now.getTime() + windowMs).toISOString();
  const expired = sql<boolean>`sign_in_limits.window_ends_at <= ${nowIso}`;
  return db
    .insertInto('sign_in_limits')
    .values({ key, hits: 1, window_ends_at: endsAt })
    .onConflict((oc) =>
      oc.column('key').doUpdateSet({
        hits: sql<number>`case when ${expired} then 1 else sign_in_limits.hits + 1 end`,
        window_ends_at: sql<string>`case when ${expired} then ${endsAt} else sign_in_limits.window_ends_at end`,
      }),
    )
    .returning(['hits', 'window_ends_at'])
    .executeTakeFirstOrThrow();
}

/** Takes back one attempt under `key`: a sign-in that succeeded does not count against it. */
export async function uncountAttempt(db: Db, key: string): Promise<void> {
  await db
    .updateTable('sign_in_limits')
    .set({ hits: sql<number>`hits - 1` })
    .where('key', '=', key)
    .where('hits', '>', 0)
    .execute();
}

/** Forgets the failures under `key`: the account's owner has just proved who they are. */
export async function forgetAttempts(db: Db, key: string): Promise<void> {
  await db.deleteFrom('sign_in_limits').where('key', '=', key).execute();
}

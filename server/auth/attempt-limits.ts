import { type Db } from '../db/database';
import { countAttempt } from './sign-in-limits.repository';

/** How many attempts an account and a client address may make in a window. */
export type AttemptLimit = { perAccount: number; perAddress: number; windowMs: number };

/**
 * Counts one attempt against an account's key and a client address's key, in the database (so
 * racing attempts and several processes all count), and answers whether either is over its limit
 * and how long until it clears: in seconds for Retry-After, in words for the message.
 */
export async function countAgainstLimits(
  db: Db,
  keys: { account: string; address: string },
  { perAccount, perAddress, windowMs }: AttemptLimit,
  now: Date,
) {
  const account = await countAttempt(db, keys.account, now, windowMs);
  const fromAddress = await countAttempt(db, keys.address, now, windowMs);
  const overAccount = account.hits > perAccount;
  const overAddress = fromAddress.hits > perAddress;
  // A window opened by a racing request that read the clock a moment later may end a moment
  // past a full window from now; nobody is told to wait longer than the window itself.
  const until = Math.min(
    now.getTime() + windowMs,
    Math.max(
      overAccount ? Date.parse(account.window_ends_at) : 0,
      overAddress ? Date.parse(fromAddress.window_ends_at) : 0,
    ),
  );
  const ms = until - now.getTime();
  const minutes = Math.max(1, Math.ceil(ms / 60_000));
  return {
    refused: overAccount || overAddress,
    overAccount,
    retryAfterSeconds: Math.max(1, Math.ceil(ms / 1000)),
    wait: `${minutes} ${minutes === 1 ? 'minute' : 'minutes'}`,
  };
}

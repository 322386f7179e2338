import { type Db } from '../db/database';
import { countAttempt } from './sign-in-limits.repository';
import { minutesToWait } from './wait-words';

/**
 * Requests for a link to choose a new password, per address asked for and per client address,
 * in an hour. Counted in the database whether or not the address has an account, so a refusal
 * tells nothing about it either.
 */
export const resetRequestLimit = { perAccount: 3, perAddress: 20, windowMs: 60 * 60 * 1000 };

/** Counts one request before it is acted on; answers whether it is over either limit. */
export async function countResetRequest(db: Db, email: string, address: string, now = new Date()) {
  const { perAccount, perAddress, windowMs } = resetRequestLimit;
  const account = await countAttempt(db, `reset-account:${email.toLowerCase()}`, now, windowMs);
  const fromAddress = await countAttempt(db, `reset-address:${address}`, now, windowMs);
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
  const wait = until - now.getTime();
  return {
    refused: overAccount || overAddress,
    retryAfterSeconds: Math.max(1, Math.ceil(wait / 1000)),
    message: overAccount
      ? `Links for this address have been asked for ${perAccount} times in the last hour. Use the newest e-mail, or wait ${minutesToWait(until, now.getTime())} and ask again.`
      : `Too many links have been asked for from here. Wait ${minutesToWait(until, now.getTime())} and try again.`,
  };
}

import { type Db } from '../db/database';
import { countAgainstLimits } from './attempt-limits';

/**
 * Requests for a link to choose a new password, per address asked for and per client address,
 * in an hour. Counted in the database whether or not the address has an account, so a refusal
 * tells nothing about it either.
 */
export const resetRequestLimit = { perAccount: 3, perAddress: 20, windowMs: 60 * 60 * 1000 };

/** Counts one request before it is acted on; answers whether it is over either limit. */
export async function countResetRequest(db: Db, email: string, address: string, now = new Date()) {
  const keys = {
    account: `reset-account:${email.toLowerCase()}`,
    address: `reset-address:${address}`,
  };
  const counted = await countAgainstLimits(db, keys, resetRequestLimit, now);
  return {
    refused: counted.refused,
    retryAfterSeconds: counted.retryAfterSeconds,
    message: counted.overAccount
      ? `Links for this address have been asked for ${resetRequestLimit.perAccount} times in the last hour. Use the newest e-mail, or wait ${counted.wait} and ask again.`
      : `Too many links have been asked for from here. Wait ${counted.wait} and try again.`,
  };
}

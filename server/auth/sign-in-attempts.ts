import { type AppContext } from '../context';
import { countAttempt, forgetAttempts, uncountAttempt } from './sign-in-limits.repository';
import { minutesToWait } from './wait-words';

/** Where an account's failed sign-ins are counted. */
export const accountAttemptsKey = (email: string) => `account:${email.toLowerCase()}`;

/**
 * Sign-in attempts counted per account and per client address before each attempt, in the
 * database (so racing attempts and several processes all count). A sign-in that succeeds takes
 * its attempt back and clears the account's failures; what is left counts failures only.
 */
export function signInAttempts({ db, signInLimit }: AppContext) {
  const { perAccount, perAddress, windowMs } = signInLimit;
  return {
    async count(email: string, address: string) {
      const now = new Date();
      const accountKey = accountAttemptsKey(email);
      const addressKey = `address:${address}`;
      const account = await countAttempt(db, accountKey, now, windowMs);
      const fromAddress = await countAttempt(db, addressKey, now, windowMs);
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
      const wait = minutesToWait(until, now.getTime());
      return {
        refused: overAccount || overAddress,
        retryAfterSeconds: Math.max(1, Math.ceil((until - now.getTime()) / 1000)),
        message: overAccount
          ? `Too many failed sign-ins for this account. Wait ${wait} and try again.`
          : `Too many failed sign-ins from here. Wait ${wait} and try again.`,
        async succeeded() {
          await forgetAttempts(db, accountKey);
          await uncountAttempt(db, addressKey);
        },
      };
    },
  };
}

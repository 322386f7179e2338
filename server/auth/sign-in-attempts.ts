import { type AppContext } from '../context';
import { countAgainstLimits } from './attempt-limits';
import { forgetAttempts, uncountAttempt } from './sign-in-limits.repository';

/** Where an account's failed sign-ins are counted. */
export const accountAttemptsKey = (email: string) => `account:${email.toLowerCase()}`;

/**
 * Sign-in attempts counted per account and per client address before each attempt, in the
 * database (so racing attempts and several processes all count). A sign-in that succeeds takes
 * its attempt back and clears the account's failures; what is left counts failures only.
 */
export function signInAttempts({ db, signInLimit }: AppContext) {
  return {
    async count(email: string, address: string) {
      const now = new Date();
      const accountKey = accountAttemptsKey(email);
      const addressKey = `address:${address}`;
      const counted = await countAgainstLimits(
        db,
        { account: accountKey, address: addressKey },
        signInLimit,
        now,
      );
      return {
        refused: counted.refused,
        retryAfterSeconds: counted.retryAfterSeconds,
        message: counted.overAccount
          ? `Too many failed sign-ins for this account. Wait ${counted.wait} and try again.`
          : `Too many failed sign-ins from here. Wait ${counted.wait} and try again.`,
        async succeeded() {
          await forgetAttempts(db, accountKey);
          await uncountAttempt(db, addressKey);
        },
      };
    },
  };
}

import { type RequestHandler } from 'express';
import { type Logger } from 'pino';

import { type AuthOptions, createAuth } from './auth/auth';
import { type Db } from './db/database';

/** Everything the app needs from outside, so tests can build it over an in-memory database. */
export type AppContext = {
  db: Db;
  auth: ReturnType<typeof createAuth>;
  logger: Logger;
  /** Serves everything outside /api: the exported web app, or Expo's dev server; null for none. */
  web: RequestHandler | null;
  trustedOrigins: readonly string[];
  /** Where people reach the app, e.g. https://saggar.example; null on a plain local install. */
  publicUrl: string | null;
  /** Where uploads live, by content hash: `<dataDir>/files` (a temporary folder in tests). */
  filesDir: string;
  /** Failed sign-ins allowed per client address in the window. */
  signInLimit: { max: number; windowMs: number };
};

export type ContextOptions = Omit<AppContext, 'auth' | 'signInLimit' | 'publicUrl'> &
  Pick<AuthOptions, 'secret'> &
  Partial<Pick<AuthOptions, 'publicUrl'>> &
  Partial<Pick<AppContext, 'signInLimit'>>;

export function createContext(options: ContextOptions): AppContext {
  const { secret, publicUrl = null, ...rest } = options;
  return {
    signInLimit: { max: 10, windowMs: 15 * 60 * 1000 },
    ...rest,
    publicUrl,
    auth: createAuth({
      db: options.db,
      logger: options.logger,
      secret,
      publicUrl,
      trustedOrigins: options.trustedOrigins,
    }),
  };
}

import { type Auth, betterAuth, type BetterAuthOptions } from 'better-auth';
import { createAuthMiddleware } from 'better-auth/api';
import { type Logger } from 'pino';

import { type Db } from '../db/database';
import { resetLinkLifetimeMinutes, sendResetLink } from './password-reset.service';
import { sessionLifetime } from './session-lifetime';

export type AuthOptions = {
  db: Db;
  logger: Logger;
  secret: string;
  /** Where people reach the app, e.g. https://saggar.example; null derives it per request. */
  publicUrl: string | null;
  /** Where links in e-mails point (the page that sets a new password). */
  appUrl: string;
  /** Origins besides the request's own that may call the auth endpoints (a dev server). */
  trustedOrigins: readonly string[];
};

/** Identity: e-mail and password sign-in and sessions, stored in our own tables. */
export function createAuth({
  db,
  logger,
  secret,
  publicUrl,
  appUrl,
  trustedOrigins,
}: AuthOptions): Auth<BetterAuthOptions> {
  const timestamps = { createdAt: 'created_at', updatedAt: 'updated_at' };
  return betterAuth({
    secret,
    ...(publicUrl ? { baseURL: publicUrl } : {}),
    trustedOrigins: [...trustedOrigins],
    // What better-auth calls 'sqlite' is how both of our databases store its fields: booleans as
    // 0/1, times as ISO-8601 text, no JSON or UUID columns (docs/databases.md). Its queries are
    // plain SQL, and its schema check reads the tables through Kysely's introspection, which
    // knows PostgreSQL too; 'postgres' would write true/false and Date values instead.
    database: { db, type: 'sqlite' },
    emailAndPassword: {
      enabled: true,
      // Accounts are made by the studio (demo seed, invitations), never by public sign-up.
      disableSignUp: true,
      // "Forgot password?": better-auth makes the one-time token; the e-mail goes by the outbox.
      sendResetPassword: ({ user, token }) => sendResetLink(db, appUrl, { user, token }),
      resetPasswordTokenExpiresIn: resetLinkLifetimeMinutes * 60,
      // Whoever knew the old password is signed out with everyone else.
      revokeSessionsOnPasswordReset: true,
    },
    // Failed sign-ins are limited by the Express app, in one place.
    rateLimit: { enabled: false },
    telemetry: { enabled: false },
    logger: { log: (level, message) => logger[level](message) },
    advanced: {
      cookiePrefix: 'saggar',
      // Checked in tests as in production: a state-changing request with a cookie needs an Origin.
      disableOriginCheck: false,
      // Served over HTTPS, the session cookie must never travel over plain HTTP.
      useSecureCookies: publicUrl?.startsWith('https://') ?? false,
      database: { generateId: () => crypto.randomUUID() },
    },
    user: {
      modelName: 'users',
      fields: { emailVerified: 'email_verified', ...timestamps },
    },
    session: {
      expiresIn: sessionLifetime.expiresInSeconds,
      updateAge: sessionLifetime.updateAgeSeconds,
      modelName: 'sessions',
      fields: {
        userId: 'user_id',
        expiresAt: 'expires_at',
        ipAddress: 'ip_address',
        userAgent: 'user_agent',
        ...timestamps,
      },
    },
    account: {
      modelName: 'accounts',
      fields: {
        userId: 'user_id',
        accountId: 'account_id',
        providerId: 'provider_id',
        accessToken: 'access_token',
        refreshToken: 'refresh_token',
        idToken: 'id_token',
        accessTokenExpiresAt: 'access_token_expires_at',
        refreshTokenExpiresAt: 'refresh_token_expires_at',
        ...timestamps,
      },
    },
    verification: {
      modelName: 'verifications',
      fields: { expiresAt: 'expires_at', ...timestamps },
      // Tokens are kept as hashes, as the invitations' are.
      storeIdentifier: 'hashed',
    },
    hooks: {
      after: createAuthMiddleware(async (ctx) => {
        const returned = ctx.context.returned;
        // The session token travels only in the HttpOnly cookie, never in a body scripts can read.
        if (ctx.path === '/sign-in/email' && !(returned instanceof Error)) {
          const { user } = returned as { user: { id: string; name: string; email: string } };
          return ctx.json({ user: { id: user.id, name: user.name, email: user.email } });
        }
      }),
    },
  }) as unknown as Auth<BetterAuthOptions>;
}

import { type Auth, betterAuth, type BetterAuthOptions } from 'better-auth';
import { APIError, createAuthMiddleware } from 'better-auth/api';
import { type Logger } from 'pino';

import { type ApiErrorBody, type ApiErrorCode } from '@/shared/schemas/api-error';
import { signInSchema } from '@/shared/schemas/session';

import { type Db } from '../db/database';
import { toHttpError } from '../http/error-handler';

export type AuthOptions = {
  db: Db;
  logger: Logger;
  secret: string;
  /** Where people reach the app, e.g. https://saggar.example; null derives it per request. */
  publicUrl: string | null;
  /** Origins besides the request's own that may call the auth endpoints (a dev server). */
  trustedOrigins: readonly string[];
};

const codeByStatus: Record<number, ApiErrorCode> = {
  400: 'invalid_request',
  401: 'unauthenticated',
  403: 'forbidden',
  404: 'not_found',
  429: 'too_many_requests',
};

function apiError(status: number, body: ApiErrorBody): APIError {
  return new APIError(status as never, body as never);
}

/** better-auth's own error bodies, rewritten into the API's one error shape. */
function normalised(error: APIError): APIError {
  const body = error.body as { code?: string; message?: string; error?: unknown } | undefined;
  if (body?.error) return error;
  const status = error.statusCode;
  const code: ApiErrorCode =
    body?.code === 'INVALID_EMAIL_OR_PASSWORD'
      ? 'invalid_credentials'
      : (codeByStatus[status] ?? 'internal');
  const message =
    code === 'invalid_credentials'
      ? 'That e-mail address and password do not match an account.'
      : code === 'internal'
        ? 'Something went wrong on our side. Try again.'
        : (body?.message ?? 'The request could not be completed.');
  return apiError(status, { error: { code, message } });
}

/** Identity: e-mail and password sign-in and sessions, stored in our SQLite tables. */
export function createAuth({
  db,
  logger,
  secret,
  publicUrl,
  trustedOrigins,
}: AuthOptions): Auth<BetterAuthOptions> {
  const timestamps = { createdAt: 'created_at', updatedAt: 'updated_at' };
  return betterAuth({
    secret,
    ...(publicUrl ? { baseURL: publicUrl } : {}),
    trustedOrigins: [...trustedOrigins],
    database: { db, type: 'sqlite' },
    // Accounts are made by the studio (demo seed, invitations), never by public sign-up.
    emailAndPassword: { enabled: true, disableSignUp: true },
    // Failed sign-ins are limited by the Express app, in one place.
    rateLimit: { enabled: false },
    telemetry: { enabled: false },
    logger: { log: (level, message) => logger[level](message) },
    advanced: {
      cookiePrefix: 'saggar',
      // Served over HTTPS, the session cookie must never travel over plain HTTP.
      useSecureCookies: publicUrl?.startsWith('https://') ?? false,
      database: { generateId: () => crypto.randomUUID() },
    },
    user: {
      modelName: 'users',
      fields: { emailVerified: 'email_verified', ...timestamps },
    },
    session: {
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
    },
    hooks: {
      before: createAuthMiddleware(async (ctx) => {
        if (ctx.path !== '/sign-in/email') return;
        const parsed = signInSchema.safeParse(ctx.body);
        if (!parsed.success) {
          const { message, issues } = toHttpError(parsed.error);
          throw apiError(400, {
            error: { code: 'invalid_request', message, ...(issues ? { issues } : {}) },
          });
        }
      }),
      after: createAuthMiddleware(async (ctx) => {
        const returned = ctx.context.returned;
        if (returned instanceof APIError) throw normalised(returned);
        // The session token travels only in the HttpOnly cookie, never in a body scripts can read.
        if (ctx.path === '/sign-in/email') {
          const { user } = returned as { user: { id: string; name: string; email: string } };
          return ctx.json({ user: { id: user.id, name: user.name, email: user.email } });
        }
      }),
    },
  }) as unknown as Auth<BetterAuthOptions>;
}

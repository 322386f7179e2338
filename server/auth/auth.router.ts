import express, { type RequestHandler } from 'express';
import { z } from 'zod';

import {
  passwordResetLookupQuerySchema,
  type PasswordResetRequested,
  passwordResetRequestSchema,
  passwordResetSchema,
} from '@/shared/schemas/password-reset';
import { signInSchema } from '@/shared/schemas/session';

import { requireSignedIn } from '../access/authenticate';
import { type AppContext } from '../context';
import { HttpError } from '../http/http-error';
import { validate } from '../http/validate';
import { passToAuth } from './auth-response';
import {
  lookupResetLink,
  requestPasswordReset,
  resetLinkLifetimeMinutes,
  resetPassword,
} from './password-reset.service';
import { signInAttempts } from './sign-in-attempts';

const signIn = validate({ body: signInSchema });
const signOut = validate({ body: z.strictObject({}) });
const requestReset = validate({ body: passwordResetRequestSchema });
const lookupReset = validate({ query: passwordResetLookupQuerySchema });
const reset = validate({ body: passwordResetSchema });

/**
 * `/api/auth`: only the endpoints the product uses (sign-in, sign-out, a new password by e-mail); the rest of better-auth answers 404. Bodies
 * are read and checked here, so every refusal has the API's one error shape.
 */
export function authRouter(context: AppContext, authenticate: RequestHandler) {
  const attempts = signInAttempts(context);
  return (
    express
      .Router()
      .use(express.json({ limit: '10kb' }))
      .post('/sign-in/email', signIn, async (req, res) => {
        const counted = await attempts.count(signIn.input(res).body.email, req.ip ?? 'unknown');
        if (counted.refused) {
          res.set('Retry-After', String(counted.retryAfterSeconds));
          throw new HttpError('too_many_requests', counted.message);
        }
        await passToAuth(context, req, res, counted.succeeded);
      })
      .post('/sign-out', authenticate, requireSignedIn, signOut, async (req, res) => {
        await passToAuth(context, req, res);
      })
      // "Forgot password?": the same answer whether or not the address has an account.
      .post('/request-password-reset', requestReset, async (req, res) => {
        const { email } = requestReset.input(res).body;
        const refused = await requestPasswordReset(context, email, req.ip ?? 'unknown');
        if (refused) {
          res.set('Retry-After', String(refused.retryAfterSeconds));
          throw new HttpError('too_many_requests', refused.message);
        }
        const body: PasswordResetRequested = { linkLifetimeMinutes: resetLinkLifetimeMinutes };
        res.status(202).json(body);
      })
      .get('/reset-password/lookup', lookupReset, async (_req, res) => {
        res.json(await lookupResetLink(context, lookupReset.input(res).query.token));
      })
      .post('/reset-password', reset, async (_req, res) => {
        await resetPassword(context, reset.input(res).body);
        res.status(204).end();
      })
  );
}

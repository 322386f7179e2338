import express, { type RequestHandler } from 'express';
import { z } from 'zod';

import { signInSchema } from '@/shared/schemas/session';

import { requireSignedIn } from '../access/authenticate';
import { type AppContext } from '../context';
import { HttpError } from '../http/http-error';
import { validate } from '../http/validate';
import { passToAuth } from './auth-response';
import { signInAttempts } from './sign-in-attempts';

const signIn = validate({ body: signInSchema });
const signOut = validate({ body: z.strictObject({}) });

/**
 * `/api/auth`: only the endpoints the product uses; the rest of better-auth answers 404. Bodies
 * are read and checked here, so every refusal has the API's one error shape.
 */
export function authRouter(context: AppContext, authenticate: RequestHandler) {
  const attempts = signInAttempts(context);
  return express
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
    });
}

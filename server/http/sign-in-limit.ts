import { rateLimit } from 'express-rate-limit';

import { type AppContext } from '../context';
import { sendError } from './error-handler';
import { HttpError } from './http-error';

/** Counts only failed sign-ins, per client address, so a person who gets in is never slowed. */
export function signInLimit({ signInLimit }: AppContext) {
  return rateLimit({
    windowMs: signInLimit.windowMs,
    limit: signInLimit.max,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, res) =>
      sendError(
        res,
        new HttpError(
          'too_many_requests',
          'Too many failed sign-ins from here. Wait a few minutes and try again.',
        ),
      ),
  });
}

import { toNodeHandler } from 'better-auth/node';
import express, { type Express } from 'express';

import { authenticate, requireSignedIn } from './access/authenticate';
import { type AppContext } from './context';
import { healthRouter } from './health/health.router';
import { apiNotFound } from './http/error-handler';
import { sameOrigin } from './http/same-origin';
import { signInLimit } from './http/sign-in-limit';
import { meRouter } from './me/me.router';
import { overviewRouter } from './overview/overview.router';
import { quotesRouter } from './quotes/quotes.router';
import { venueHomeRouter } from './venue-home/venue-home.router';

/** Every API route, one line each. Order matters only where a comment says so. */
export function mountApi(app: Express, context: AppContext): void {
  const authHandler = toNodeHandler(context.auth);

  app.use('/api', sameOrigin(context.trustedOrigins));
  app.use('/api/health', healthRouter);

  // better-auth reads the raw body itself, so its routes come before express.json(). Only the
  // endpoints the product uses are exposed; the rest of /api/auth answers 404.
  app.post('/api/auth/sign-in/email', signInLimit(context), authHandler);
  app.post('/api/auth/sign-out', authenticate(context), requireSignedIn, authHandler);

  app.use('/api', express.json({ limit: '100kb' }), authenticate(context));
  app.use('/api/me', meRouter(context));
  app.use('/api/overview', overviewRouter(context));
  app.use('/api/venue', venueHomeRouter(context));
  app.use('/api/quotes', quotesRouter(context));

  app.use('/api', apiNotFound);
}

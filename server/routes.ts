import express, { type Express } from 'express';

import { authenticate, requireRole } from './access/authenticate';
import { authRouter } from './auth/auth.router';
import { bankImportsRouter } from './bank-imports/bank-imports.router';
import { calendarFeedRouter, calendarRouter } from './calendar/calendar.router';
import { conditionReportsRouter } from './condition/condition.router';
import { conditionPhotosRouter } from './condition/condition-photos.router';
import { consignmentsRouter } from './consignments/consignments.router';
import { type AppContext } from './context';
import { documentsRouter, lineDocumentsRouter } from './documents/documents.router';
import { healthRouter } from './health/health.router';
import { apiNotFound } from './http/error-handler';
import { sameOrigin } from './http/same-origin';
import { invitationsRouter } from './invitations/invitations.router';
import { outboxRouter } from './mail/outbox.router';
import { meRouter } from './me/me.router';
import { overviewRouter } from './overview/overview.router';
import { checkoutRouter, paymentsWebhookRouter } from './payments/payments.router';
import { photoFilesRouter, workPhotosRouter } from './photos/photos.router';
import { quotesRouter } from './quotes/quotes.router';
import { consignmentSalesRouter, lineSalesRouter } from './sales/sales.router';
import { statementsRouter } from './statements/statements.router';
import { studioRouter } from './studio/studio.router';
import { venueHomeRouter } from './venue-home/venue-home.router';
import { venuesRouter } from './venues/venues.router';
import { worksRouter } from './works/works.router';
import { yearRouter } from './year/year.router';

/** Every API route, one line each. Order matters only where a comment says so. */
export function mountApi(app: Express, context: AppContext): void {
  const resolveViewer = authenticate(context);

  app.use('/api', sameOrigin(context.trustedOrigins));
  app.use('/api/health', healthRouter);

  app.use('/api/auth', authRouter(context, resolveViewer));
  app.use('/api/calendar', calendarRouter(context));
  // The provider's webhook is signed over its raw bytes: it reads its own body, before the JSON
  // parser below, and has no session.
  app.use('/api/payments', paymentsWebhookRouter(context));

  // A CSV import is up to 2 MB of text, JSON-escaped: more than the global limit. Read here,
  // only for the studio roles, the body is then skipped by the global parser below.
  app.post(
    '/api/works/import',
    resolveViewer,
    requireRole('owner', 'assistant'),
    express.json({ limit: '6mb' }),
  );
  // A bank statement is up to 1 MB of CSV: the owner's only, read here like an import.
  app.post(
    '/api/bank-imports/matches',
    resolveViewer,
    requireRole('owner'),
    express.json({ limit: '3mb' }),
  );
  app.use('/api', express.json({ limit: '100kb' }), resolveViewer);
  app.use('/api/me', meRouter(context));
  app.use('/api/overview', overviewRouter(context));
  app.use('/api/venue', venueHomeRouter(context));
  app.use('/api/quotes', quotesRouter(context));
  app.use('/api/studio', studioRouter(context));
  app.use('/api/venues', venuesRouter(context));
  app.use('/api/works/:id/photos', workPhotosRouter(context));
  app.use('/api/works', worksRouter(context));
  app.use('/api/photos', photoFilesRouter(context));
  app.use('/api/consignments', documentsRouter(context));
  app.use('/api/consignments/:id/sales', consignmentSalesRouter(context));
  app.use('/api/consignments', consignmentsRouter(context));
  app.use('/api/consignment-lines/:lineId', lineSalesRouter(context));
  app.use('/api/consignment-lines/:lineId', lineDocumentsRouter(context));
  app.use('/api/consignment-lines/:lineId/condition-reports', conditionReportsRouter(context));
  app.use('/api/condition-photos', conditionPhotosRouter(context));
  app.use('/api/invitations', invitationsRouter(context));
  app.use('/api/statements/:id/checkout', checkoutRouter(context));
  app.use('/api/statements', statementsRouter(context));
  app.use('/api/year', yearRouter(context));
  app.use('/api/calendar-feed', calendarFeedRouter(context));
  app.use('/api/bank-imports', bankImportsRouter(context));
  app.use('/api/outbox', outboxRouter(context));

  app.use('/api', apiNotFound);
}

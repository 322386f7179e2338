import express from 'express';

import { statementParamsSchema } from '@/shared/schemas/statement';

import { scopeOf } from '../access/authenticate';
import { requireAnyRole, requireScopeOf } from '../access/resource-scope';
import { studioOf } from '../access/resource-studio.repository';
import { type AppContext } from '../context';
import { HttpError } from '../http/http-error';
import { validate } from '../http/validate';
import { startCheckout } from './checkout.service';
import { verifiedEvent } from './payment-provider';
import { handlePaymentEvent } from './webhook.service';

// The venue that owes it pays, and the owner may open the same page to pass the link on; an
// assistant has no business with money received (docs/domain.md, roles).
const payers = ['owner', 'gallery'] as const;
const byId = validate({ params: statementParamsSchema });

/**
 * `/api/statements/:id/checkout`: the provider's hosted page for paying the balance online. The
 * scope is the statement's own studio, so a venue's staff need not switch studio; the scoped
 * read then shows them only their own venue's issued statements.
 */
export function checkoutRouter({ db, payments, appUrl, logger }: AppContext) {
  return express.Router({ mergeParams: true }).post(
    '/',
    requireAnyRole(...payers),
    byId,
    requireScopeOf(
      db,
      'That statement',
      (d, res) => studioOf.statement(d, byId.input(res).params.id),
      ...payers,
    ),
    async (_req, res) => {
      const { id } = byId.input(res).params;
      res.json(
        await startCheckout(db, scopeOf(res), id, {
          provider: payments,
          appUrl,
          logger: logger.child({ part: 'payments' }),
        }),
      );
    },
  );
}

/**
 * `/api/payments/webhook`: the provider's notices, public, signed. The body is read raw, before
 * the app's JSON parser, since the signature is over the exact bytes sent; that is why this one
 * handler reads `req.body` itself.
 */
export function paymentsWebhookRouter({ db, payments, logger }: AppContext) {
  const log = logger.child({ part: 'payments' });
  return express
    .Router()
    .post('/webhook', express.raw({ type: () => true, limit: '1mb' }), async (req, res) => {
      if (!payments)
        throw new HttpError('not_found', 'Online payment is not set up on this server.');
      const event = verifiedEvent(payments, req.body, req.get('stripe-signature'), log);
      res.json({ received: true, outcome: await handlePaymentEvent(db, event, log) });
    });
}

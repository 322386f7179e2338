import { type Logger } from 'pino';
import type Stripe from 'stripe';

import { isoDateInTimeZone } from '@/shared/money';

import { studioOf } from '../access/resource-studio.repository';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { recordOnlinePayment } from '../statements/statements.service';
import { getStudio } from '../studio/studio.service';

/** What became of an event; every one of them is acknowledged with 200. */
export type WebhookOutcome = 'recorded' | 'duplicate' | 'ignored' | 'refused';

/**
 * The events that say a checkout's money has been taken: `checkout.session.completed` with
 * `payment_status` "paid" (a card), or `checkout.session.async_payment_succeeded` later for a
 * payment method that settles after the checkout (docs.stripe.com/checkout/fulfillment).
 */
function paidSession(event: Stripe.Event): Stripe.Checkout.Session | null {
  if (
    event.type !== 'checkout.session.completed' &&
    event.type !== 'checkout.session.async_payment_succeeded'
  ) {
    return null;
  }
  const session = event.data.object;
  return session.payment_status === 'paid' ? session : null;
}

const positiveId = (value: string | undefined) => {
  const n = Number(value);
  return Number.isSafeInteger(n) && n > 0 ? n : null;
};

/**
 * Records the payment a verified provider event reports, against the statement its metadata
 * names, in that statement's own studio: the webhook has no session, so it acts at the owner's
 * level of the statement's studio, with no person recorded. Events of other kinds are ignored.
 *
 * Every outcome is answered 200, as the provider asks ("Quickly return a 2xx status code",
 * docs.stripe.com/webhooks): it retries anything else for days, which helps neither a payment
 * recorded already nor an event naming a statement this server does not hold (another install
 * sharing the provider account, say). Those refused are logged as errors: money was taken and
 * someone must record or return it.
 */
export async function handlePaymentEvent(
  db: Db,
  event: Stripe.Event,
  logger: Logger,
): Promise<WebhookOutcome> {
  const session = paidSession(event);
  if (!session) return 'ignored';
  const log = logger.child({ eventId: event.id, checkoutSession: session.id });
  const statementId = positiveId(session.metadata?.statementId);
  const studioId = positiveId(session.metadata?.studioId);
  const amount = session.amount_total;
  const found = statementId === null ? undefined : await studioOf.statement(db, statementId);
  if (statementId === null || studioId === null || found !== studioId) {
    log.error(
      { metadata: session.metadata, reference: session.client_reference_id, amount },
      'payment taken for a statement this server does not hold: not recorded',
    );
    return 'refused';
  }
  if (amount === null || amount <= 0 || !session.currency) {
    log.error({ statementId, amount }, 'payment taken without an amount: not recorded');
    return 'refused';
  }

  const scope: Scope = { studioId, venueId: null, userId: null, role: 'owner' };
  const studio = await getStudio(db, scope);
  const providerPaymentId =
    (typeof session.payment_intent === 'string'
      ? session.payment_intent
      : session.payment_intent?.id) ?? session.id;
  const result = await recordOnlinePayment(db, scope, statementId, {
    amount: { amount, currency: session.currency.toUpperCase() },
    // The day the checkout completed, in the studio's own time zone, however late this arrives.
    receivedOn: isoDateInTimeZone(new Date(event.created * 1000), studio.time_zone),
    providerPaymentId,
  });
  if (result.outcome === 'refused') {
    log.error({ statementId, reason: result.reason }, 'online payment not recorded');
    return 'refused';
  }
  if (result.outcome === 'duplicate') {
    log.info({ statementId, providerPaymentId }, 'online payment already recorded');
    return 'duplicate';
  }
  const { statement } = result;
  log.info({ statementId, providerPaymentId, state: statement.state }, 'online payment recorded');
  if (statement.balance.amount < 0) {
    log.warn(
      { statementId, balance: statement.balance },
      'statement paid more than it owed: give the difference back',
    );
  }
  return 'recorded';
}

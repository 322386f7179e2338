import Stripe from 'stripe';

import { signPayload } from '@/server/dev-services/payments-stand-in';

import { as } from '../helpers/consignment-fixture';
import { testAppUrl } from '../helpers/document-fixture';
import {
  type IssuedStatementFixture,
  issuedStatementFixture,
  listenForWebhooks,
  postWebhook,
} from '../helpers/payments';

// The SDK's own helpers, used as the reference for the provider's signature scheme.
const sdk = new Stripe('sk_test_reference_only');

/** A signature header made by the SDK itself, as the provider would send it. */
const signed = (payload: string, secret: string, timestamp?: number) =>
  sdk.webhooks.generateTestHeaderString({ payload, secret, timestamp });

/** A provider event around a Checkout Session, as JSON text. */
function eventJson(
  type: string,
  session: Record<string, unknown>,
  overrides: Record<string, unknown> = {},
): string {
  return JSON.stringify({
    id: `evt_test_${Math.random().toString(16).slice(2)}`,
    object: 'event',
    api_version: null,
    created: Math.floor(Date.now() / 1000),
    data: { object: session },
    livemode: false,
    pending_webhooks: 1,
    request: { id: null, idempotency_key: null },
    type,
    ...overrides,
  });
}

/** A paid session for the fixture's statement, as `checkout.session.completed` carries it. */
const paidSession = (f: IssuedStatementFixture, overrides: Record<string, unknown> = {}) => ({
  id: 'cs_test_paid',
  object: 'checkout.session',
  mode: 'payment',
  status: 'complete',
  payment_status: 'paid',
  amount_total: f.statement.balance.amount,
  currency: 'gbp',
  client_reference_id: f.statement.reference,
  metadata: { statementId: String(f.statement.id), studioId: String(f.studioA) },
  payment_intent: 'pi_test_paid',
  ...overrides,
});

const statementOf = async (f: IssuedStatementFixture) =>
  (await as(f, 'owner').get(`/api/statements/${f.statement.id}`)).body;

const onlinePayments = (f: IssuedStatementFixture) =>
  f.db.selectFrom('payments').selectAll().where('method', '=', 'online').execute();

describe('paying a statement online, through the stand-in', () => {
  it('opens the checkout, presses Pay, takes the signed webhook and settles the statement and show', async () => {
    const f = await issuedStatementFixture();
    const listening = await listenForWebhooks(f);
    try {
      const checkout = await as(f, 'gallery').post(`/api/statements/${f.statement.id}/checkout`);
      expect(checkout.status).toBe(200);
      const page = await (await fetch(checkout.body.url)).text();
      const form = /<form method="post" action="([^"]+)"/.exec(page);
      expect(form).not.toBeNull();

      const pressed = await fetch(new URL(form![1]!, checkout.body.url), {
        method: 'POST',
        headers: { 'content-type': 'application/x-www-form-urlencoded' },
        body: 'choice=pay',
        redirect: 'manual',
      });
      // Back to the venue's page for the statement, as the checkout asked.
      expect(pressed.status).toBe(303);
      expect(pressed.headers.get('location')).toBe(
        `${testAppUrl}/venue/statements/${f.statement.id}?payment=done`,
      );

      // One webhook, signed as the provider signs ("Check the webhook signatures",
      // docs.stripe.com/webhooks): the SDK's own constructEvent accepts it, and the SDK's test
      // header for the same payload, secret and time is the very same string.
      expect(f.standIn.deliveries).toHaveLength(1);
      const [delivery] = f.standIn.deliveries;
      expect(delivery).toMatchObject({
        type: 'checkout.session.completed',
        status: 200,
        error: null,
      });
      const event = sdk.webhooks.constructEvent(
        delivery!.payload,
        delivery!.signature,
        f.standIn.webhookSecret,
      );
      expect(event.type).toBe('checkout.session.completed');
      const timestamp = Number(/t=(\d+)/.exec(delivery!.signature)![1]);
      expect(delivery!.signature).toBe(
        signed(delivery!.payload, f.standIn.webhookSecret, timestamp),
      );

      const statement = await statementOf(f);
      expect(statement).toMatchObject({
        state: 'settled',
        paid: { amount: 5_200, currency: 'GBP' },
        balance: { amount: 0, currency: 'GBP' },
      });
      const session = [...f.standIn.sessions.values()][0]!;
      expect(statement.payments).toEqual([
        {
          id: expect.any(Number),
          amount: { amount: 5_200, currency: 'GBP' },
          receivedOn: f.today,
          method: 'online',
          reference: session.payment_intent,
        },
      ]);
      expect((await as(f, 'owner').get(`/api/consignments/${f.show.id}`)).body.state).toBe(
        'settled',
      );

      const [payment] = await onlinePayments(f);
      expect(payment).toMatchObject({
        provider_payment_id: session.payment_intent,
        recorded_by: null,
        studio_id: f.studioA,
      });
      const audit = await f.db
        .selectFrom('audit_log')
        .select(['action', 'user_id', 'after'])
        .where('entity', '=', 'statement')
        .where('entity_id', '=', String(f.statement.id))
        .where('action', 'in', ['payment.recorded', 'statement.settled'])
        .orderBy('id')
        .execute();
      expect(audit.map((a) => [a.action, a.user_id])).toEqual([
        ['payment.recorded', null],
        ['statement.settled', null],
      ]);
      expect(JSON.parse(audit[0]!.after!)).toMatchObject({
        method: 'online',
        providerPaymentId: session.payment_intent,
        amount: { amount: 5_200, currency: 'GBP' },
      });

      // Paid, the same page no longer takes a payment.
      const again = await fetch(checkout.body.url);
      expect(await again.text()).toContain('Already paid');
    } finally {
      await listening.close();
      await f.standIn.stop();
    }
  });

  it('goes back to the statement without paying when Cancel is pressed', async () => {
    const f = await issuedStatementFixture();
    try {
      const checkout = await as(f, 'gallery').post(`/api/statements/${f.statement.id}/checkout`);
      const cancelled = await fetch(checkout.body.url, {
        method: 'POST',
        headers: { 'content-type': 'application/x-www-form-urlencoded' },
        body: 'choice=cancel',
        redirect: 'manual',
      });
      expect(cancelled.status).toBe(303);
      expect(cancelled.headers.get('location')).toBe(
        `${testAppUrl}/venue/statements/${f.statement.id}?payment=cancelled`,
      );
      expect(f.standIn.deliveries).toEqual([]);
      expect((await statementOf(f)).state).toBe('issued');
    } finally {
      await f.standIn.stop();
    }
  });
});

describe('POST /api/payments/webhook', () => {
  it('refuses a missing, forged, wrongly keyed or stale signature with 400, and logs it', async () => {
    const f = await issuedStatementFixture();
    try {
      const payload = eventJson('checkout.session.completed', paidSession(f));
      const secret = f.standIn.webhookSecret;
      const badSignature = {
        error: { code: 'invalid_request', message: 'The webhook signature does not match.' },
      };
      const missing = await postWebhook(f, payload);
      expect(missing.status).toBe(400);
      expect(missing.body).toEqual({
        error: { code: 'invalid_request', message: 'The webhook is not signed.' },
      });

      const attempts = [
        // Someone else's secret.
        signed(payload, 'whsec_someone_else'),
        // The right secret over other bytes: the amount changed after signing.
        signed(payload.replace('"amount_total":5200', '"amount_total":1'), secret),
        // Signed more than five minutes ago, the SDK's default tolerance, against replays.
        signed(payload, secret, Math.floor(Date.now() / 1000) - 301),
        't=1,v1=00',
      ];
      for (const header of attempts) {
        const res = await postWebhook(f, payload, header);
        expect(res.status).toBe(400);
        expect(res.body).toEqual(badSignature);
      }
      const refusals = f.lines.filter((l) => l.msg.startsWith('payment webhook refused'));
      expect(refusals).toHaveLength(5);
      expect(refusals.every((l) => l.level === 40)).toBe(true);
      expect(await onlinePayments(f)).toEqual([]);
      expect((await statementOf(f)).state).toBe('issued');
    } finally {
      await f.standIn.stop();
    }
  });

  it('accepts a signature made by the stand-in the way the SDK makes it', async () => {
    const f = await issuedStatementFixture();
    try {
      const payload = eventJson('checkout.session.completed', paidSession(f));
      const res = await postWebhook(f, payload, signPayload(payload, f.standIn.webhookSecret));
      expect(res.status).toBe(200);
      expect(res.body).toEqual({ received: true, outcome: 'recorded' });
    } finally {
      await f.standIn.stop();
    }
  });

  it('pays once however often, and however closely, the same event arrives', async () => {
    const f = await issuedStatementFixture();
    try {
      const payload = eventJson('checkout.session.completed', paidSession(f));
      const header = signed(payload, f.standIn.webhookSecret);
      const first = await postWebhook(f, payload, header);
      expect(first.body).toEqual({ received: true, outcome: 'recorded' });
      // Redelivered, the provider's retries must stop: 200, and nothing more recorded.
      const again = await Promise.all([1, 2, 3].map(() => postWebhook(f, payload, header)));
      for (const res of again) {
        expect(res.status).toBe(200);
        expect(res.body).toEqual({ received: true, outcome: 'duplicate' });
      }
      // A second event about the same payment (a completed and an async success, say) too.
      const other = eventJson('checkout.session.async_payment_succeeded', paidSession(f));
      const second = await postWebhook(f, other, signed(other, f.standIn.webhookSecret));
      expect(second.body).toEqual({ received: true, outcome: 'duplicate' });

      expect(await onlinePayments(f)).toHaveLength(1);
      expect(await statementOf(f)).toMatchObject({
        state: 'settled',
        paid: { amount: 5_200, currency: 'GBP' },
      });
      const recorded = await f.db
        .selectFrom('audit_log')
        .select('id')
        .where('action', '=', 'payment.recorded')
        .execute();
      expect(recorded).toHaveLength(1);
    } finally {
      await f.standIn.stop();
    }
  });

  it('records nothing for a statement this server does not hold, answers 200 and logs an error', async () => {
    const f = await issuedStatementFixture();
    try {
      const cases = [
        { statementId: '999999', studioId: String(f.studioA) },
        // A real statement, but not of the studio the checkout named.
        { statementId: String(f.statement.id), studioId: String(f.studioB) },
        {},
      ];
      for (const metadata of cases) {
        const payload = eventJson('checkout.session.completed', paidSession(f, { metadata }));
        const res = await postWebhook(f, payload, signed(payload, f.standIn.webhookSecret));
        // 200: the provider would retry anything else for days, and no retry can help.
        expect(res.status).toBe(200);
        expect(res.body).toEqual({ received: true, outcome: 'refused' });
      }
      const errors = f.lines.filter((l) => l.level === 50);
      expect(errors.map((l) => l.msg)).toEqual(
        cases.map(() => 'payment taken for a statement this server does not hold: not recorded'),
      );
      expect(errors[0]).toMatchObject({
        metadata: { statementId: '999999' },
        amount: 5_200,
        checkoutSession: 'cs_test_paid',
      });
      expect(await onlinePayments(f)).toEqual([]);
      expect((await statementOf(f)).state).toBe('issued');
    } finally {
      await f.standIn.stop();
    }
  });

  it('acknowledges and ignores other events, and a checkout not yet paid', async () => {
    const f = await issuedStatementFixture();
    try {
      const events = [
        eventJson('payment_intent.succeeded', { id: 'pi_test_other', object: 'payment_intent' }),
        eventJson('checkout.session.expired', paidSession(f, { payment_status: 'unpaid' })),
        // A delayed payment method: completed, the money not yet in.
        eventJson('checkout.session.completed', paidSession(f, { payment_status: 'unpaid' })),
      ];
      for (const payload of events) {
        const res = await postWebhook(f, payload, signed(payload, f.standIn.webhookSecret));
        expect(res.status).toBe(200);
        expect(res.body).toEqual({ received: true, outcome: 'ignored' });
      }
      expect(await onlinePayments(f)).toEqual([]);
    } finally {
      await f.standIn.stop();
    }
  });

  it('records a delayed payment when it succeeds, on the day it did in the studio', async () => {
    const f = await issuedStatementFixture();
    try {
      // 23:30 UTC on 30 June 2026 is 00:30 on 1 July in London (BST, UTC+1).
      const created = Date.UTC(2026, 5, 30, 23, 30) / 1000;
      const payload = eventJson(
        'checkout.session.async_payment_succeeded',
        paidSession(f, { payment_intent: 'pi_test_later' }),
        { created },
      );
      const res = await postWebhook(f, payload, signed(payload, f.standIn.webhookSecret));
      expect(res.body).toEqual({ received: true, outcome: 'recorded' });
      expect((await statementOf(f)).payments).toEqual([
        expect.objectContaining({ receivedOn: '2026-07-01', reference: 'pi_test_later' }),
      ]);
    } finally {
      await f.standIn.stop();
    }
  });

  it('records money taken after the statement was settled by hand, and warns it was paid twice', async () => {
    const f = await issuedStatementFixture();
    try {
      await as(f, 'owner').post(`/api/statements/${f.statement.id}/payments`, {
        amount: { amount: 5_200, currency: 'GBP' },
        receivedOn: f.today,
        method: 'bank-transfer',
      });
      const payload = eventJson('checkout.session.completed', paidSession(f));
      const res = await postWebhook(f, payload, signed(payload, f.standIn.webhookSecret));
      expect(res.body).toEqual({ received: true, outcome: 'recorded' });
      expect(await statementOf(f)).toMatchObject({
        state: 'settled',
        paid: { amount: 10_400, currency: 'GBP' },
        balance: { amount: -5_200, currency: 'GBP' },
      });
      const warnings = f.lines.filter((l) => l.part === 'payments' && l.level === 40);
      expect(warnings.map((l) => l.msg)).toEqual([
        'statement paid more than it owed: give the difference back',
      ]);
    } finally {
      await f.standIn.stop();
    }
  });
});

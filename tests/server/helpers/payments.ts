import { type AddressInfo } from 'node:net';
import { type Writable } from 'node:stream';

import pino from 'pino';
import request from 'supertest';

import { startPaymentsStandIn } from '@/server/dev-services/payments-stand-in';
import { createPaymentProvider } from '@/server/payments/payment-provider';

import { as, consignmentFixture, dispatchedWith } from './consignment-fixture';
import { testAppUrl } from './document-fixture';

/** The local payment stand-in on a free loopback port, and the SDK pointed at it. */
export async function startTestPayments() {
  const standIn = await startPaymentsStandIn({ port: 0 });
  const provider = createPaymentProvider({
    secretKey: standIn.secretKey,
    webhookSecret: standIn.webhookSecret,
    endpoint: { host: '127.0.0.1', port: standIn.port, protocol: 'http' },
  });
  return { standIn, provider };
}

/** A logger that keeps what it writes, parsed, for tests that check what was logged. */
export function capturingLogger() {
  const lines: { level: number; msg: string; [key: string]: unknown }[] = [];
  const stream = { write: (line: string) => lines.push(JSON.parse(line)) } as unknown as Writable;
  return { logger: pino({ level: 'info' }, stream), lines };
}

const gbp = (amount: number) => ({ amount, currency: 'GBP' });

/**
 * Studio A, renamed Saltmarsh Kiln, with the payment stand-in: its venue sold A-1 (list £100) at
 * £100 and took A-2 back, the show is closed and its statement issued. On venue A's terms (40%
 * commission, VAT at 20% added on it: tests/server/helpers/consignment-fixture.ts) the maker's
 * share is £100 − £40 − £8 = £52.00, the balance owed.
 */
export async function issuedStatementFixture() {
  const payments = await startTestPayments();
  const { logger, lines } = capturingLogger();
  const f = await consignmentFixture({
    payments: payments.provider,
    logger,
    appUrl: testAppUrl,
  });
  await f.db
    .updateTable('studios')
    .set({ name: 'Saltmarsh Kiln' })
    .where('id', '=', f.studioA)
    .execute();
  const owner = as(f, 'owner');
  const gallery = as(f, 'gallery');
  const show = await dispatchedWith(f, f.works.slice(0, 2));
  const [sold, back] = show.lines;
  const today = (await owner.get(`/api/consignments/${show.id}`)).body.today as string;
  const steps = [
    await gallery.post(`/api/consignment-lines/${sold!.id}/sale`, {
      soldOn: today,
      salePrice: gbp(10_000),
    }),
    await gallery.post(`/api/consignment-lines/${back!.id}/resolve`, {
      state: 'returned',
      on: today,
    }),
    await owner.post(`/api/consignments/${show.id}/close`),
  ];
  const created = await owner.post('/api/statements', { consignmentId: show.id });
  const issued = await owner.post(`/api/statements/${created.body.id}/issue`);
  for (const step of [...steps, created, issued]) {
    if (step.status >= 300) throw new Error(JSON.stringify(step.body));
  }
  const statement = issued.body as { id: number; reference: string; balance: { amount: number } };
  return { ...f, ...payments, lines, show, today, statement };
}
export type IssuedStatementFixture = Awaited<ReturnType<typeof issuedStatementFixture>>;

/** The app listening on loopback, with the stand-in's webhooks sent to it. */
export async function listenForWebhooks(f: IssuedStatementFixture) {
  const server = f.app.listen(0, '127.0.0.1');
  await new Promise<void>((resolve) => server.once('listening', () => resolve()));
  const { port } = server.address() as AddressInfo;
  f.standIn.webhookUrl = `http://127.0.0.1:${port}/api/payments/webhook`;
  return {
    close: () =>
      new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
}

/** Sends a webhook as the provider would: these bytes, this signature header. */
export const postWebhook = (
  f: Pick<IssuedStatementFixture, 'app'>,
  payload: string,
  signature?: string,
) => {
  const req = request(f.app)
    .post('/api/payments/webhook')
    .set('Content-Type', 'application/json; charset=utf-8');
  return (signature === undefined ? req : req.set('Stripe-Signature', signature)).send(payload);
};

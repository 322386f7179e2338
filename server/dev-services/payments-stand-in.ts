import { createHmac, randomBytes } from 'node:crypto';
import { createServer, type Server } from 'node:http';

import express, { type Response } from 'express';

import { formatMoney } from '@/shared/money';

import { escapeHtml } from '../mail/templates/layout';

/** A Checkout Session as the provider's API answers it: the fields the SDK and Saggar read. */
export type StandInSession = {
  id: string;
  object: 'checkout.session';
  mode: 'payment';
  status: 'open' | 'complete';
  payment_status: 'unpaid' | 'paid';
  amount_subtotal: number;
  amount_total: number;
  currency: string;
  client_reference_id: string | null;
  metadata: Record<string, string>;
  success_url: string;
  cancel_url: string | null;
  url: string;
  payment_intent: string | null;
  created: number;
  expires_at: number;
  livemode: false;
};

/** One webhook sent: the exact bytes, their signature, and what the app answered. */
export type StandInDelivery = {
  eventId: string;
  type: string;
  payload: string;
  signature: string;
  /** The app's HTTP status, or null when it could not be reached. */
  status: number | null;
  error: string | null;
};

export type PaymentsStandIn = {
  /** http://127.0.0.1:PORT, what the SDK is pointed at. */
  url: string;
  port: number;
  /** The API key the SDK must send; anything else is refused as the provider would. */
  secretKey: string;
  /** The secret webhooks are signed with, shared with the app's webhook route. */
  webhookSecret: string;
  /** Where `checkout.session.completed` goes when someone presses Pay. */
  webhookUrl: string | null;
  sessions: ReadonlyMap<string, StandInSession>;
  deliveries: StandInDelivery[];
  stop(): Promise<void>;
};

export type PaymentsStandInOptions = {
  webhookUrl?: string | null;
  /** That port, or 0 for any free one. Left out: 12111, or if it is taken the next free one. */
  port?: number;
  /** Told of each webhook sent, e.g. to log one the app refused. */
  onDelivery?: (delivery: StandInDelivery) => void;
};

const loopback = '127.0.0.1';
const defaultPort = 12111;
const portsToTry = 20;
const day = 24 * 60 * 60;

const randomId = (prefix: string) => `${prefix}${randomBytes(12).toString('hex')}`;
const unixNow = () => Math.floor(Date.now() / 1000);

/**
 * The header the provider signs a webhook with, as its documentation describes ("Check the
 * webhook signatures", docs.stripe.com/webhooks): `t=<unix time>,v1=<hex HMAC-SHA256 of
 * "<t>.<payload>" keyed with the endpoint's secret>`.
 */
export function signPayload(payload: string, secret: string, timestamp = unixNow()): string {
  const v1 = createHmac('sha256', secret).update(`${timestamp}.${payload}`).digest('hex');
  return `t=${timestamp},v1=${v1}`;
}

function apiError(res: Response, status: number, message: string, param?: string) {
  res.status(status).json({
    error: { type: 'invalid_request_error', message, ...(param ? { param } : {}) },
  });
}

type Item = { name: string; description: string | null; amount: number; quantity: number };

/** The line items of a create call, form-encoded as the SDK sends them; null when malformed. */
function readItems(body: Record<string, unknown>): { items: Item[]; currency: string } | null {
  const raw = body.line_items;
  if (!Array.isArray(raw) || raw.length === 0) return null;
  const items: Item[] = [];
  const currencies = new Set<string>();
  for (const entry of raw as Record<string, Record<string, unknown>>[]) {
    const price = entry?.price_data;
    const product = price?.product_data as Record<string, unknown> | undefined;
    const amount = Number(price?.unit_amount);
    const quantity = Number(entry?.quantity ?? 1);
    if (typeof price?.currency !== 'string' || typeof product?.name !== 'string') return null;
    if (!Number.isInteger(amount) || amount < 0 || !Number.isInteger(quantity) || quantity < 1) {
      return null;
    }
    currencies.add(price.currency);
    const description = typeof product.description === 'string' ? product.description : null;
    items.push({ name: product.name, description, amount, quantity });
  }
  if (currencies.size !== 1) return null;
  return { items, currency: [...currencies][0]! };
}

// The product's palette (constants/theme.ts), repeated: this page is not part of the app.
const pageStyle = `
  body { margin: 0; background: #F6F1E7; color: #2B2724;
    font: 17px/1.5 -apple-system, 'Segoe UI', Helvetica, Arial, sans-serif; }
  main { max-width: 32rem; margin: 3rem auto; padding: 1.5rem; background: #FCFAF5;
    border: 1px solid #E2DACB; border-radius: 12px; }
  @media (max-width: 34rem) { main { margin: 1rem; } }
  h1 { font: 600 1.5rem/1.3 Georgia, 'Times New Roman', serif; margin: 0 0 1rem; }
  .item { white-space: nowrap; }
  .note { background: #EFE8DA; border-left: 4px solid #8A5A12; padding: .5rem .75rem; }
  .actions { display: flex; gap: .75rem; margin-top: 1.5rem; flex-wrap: wrap; }
  button { min-height: 44px; padding: 0 1.25rem; font: inherit; border-radius: 8px;
    border: 1px solid #8C8275; background: #FCFAF5; color: #2B2724; cursor: pointer; }
  button.pay { background: #2F6B5A; border-color: #2F6B5A; color: #FCFAF5; font-weight: 600; }
  button:focus-visible { outline: 3px solid #2F6B5A; outline-offset: 2px; }`;

function page(title: string, body: string): string {
  return `<!doctype html>
<html lang="en-GB"><head><meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)}</title><style>${pageStyle}</style></head>
<body><main>${body}</main></body></html>`;
}

/**
 * The hosted checkout page: what is paid, to whom, for what. The studio is the line item's
 * description and the statement its name, the way the provider's own page lists an item.
 */
function checkoutPage(session: StandInSession, item: Item): string {
  const amount = formatMoney({
    amount: session.amount_total,
    currency: session.currency.toUpperCase(),
  });
  const what = item.name.charAt(0).toLowerCase() + item.name.slice(1);
  const payee = item.description ? ` to ${item.description}` : '';
  const heading = `Pay ${amount}${payee} for ${what}`;
  const headingHtml = `Pay ${escapeHtml(amount + payee)} for <span class="item">${escapeHtml(what)}</span>`;
  const action = `/c/pay/${encodeURIComponent(session.id)}`;
  if (session.status !== 'open') {
    return page('Already paid', `<h1>Already paid</h1><p>${escapeHtml(heading)}: done.</p>`);
  }
  return page(
    heading,
    `<h1>${headingHtml}</h1>
<p class="note" role="note"><strong>Test payment — no card is charged.</strong> This page is
Saggar's local stand-in for the payment provider.</p>
<form method="post" action="${escapeHtml(action)}">
<div class="actions">
<button class="pay" type="submit" name="choice" value="pay">Pay ${escapeHtml(amount)}</button>
<button type="submit" name="choice" value="cancel">Cancel</button>
</div></form>`,
  );
}

const noSuchPayment = (res: Response) =>
  res.status(404).type('html').send(page('No such payment', '<h1>No such payment</h1>'));

function listen(server: Server, port: number): Promise<number> {
  return new Promise((resolve, reject) => {
    const onError = (err: Error) => {
      server.off('listening', onListening);
      reject(err);
    };
    const onListening = () => {
      server.off('error', onError);
      const address = server.address();
      resolve(typeof address === 'object' && address ? address.port : port);
    };
    server.once('error', onError);
    server.once('listening', onListening);
    server.listen(port, loopback);
  });
}

/**
 * A local stand-in for the payment provider, for `npm start` without provider keys and for
 * tests: on loopback only, it answers the SDK's Checkout Session calls, shows a plain hosted
 * checkout page, and when Pay is pressed sends a `checkout.session.completed` webhook signed
 * the way the provider signs, then sends the browser back to the session's success URL.
 * Sessions are kept in memory.
 */
export async function startPaymentsStandIn(
  options: PaymentsStandInOptions = {},
): Promise<PaymentsStandIn> {
  const sessions = new Map<string, StandInSession>();
  const items = new Map<string, Item[]>();
  const deliveries: StandInDelivery[] = [];
  const secretKey = randomId('sk_test_standin_');
  const webhookSecret = randomId('whsec_standin_');
  let base = '';

  const api = express
    .Router()
    .use((req, res, next) => {
      if (req.get('authorization') !== `Bearer ${secretKey}`) {
        return apiError(res, 401, 'Invalid API Key provided.');
      }
      next();
    })
    .post(
      '/checkout/sessions',
      express.urlencoded({ extended: true, limit: '100kb' }),
      (req, res) => {
        const body = (req.body ?? {}) as Record<string, unknown>;
        if (body.mode !== 'payment') {
          return apiError(res, 400, 'The stand-in takes only mode=payment.', 'mode');
        }
        const read = readItems(body);
        if (!read) return apiError(res, 400, 'Invalid line_items.', 'line_items');
        if (typeof body.success_url !== 'string') {
          return apiError(res, 400, 'Missing required param: success_url.', 'success_url');
        }
        const total = read.items.reduce((sum, i) => sum + i.amount * i.quantity, 0);
        const id = randomId('cs_test_');
        const created = unixNow();
        const session: StandInSession = {
          id,
          object: 'checkout.session',
          mode: 'payment',
          status: 'open',
          payment_status: 'unpaid',
          amount_subtotal: total,
          amount_total: total,
          currency: read.currency,
          client_reference_id:
            typeof body.client_reference_id === 'string' ? body.client_reference_id : null,
          metadata: Object.fromEntries(
            Object.entries((body.metadata ?? {}) as Record<string, unknown>).map(([k, v]) => [
              k,
              String(v),
            ]),
          ),
          success_url: body.success_url,
          cancel_url: typeof body.cancel_url === 'string' ? body.cancel_url : null,
          url: `${base}/c/pay/${id}`,
          payment_intent: null,
          created,
          expires_at: created + day,
          livemode: false,
        };
        sessions.set(id, session);
        items.set(id, read.items);
        res.json(session);
      },
    )
    .get('/checkout/sessions/:id', (req, res) => {
      const session = sessions.get(req.params.id);
      if (!session) return apiError(res, 404, `No such checkout.session: '${req.params.id}'`);
      res.json(session);
    })
    .use((req, res) => {
      apiError(res, 404, `Unrecognized request URL (${req.method}: ${req.originalUrl}).`);
    });

  async function deliver(type: string, object: StandInSession): Promise<StandInDelivery> {
    const eventId = randomId('evt_');
    const payload = JSON.stringify(
      {
        id: eventId,
        object: 'event',
        api_version: null,
        created: unixNow(),
        data: { object },
        livemode: false,
        pending_webhooks: 1,
        request: { id: null, idempotency_key: null },
        type,
      },
      null,
      2,
    );
    const signature = signPayload(payload, webhookSecret);
    const delivery: StandInDelivery = {
      eventId,
      type,
      payload,
      signature,
      status: null,
      error: null,
    };
    try {
      if (!stand.webhookUrl) throw new Error('No webhook URL is set.');
      const answer = await fetch(stand.webhookUrl, {
        method: 'POST',
        headers: {
          'content-type': 'application/json; charset=utf-8',
          'stripe-signature': signature,
        },
        body: payload,
        signal: AbortSignal.timeout(10_000),
      });
      delivery.status = answer.status;
      if (!answer.ok) delivery.error = (await answer.text()).slice(0, 500);
    } catch (err) {
      delivery.error = err instanceof Error ? err.message : String(err);
    }
    deliveries.push(delivery);
    options.onDelivery?.(delivery);
    return delivery;
  }

  const app = express();
  app.disable('x-powered-by');
  app.use('/v1', api);
  app.get('/c/pay/:id', (req, res) => {
    const session = sessions.get(req.params.id);
    if (!session) return noSuchPayment(res);
    res.type('html').send(checkoutPage(session, items.get(session.id)![0]!));
  });
  app.post(
    '/c/pay/:id',
    express.urlencoded({ extended: false, limit: '1kb' }),
    async (req, res) => {
      const session = sessions.get(req.params.id);
      if (!session) return noSuchPayment(res);
      const choice = (req.body as { choice?: string } | undefined)?.choice;
      if (choice === 'cancel') return res.redirect(303, session.cancel_url ?? session.success_url);
      if (choice !== 'pay' || session.status !== 'open') {
        return res
          .status(409)
          .type('html')
          .send(checkoutPage(session, items.get(session.id)![0]!));
      }
      session.status = 'complete';
      session.payment_status = 'paid';
      session.payment_intent = randomId('pi_');
      // The provider redirects whatever the webhook's fate; waiting for it keeps the loop
      // deterministic here, so the page the browser returns to already shows the payment.
      await deliver('checkout.session.completed', { ...session });
      res.redirect(303, session.success_url.replace('{CHECKOUT_SESSION_ID}', session.id));
    },
  );

  const fallForward = options.port === undefined;
  const first = options.port ?? defaultPort;
  let http = createServer(app);
  let port: number;
  for (let attempt = 0; ; attempt += 1) {
    try {
      port = await listen(http, first + attempt);
      break;
    } catch (err) {
      const inUse = (err as NodeJS.ErrnoException).code === 'EADDRINUSE';
      if (!inUse || !fallForward || attempt + 1 >= portsToTry) throw err;
      http = createServer(app);
    }
  }
  base = `http://${loopback}:${port}`;

  const stand: PaymentsStandIn = {
    url: base,
    port,
    secretKey,
    webhookSecret,
    webhookUrl: options.webhookUrl ?? null,
    sessions,
    deliveries,
    stop: () =>
      new Promise((resolve) => {
        http.close(() => resolve());
        // The SDK keeps its connections alive; a stopped stand-in drops them.
        http.closeAllConnections();
      }),
  };
  return stand;
}

import { type Logger } from 'pino';
import Stripe from 'stripe';

import { HttpError } from '../http/http-error';

/** The payment provider as the app uses it: its official SDK and the webhook signing secret. */
export type PaymentProvider = {
  stripe: Stripe;
  webhookSecret: string;
};

export type PaymentProviderOptions = {
  secretKey: string;
  webhookSecret: string;
  /** Another API server than the provider's own: the local stand-in, over plain HTTP. */
  endpoint?: { host: string; port: number; protocol: 'http' | 'https' };
};

export function createPaymentProvider(options: PaymentProviderOptions): PaymentProvider {
  const stripe = new Stripe(options.secretKey, {
    ...(options.endpoint ?? {}),
    appInfo: { name: 'Saggar' },
    telemetry: false,
  });
  return { stripe, webhookSecret: options.webhookSecret };
}

/**
 * The event a webhook carries, once its `Stripe-Signature` header is checked against the raw
 * bytes with the SDK's own `constructEvent` (an HMAC over "timestamp.payload", and the timestamp
 * no more than five minutes old: "Check the webhook signatures", docs.stripe.com/webhooks).
 * Anything else is refused as a bad request, and logged.
 */
export function verifiedEvent(
  provider: PaymentProvider,
  rawBody: unknown,
  signature: string | undefined,
  logger: Logger,
): Stripe.Event {
  if (!Buffer.isBuffer(rawBody) || rawBody.length === 0) {
    logger.warn('payment webhook refused: no body');
    throw new HttpError('invalid_request', 'The webhook has no body.');
  }
  if (!signature) {
    logger.warn('payment webhook refused: no Stripe-Signature header');
    throw new HttpError('invalid_request', 'The webhook is not signed.');
  }
  try {
    return provider.stripe.webhooks.constructEvent(rawBody, signature, provider.webhookSecret);
  } catch (err) {
    // The SDK's message says which check failed; its first line is enough for the log.
    const reason = err instanceof Error ? err.message.split('\n')[0] : String(err);
    logger.warn({ reason }, 'payment webhook refused: signature does not match');
    throw new HttpError('invalid_request', 'The webhook signature does not match.');
  }
}

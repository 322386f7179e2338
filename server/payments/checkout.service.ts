import { type Logger } from 'pino';

import { type Checkout } from '@/shared/schemas/statement';

import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { HttpError } from '../http/http-error';
import { getStatement } from '../statements/statements.service';
import { getStudio } from '../studio/studio.service';
import { type PaymentProvider } from './payment-provider';

/** The venue's page for a statement: where the provider sends the browser back to. */
export const venueStatementUrl = (appUrl: string, id: number) => `${appUrl}/venue/statements/${id}`;

/**
 * A checkout at the payment provider for what is left to pay on an issued statement: the balance
 * in minor units (the provider's "smallest currency unit" for the currencies Saggar deals in),
 * its currency in lower case, and the statement's id and studio in the metadata the webhook
 * reads back. Refused for a draft, a settled statement, or one with nothing left to pay.
 */
export async function startCheckout(
  db: Db,
  scope: Scope,
  id: number,
  options: { provider: PaymentProvider | null; appUrl: string; logger: Logger },
): Promise<Checkout> {
  const statement = await getStatement(db, scope, id);
  if (statement.state !== 'issued') {
    const why = statement.state === 'draft' ? 'it is not issued yet' : `it is ${statement.state}`;
    throw new HttpError('conflict', `${statement.reference} cannot be paid online: ${why}.`);
  }
  if (statement.balance.amount <= 0) {
    throw new HttpError('conflict', `${statement.reference} has nothing left to pay.`);
  }
  if (!options.provider) {
    throw new HttpError('internal', 'Online payment is not set up on this server.');
  }
  const studio = await getStudio(db, scope);
  const back = venueStatementUrl(options.appUrl, id);
  const metadata = { statementId: String(id), studioId: String(scope.studioId) };
  try {
    const session = await options.provider.stripe.checkout.sessions.create({
      mode: 'payment',
      line_items: [
        {
          quantity: 1,
          price_data: {
            currency: statement.currency.toLowerCase(),
            unit_amount: statement.balance.amount,
            product_data: { name: `Statement ${statement.reference}`, description: studio.name },
          },
        },
      ],
      client_reference_id: statement.reference,
      metadata,
      payment_intent_data: { metadata },
      success_url: `${back}?payment=done`,
      cancel_url: `${back}?payment=cancelled`,
    });
    if (!session.url) throw new Error(`checkout session ${session.id} came back without a url`);
    return { url: session.url };
  } catch (err) {
    options.logger.error({ err, statementId: id }, 'the payment provider refused a checkout');
    throw new HttpError(
      'internal',
      'The payment service could not start the payment. Try again in a moment, or pay by bank transfer.',
    );
  }
}

import { createPaymentProvider } from '@/server/payments/payment-provider';

import { startTestPayments } from '../helpers/payments';

const session = {
  mode: 'payment' as const,
  line_items: [
    {
      quantity: 2,
      price_data: { currency: 'gbp', unit_amount: 1_250, product_data: { name: 'Two cups' } },
    },
  ],
  success_url: 'https://saggar.test/done',
};

describe('the payment stand-in', () => {
  it("answers the SDK's create and retrieve calls with a Checkout Session", async () => {
    const { standIn, provider } = await startTestPayments();
    try {
      const created = await provider.stripe.checkout.sessions.create(session);
      expect(created).toMatchObject({
        object: 'checkout.session',
        amount_total: 2_500,
        currency: 'gbp',
        status: 'open',
        payment_status: 'unpaid',
        url: `${standIn.url}/c/pay/${created.id}`,
      });
      const again = await provider.stripe.checkout.sessions.retrieve(created.id);
      expect(again.id).toBe(created.id);
    } finally {
      await standIn.stop();
    }
  });

  it('refuses a wrong API key and a malformed session the way the provider does', async () => {
    const { standIn, provider } = await startTestPayments();
    try {
      const stranger = createPaymentProvider({
        secretKey: 'sk_test_not_the_stand_in',
        webhookSecret: standIn.webhookSecret,
        endpoint: { host: '127.0.0.1', port: standIn.port, protocol: 'http' },
      });
      await expect(stranger.stripe.checkout.sessions.create(session)).rejects.toMatchObject({
        type: 'StripeAuthenticationError',
        statusCode: 401,
      });
      await expect(
        provider.stripe.checkout.sessions.create({ ...session, success_url: undefined }),
      ).rejects.toMatchObject({
        type: 'StripeInvalidRequestError',
        statusCode: 400,
        param: 'success_url',
      });
      expect(standIn.sessions.size).toBe(0);
    } finally {
      await standIn.stop();
    }
  });
});

import request from 'supertest';

import { addPerson, addStudio, createTestApp, signIn } from '../helpers/test-app';

const gbp = (amount: number) => ({ amount, currency: 'GBP' });

const terms = {
  currency: 'GBP',
  commissionRateBp: 4000,
  vatRateBp: 2000,
  venueRole: 'agent',
  commissionVat: 'added',
  makerVatRegistered: false,
  discountRule: 'shared',
  insuranceBasis: 'maker-net',
  insuredBy: 'venue',
  paymentTerms: { days: 30, from: 'month-end' },
};

async function asAssistant() {
  const { app, db } = await createTestApp();
  const studioId = await addStudio(db, 'Studio');
  await addPerson(db, 'assistant@example.test', [{ studioId, role: 'assistant' }]);
  return { app, cookie: await signIn(app, 'assistant@example.test') };
}

describe('POST /api/quotes/split', () => {
  // Worked example (docs/money-rules.md, HMRC 20% rate): maker not registered, venue registered, 40% + VAT, £100
  // sale: commission £40.00, VAT on commission £8.00, maker £52.00 (rule: VAT added = v·C).
  it('splits a £100 sale at 40% plus VAT into £40 + £8 + £52', async () => {
    const { app, cookie } = await asAssistant();
    const res = await request(app)
      .post('/api/quotes/split')
      .set('Cookie', cookie)
      .send({ terms, listPrice: gbp(10_000), salePrice: gbp(10_000) });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      commission: gbp(4_000),
      vatOnCommission: gbp(800),
      makerShare: gbp(5_200),
      makerOutputVat: gbp(0),
      makerReclaimableVat: gbp(0),
      // Maker-net insurance basis: list price less commission, without VAT (common practice; model
      // consignment agreement checklists, secondary).
      insuranceValue: gbp(6_000),
    });
  });

  it('answers 400 with field errors for a bad body', async () => {
    const { app, cookie } = await asAssistant();
    const res = await request(app)
      .post('/api/quotes/split')
      .set('Cookie', cookie)
      .send({
        terms: { ...terms, commissionRateBp: 12_000 },
        listPrice: gbp(10_000),
        salePrice: gbp(12_000),
      });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_request');
    expect(res.body.error.issues).toEqual(
      expect.arrayContaining([
        {
          path: ['terms', 'commissionRateBp'],
          message: 'The commission rate cannot be above 100%.',
        },
        {
          path: ['salePrice', 'amount'],
          message: 'The sale price cannot be above the list price.',
        },
      ]),
    );
  });

  it('refuses a discount rule that would leave the maker less than nothing, with a plain 400', async () => {
    const { app, cookie } = await asAssistant();
    const res = await request(app)
      .post('/api/quotes/split')
      .set('Cookie', cookie)
      .send({
        terms: { ...terms, discountRule: 'maker' },
        listPrice: gbp(10_000),
        salePrice: gbp(3_000),
      });
    expect(res.status).toBe(400);
    expect(res.body).toEqual({ error: { code: 'invalid_request', message: expect.any(String) } });
    expect(res.body.error.message.length).toBeGreaterThan(10);
  });
});

describe('POST /api/quotes/price-plan', () => {
  // Rule of docs/money-rules.md: the list price that yields the wanted net, rounded up to the price step.
  // At 40% with no VAT on commission, a £60 net needs £100; with a £5 step, £100 stays £100.
  it('plans the list price for a wanted net, rounded up to the step, and splits it again', async () => {
    const { app, cookie } = await asAssistant();
    const res = await request(app)
      .post('/api/quotes/price-plan')
      .set('Cookie', cookie)
      .send({ terms: { ...terms, commissionVat: 'none' }, wantedNet: gbp(6_000), step: gbp(500) });
    expect(res.status).toBe(200);
    expect(res.body.listPrice).toEqual(gbp(10_000));
    expect(res.body.split.makerShare).toEqual(gbp(6_000));
  });

  it('rounds up rather than short the maker: £61 net at 40% needs £101.67, so £105 at a £5 step', async () => {
    const { app, cookie } = await asAssistant();
    const res = await request(app)
      .post('/api/quotes/price-plan')
      .set('Cookie', cookie)
      .send({ terms: { ...terms, commissionVat: 'none' }, wantedNet: gbp(6_100), step: gbp(500) });
    expect(res.body.listPrice).toEqual(gbp(10_500));
    expect(res.body.split.makerShare.amount).toBeGreaterThanOrEqual(6_100);
  });

  it('answers 400 when the step is in another currency', async () => {
    const { app, cookie } = await asAssistant();
    const res = await request(app)
      .post('/api/quotes/price-plan')
      .set('Cookie', cookie)
      .send({ terms, wantedNet: gbp(6_000), step: { amount: 500, currency: 'EUR' } });
    expect(res.status).toBe(400);
    expect(res.body.error.issues).toEqual([
      { path: ['step', 'currency'], message: 'Enter this amount in GBP, the terms’ currency.' },
    ]);
  });
});

import request from 'supertest';

import { as } from '../helpers/consignment-fixture';
import { testAppUrl } from '../helpers/document-fixture';
import { issuedStatementFixture } from '../helpers/payments';
import { addPerson, addVenue, signIn } from '../helpers/test-app';

describe('POST /api/statements/:id/checkout', () => {
  it("creates a checkout through the provider's SDK for the balance and answers its page", async () => {
    const f = await issuedStatementFixture();
    try {
      const res = await as(f, 'gallery').post(`/api/statements/${f.statement.id}/checkout`);
      expect(res.status).toBe(200);
      expect(res.body).toEqual({
        url: expect.stringMatching(/^http:\/\/127\.0\.0\.1:\d+\/c\/pay\/cs_test_/),
      });

      // What the stand-in received from the SDK, form-encoded as the provider's API takes it.
      const [session] = [...f.standIn.sessions.values()];
      const back = `${testAppUrl}/venue/statements/${f.statement.id}`;
      expect(session).toMatchObject({
        url: res.body.url,
        mode: 'payment',
        status: 'open',
        payment_status: 'unpaid',
        // £52.00 in minor units; the provider takes currencies in lower case.
        amount_total: 5_200,
        currency: 'gbp',
        client_reference_id: f.statement.reference,
        metadata: { statementId: String(f.statement.id), studioId: String(f.studioA) },
        success_url: `${back}?payment=done`,
        cancel_url: `${back}?payment=cancelled`,
      });

      const page = await fetch(res.body.url);
      const html = await page.text();
      const text = html.replace(/<[^>]+>/g, '');
      expect(page.status).toBe(200);
      expect(text).toContain(`Pay £52.00 to Saltmarsh Kiln for statement ${f.statement.reference}`);
      expect(text).toContain('Test payment — no card is charged');
      expect(html).toMatch(
        /<button class="pay" type="submit" name="choice" value="pay">Pay £52.00<\/button>/,
      );
      expect(html).toMatch(/<button type="submit" name="choice" value="cancel">Cancel<\/button>/);
    } finally {
      await f.standIn.stop();
    }
  });

  it('lets the owner open the same checkout', async () => {
    const f = await issuedStatementFixture();
    try {
      const res = await as(f, 'owner').post(`/api/statements/${f.statement.id}/checkout`);
      expect(res.status).toBe(200);
      expect(f.standIn.sessions.size).toBe(1);
    } finally {
      await f.standIn.stop();
    }
  });

  it("answers 404 to another venue's staff and another studio's owner, 403 to the assistant", async () => {
    const f = await issuedStatementFixture();
    try {
      const otherVenue = await addVenue(f.db, f.studioA, 'The Other Gallery');
      await addPerson(f.db, 'other-desk@example.test', [
        { studioId: f.studioA, role: 'gallery', venueId: otherVenue },
      ]);
      const path = `/api/statements/${f.statement.id}/checkout`;
      const notFound = {
        error: { code: 'not_found', message: 'That statement was not found.' },
      };
      const otherDesk = await request(f.app)
        .post(path)
        .set('Cookie', await signIn(f.app, 'other-desk@example.test'));
      expect(otherDesk.status).toBe(404);
      expect(otherDesk.body).toEqual(notFound);
      const otherOwner = await as(f, 'otherOwner').post(path);
      expect(otherOwner.status).toBe(404);
      expect(otherOwner.body).toEqual(notFound);

      // Money received is the owner's business, not the assistant's (docs/domain.md, roles).
      const assistant = await as(f, 'assistant').post(path);
      expect(assistant.status).toBe(403);
      expect(assistant.body).toEqual({
        error: { code: 'forbidden', message: 'Your role in this studio does not allow this.' },
      });
      expect(f.standIn.sessions.size).toBe(0);
    } finally {
      await f.standIn.stop();
    }
  });

  it('refuses a draft statement (unseen by the venue) and a settled one', async () => {
    const f = await issuedStatementFixture();
    try {
      const owner = as(f, 'owner');
      const pay = (id: number) => `/api/statements/${id}/checkout`;

      // A second sale, on a draft statement of its own by venue and period.
      await f.db
        .updateTable('consignment_lines')
        .set({ state: 'sold', sold_on: f.today, sale_price: 24_000 })
        .where('id', '=', f.show.lines[1]!.id)
        .execute();
      const draft = await owner.post('/api/statements', {
        venueId: f.venueA,
        periodStart: f.today,
        periodEnd: f.today,
      });
      expect(draft.status).toBe(201);
      const draftRes = await owner.post(pay(draft.body.id));
      expect(draftRes.status).toBe(409);
      expect(draftRes.body).toEqual({
        error: {
          code: 'conflict',
          message: `${draft.body.reference} cannot be paid online: it is not issued yet.`,
        },
      });
      expect((await as(f, 'gallery').post(pay(draft.body.id))).status).toBe(404);

      const paid = await owner.post(`/api/statements/${f.statement.id}/payments`, {
        amount: { amount: 5_200, currency: 'GBP' },
        receivedOn: f.today,
        method: 'bank-transfer',
      });
      expect(paid.body.state).toBe('settled');
      const settled = await as(f, 'gallery').post(pay(f.statement.id));
      expect(settled.status).toBe(409);
      expect(settled.body).toEqual({
        error: {
          code: 'conflict',
          message: `${f.statement.reference} cannot be paid online: it is settled.`,
        },
      });
      expect(f.standIn.sessions.size).toBe(0);
    } finally {
      await f.standIn.stop();
    }
  });

  it('refuses a statement with nothing left to pay', async () => {
    const f = await issuedStatementFixture();
    try {
      // Paid beyond the balance by mistake: the statement stays issued with a credit.
      await f.db
        .insertInto('payments')
        .values({
          studio_id: f.studioA,
          venue_id: f.venueA,
          statement_id: f.statement.id,
          amount: 6_000,
          currency: 'GBP',
          method: 'cash',
          received_on: f.today,
        })
        .execute();
      const res = await as(f, 'gallery').post(`/api/statements/${f.statement.id}/checkout`);
      expect(res.status).toBe(409);
      expect(res.body).toEqual({
        error: { code: 'conflict', message: `${f.statement.reference} has nothing left to pay.` },
      });
    } finally {
      await f.standIn.stop();
    }
  });

  it('answers 500 in the usual shape, and logs why, when the provider cannot be reached', async () => {
    const f = await issuedStatementFixture();
    await f.standIn.stop();
    const res = await as(f, 'gallery').post(`/api/statements/${f.statement.id}/checkout`);
    expect(res.status).toBe(500);
    expect(res.body).toEqual({
      error: {
        code: 'internal',
        message:
          'The payment service could not start the payment. Try again in a moment, or pay by bank transfer.',
      },
    });
    expect(f.lines.map((l) => l.msg)).toContain('the payment provider refused a checkout');
  });
});

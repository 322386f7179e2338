import request from 'supertest';

import { formatDate } from '@/shared/format/dates';
import { saleResultSchema } from '@/shared/schemas/sale';

import { as, draftWith, galleryTerms, soundCheck } from '../helpers/consignment-fixture';
import {
  auditOf,
  costWords,
  dayAfter,
  gbp,
  lineRow,
  recordedTime,
  resolve,
  saleMails,
  saleOf,
  type SalesFixture,
  salesFixture,
  secondVenueStaff,
  sell,
  userId,
  withCookie,
} from '../helpers/sales-fixture';

const invalid = (issues: { path: (string | number)[]; message: string }[]) => ({
  error: { code: 'invalid_request', message: 'Some fields need attention.', issues },
});
const pieceNotFound = { error: { code: 'not_found', message: 'That piece was not found.' } };

/** Nothing about the line changed: still out, no audit entry, no e-mail to the maker. */
async function expectUntouched(f: SalesFixture, lineId: number) {
  expect(await lineRow(f, lineId)).toMatchObject({
    state: 'consigned',
    sold_on: null,
    sale_price: null,
    sale_recorded_by: null,
    holds_work: 1,
  });
  expect(await auditOf(f, lineId)).toEqual([]);
  expect(await saleMails(f)).toEqual([]);
}

describe('POST /api/consignment-lines/:lineId/sale', () => {
  it('records a sale at the list price with the split worked out on the server', async () => {
    const f = await salesFixture();
    const res = await sell(f, 'gallery', f.lines.tallBottle, 24_000);
    expect(res.status).toBe(201);
    expect(saleResultSchema.parse(res.body)).toEqual(res.body);
    // Venue A's terms: 40% commission, VAT at the UK standard rate of 20% added on the
    // commission (HMRC, VAT rates), the maker not registered. £240 sale, by hand:
    // commission 40% × £240 = £96.00; VAT 20% × £96.00 = £19.20; maker £240 − £96 − £19.20 =
    // £124.80. Insured at the maker's net at list price, £240 − £96 = £144 (docs/money-rules.md).
    const split = {
      commission: gbp(9_600),
      vatOnCommission: gbp(1_920),
      makerShare: gbp(12_480),
      makerOutputVat: gbp(0),
      makerReclaimableVat: gbp(0),
      insuranceValue: gbp(14_400),
    };
    expect(res.body.split).toEqual(split);
    expect(res.body.line).toMatchObject({
      id: f.lines.tallBottle,
      stockNumber: 'A-2',
      title: 'Tall bottle',
      state: 'sold',
      sale: {
        soldOn: f.today,
        price: gbp(24_000),
        split,
        discount: null,
        discountReason: null,
        enteredBy: 'venue',
        recordedBy: 'gallery-a',
        recordedAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\.\d{3}Z$/),
        lockedBy: null,
      },
      resolution: null,
    });
    // The parts the server answered add up to what the buyer paid, to the penny
    // (docs/money-rules.md).
    const { commission, vatOnCommission, makerShare } = res.body.split;
    expect(commission.amount + vatOnCommission.amount + makerShare.amount).toBe(24_000);

    expect(await lineRow(f, f.lines.tallBottle)).toMatchObject({
      state: 'sold',
      sold_on: f.today,
      sale_price: 24_000,
      discount: null,
      sale_entered_by: 'venue',
      sale_recorded_by: await userId(f, 'gallery-a@example.test'),
      // A sold piece no longer holds its work on the consignment.
      holds_work: null,
    });
    // The studio sees the same line, and the work is sold (docs/states.md).
    const seen = await as(f, 'owner').get(`/api/consignments/${f.sent.id}`);
    expect(seen.body.lines[1]).toEqual(res.body.line);
    const work = await as(f, 'owner').get(`/api/works/${f.works[1]}`);
    expect(work.body.status).toBe('sold');
  });

  it('takes a discounted price with its reason, commission on the price paid', async () => {
    const f = await salesFixture();
    const res = await sell(f, 'gallery', f.lines.teaBowl, 45_000, {
      discountReason: 'Regular customer, 10% off agreed by phone',
    });
    expect(res.status).toBe(201);
    // Discount shared (docs/money-rules.md: commission on the actual price). £450 paid for a
    // £480 piece: commission 40% × £450 = £180.00; VAT 20% × £180 = £36.00; maker £450 − £180
    // − £36 = £234.00. The discount is £30.00.
    expect(res.body.split).toMatchObject({
      commission: gbp(18_000),
      vatOnCommission: gbp(3_600),
      makerShare: gbp(23_400),
    });
    expect(res.body.line.sale).toMatchObject({
      price: gbp(45_000),
      discount: gbp(3_000),
      discountReason: 'Regular customer, 10% off agreed by phone',
    });
    expect(await lineRow(f, f.lines.teaBowl)).toMatchObject({
      discount: 3_000,
      discount_reason: 'Regular customer, 10% off agreed by phone',
    });

    // A reason with no discount is not kept: there is nothing for it to explain.
    const full = await sell(f, 'gallery', f.lines.moonJar, 10_000, { discountReason: 'None' });
    expect(full.status).toBe(201);
    expect(full.body.line.sale).toMatchObject({ discount: null, discountReason: null });
  });

  it('rounds each part to the nearest penny, the maker taking what is left', async () => {
    const f = await salesFixture();
    const res = await sell(f, 'owner', f.lines.moonJar, 9_998, { discountReason: 'Mark on rim' });
    expect(res.status).toBe(201);
    // £99.98 at 40%: commission 3,999.2p → 3,999p; VAT 20% × 3,999p = 799.8p → 800p, both to
    // the nearest penny (HMRC VAT Trader Records manual, VATREC12030); the maker £99.98 −
    // £39.99 − £8.00 = £51.99.
    expect(res.body.split).toMatchObject({
      commission: gbp(3_999),
      vatOnCommission: gbp(800),
      makerShare: gbp(5_199),
    });
  });

  it('refuses a price above the list price, on the price field', async () => {
    const f = await salesFixture();
    const res = await sell(f, 'gallery', f.lines.moonJar, 10_001);
    expect(res.status).toBe(400);
    expect(res.body).toEqual(
      invalid([
        { path: ['salePrice'], message: 'The price paid cannot be above the list price, £100.00.' },
      ]),
    );
    await expectUntouched(f, f.lines.moonJar);
  });

  it('refuses a price in another currency than the piece’s, on the currency field', async () => {
    const f = await salesFixture();
    const res = await as(f, 'gallery').post(`/api/consignment-lines/${f.lines.moonJar}/sale`, {
      soldOn: f.today,
      salePrice: { amount: 9_000, currency: 'EUR' },
    });
    expect(res.status).toBe(400);
    expect(res.body).toEqual(
      invalid([
        {
          path: ['salePrice', 'currency'],
          message: 'A-1 Moon jar is priced in GBP: record the sale in GBP.',
        },
      ]),
    );
    await expectUntouched(f, f.lines.moonJar);
  });

  it('refuses a day before the piece was sent, and a day after today, on the date field', async () => {
    const f = await salesFixture();
    // Sending dated the consignment today (docs/states.md), so yesterday is before dispatch.
    const early = await sell(f, 'gallery', f.lines.moonJar, 10_000, {
      soldOn: dayAfter(f.today, -1),
    });
    expect(early.status).toBe(400);
    expect(early.body).toEqual(
      invalid([
        {
          path: ['soldOn'],
          message: `The date cannot come before the piece was sent, on ${f.today}.`,
        },
      ]),
    );
    const late = await sell(f, 'owner', f.lines.moonJar, 10_000, { soldOn: dayAfter(f.today) });
    expect(late.status).toBe(400);
    expect(late.body).toEqual(
      invalid([{ path: ['soldOn'], message: `The date cannot be after today, ${f.today}.` }]),
    );
    await expectUntouched(f, f.lines.moonJar);
  });

  it('lists every fault at once, each on its field', async () => {
    const f = await salesFixture();
    const res = await sell(f, 'gallery', f.lines.moonJar, 20_000, {
      soldOn: dayAfter(f.today, 2),
    });
    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string[] }) => i.path.join('.'))).toEqual([
      'soldOn',
      'salePrice',
    ]);
  });

  it('refuses, on the price, a discount the maker bears that leaves the maker less than nothing', async () => {
    const f = await salesFixture();
    const owner = as(f, 'owner');
    const work = await f.db
      .insertInto('works')
      .values({
        studio_id: f.studioA,
        stock_number: 'A-8',
        title: 'Jug',
        retail_price: 10_000,
        currency: 'GBP',
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    const created = await owner.post('/api/consignments', {
      venueId: f.venueA,
      title: 'Maker bears discounts',
      terms: { ...galleryTerms, discountRule: 'maker' },
    });
    await owner.post(`/api/consignments/${created.body.id}/lines`, { workId: work.id });
    const lineId: number = (await owner.get(`/api/consignments/${created.body.id}`)).body.lines[0]
      .id;
    await owner.post(`/api/consignments/${created.body.id}/agree`);
    await owner.post(`/api/consignment-lines/${lineId}/condition-reports`, {
      stage: 'dispatch',
      ...soundCheck,
    });
    expect((await owner.post(`/api/consignments/${created.body.id}/dispatch`)).status).toBe(200);
    // With the maker bearing the discount the commission is on the list price
    // (docs/money-rules.md): 40% × £100 = £40 + £8 VAT, more than a £45 sale leaves after it.
    const res = await sell(f, 'gallery', lineId, 4_500, { discountReason: 'Last day' });
    expect(res.status).toBe(400);
    expect(res.body).toEqual(
      invalid([
        {
          path: ['salePrice'],
          message:
            'With the maker bearing the discount, the commission on the list price would be more ' +
            'than this sale brings in. Record a smaller discount or agree another discount rule.',
        },
      ]),
    );
    await expectUntouched(f, lineId);
    // £48 leaves the maker nothing, which the rule allows: £48 − £40 − £8 = £0.
    const even = await sell(f, 'gallery', lineId, 4_800, { discountReason: 'Last day' });
    expect(even.status).toBe(201);
    expect(even.body.split).toMatchObject({
      commission: gbp(4_000),
      vatOnCommission: gbp(800),
      makerShare: gbp(0),
    });
  });

  it('refuses a malformed request before looking at the piece', async () => {
    const f = await salesFixture();
    const path = `/api/consignment-lines/${f.lines.moonJar}/sale`;
    const res = await as(f, 'gallery').post(path, {
      soldOn: '2026-02-30',
      salePrice: { amount: -1, currency: 'GBP' },
      paidBy: 'card',
    });
    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string[] }) => i.path.join('.'))).toEqual([
      'soldOn',
      'salePrice.amount',
      '',
    ]);
    expect(res.body.error.issues.slice(0, 2)).toEqual([
      { path: ['soldOn'], message: 'Enter a date such as 2026-11-28.' },
      { path: ['salePrice', 'amount'], message: 'A price cannot be below zero.' },
    ]);
    const pence = await as(f, 'gallery').post(path, saleOf(f, 99.5));
    expect(pence.status).toBe(400);
    expect(pence.body).toEqual(
      invalid([
        {
          path: ['salePrice', 'amount'],
          message: 'Enter the amount as a whole number of minor units (pence for GBP).',
        },
      ]),
    );
    const id = await as(f, 'gallery').post('/api/consignment-lines/abc/sale', saleOf(f, 100));
    expect(id.status).toBe(400);
    expect(id.body).toEqual(
      invalid([{ path: ['lineId'], message: 'The line id must be a number.' }]),
    );
    await expectUntouched(f, f.lines.moonJar);
  });

  it('refuses a piece on a consignment not yet sent: agreed, or still a draft', async () => {
    const f = await salesFixture();
    const moreWork = await f.db
      .insertInto('works')
      .values({
        studio_id: f.studioA,
        stock_number: 'A-9',
        title: 'Lidded jar',
        retail_price: 15_000,
        currency: 'GBP',
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    const draft = await draftWith(f, [moreWork.id], 'Spring show');
    const line = draft.lines[0]!.id;
    // A draft is the studio's alone: the venue cannot see it at all.
    expect((await sell(f, 'gallery', line, 15_000)).body).toEqual(pieceNotFound);
    const drafted = await sell(f, 'owner', line, 15_000);
    expect(drafted.status).toBe(409);
    expect(drafted.body).toEqual({
      error: {
        code: 'conflict',
        message: `A-9 Lidded jar cannot change now: ${draft.reference} is draft.`,
      },
    });
    // Agreed: the venue sees it coming, but it has not left the studio.
    expect((await as(f, 'owner').post(`/api/consignments/${draft.id}/agree`)).status).toBe(200);
    for (const who of ['owner', 'gallery'] as const) {
      const agreed = await sell(f, who, line, 15_000);
      expect(agreed.status).toBe(409);
      expect(agreed.body).toEqual({
        error: {
          code: 'conflict',
          message: 'A-9 Lidded jar cannot change now: it has not been sent yet.',
        },
      });
    }
    await expectUntouched(f, line);
  });

  it('answers 409 naming who recorded the sale and when', async () => {
    const f = await salesFixture();
    const first = await sell(f, 'gallery', f.lines.tallBottle, 24_000);
    expect(first.status).toBe(201);
    const at = recordedTime(first.body.line.sale.recordedAt);
    const day = formatDate(f.today, 'en-GB');
    for (const who of ['owner', 'assistant', 'gallery'] as const) {
      const again = await sell(f, who, f.lines.tallBottle, 20_000, { discountReason: 'Late' });
      expect(again.status).toBe(409);
      expect(again.body).toEqual({
        error: {
          code: 'conflict',
          message: `A-2 Tall bottle is already sold: gallery-a at Gallery of A recorded the sale on ${day} at ${at}.`,
        },
      });
    }
    // A sale the studio took by phone is named as the studio's.
    const phoned = await sell(f, 'assistant', f.lines.teaBowl, 48_000);
    const phonedAt = recordedTime(phoned.body.line.sale.recordedAt);
    const late = await sell(f, 'gallery', f.lines.teaBowl, 48_000);
    expect(late.status).toBe(409);
    expect(late.body.error.message).toBe(
      `A-3 Tea bowl is already sold: assistant-a (the studio) recorded the sale on ${day} at ${phonedAt}.`,
    );
    // A piece that left another way says how, by whom and when.
    await resolve(f, 'gallery', f.lines.moonJar, { state: 'returned', on: f.today });
    const gone = await sell(f, 'owner', f.lines.moonJar, 10_000);
    expect(gone.status).toBe(409);
    expect(gone.body.error.message).toBe(
      `A-1 Moon jar is no longer out: it was marked returned by gallery-a on ${day}.`,
    );
    // Only the first sale stands.
    expect(await lineRow(f, f.lines.tallBottle)).toMatchObject({
      sale_price: 24_000,
      discount_reason: null,
    });
    expect((await auditOf(f, f.lines.tallBottle)).map((a) => a.action)).toEqual(['line.sold']);
  });

  it('lets the owner and the assistant record a sale the venue phoned in, as the studio', async () => {
    const f = await salesFixture();
    for (const [who, lineId, name] of [
      ['owner', f.lines.moonJar, 'owner-a'],
      ['assistant', f.lines.tallBottle, 'assistant-a'],
    ] as const) {
      const res = await sell(f, who, lineId, 9_000, { discountReason: 'Damaged box' });
      expect(res.status).toBe(201);
      expect(res.body.line.sale).toMatchObject({ enteredBy: 'studio', recordedBy: name });
      expect((await lineRow(f, lineId)).sale_entered_by).toBe('studio');
      const [entry] = await auditOf(f, lineId);
      expect(entry).toMatchObject({
        action: 'line.sold',
        user_id: await userId(f, `${name}@example.test`),
        after: expect.objectContaining({ enteredBy: 'studio' }),
      });
    }
  });

  it('writes one audit entry for the sale: who, what it was, and what it became', async () => {
    const f = await salesFixture();
    const res = await sell(f, 'gallery', f.lines.teaBowl, 47_000, { discountReason: 'Chipped' });
    expect(res.status).toBe(201);
    expect(await auditOf(f, f.lines.teaBowl)).toEqual([
      {
        id: expect.any(Number),
        studio_id: f.studioA,
        user_id: await userId(f, 'gallery-a@example.test'),
        action: 'line.sold',
        entity: 'consignment_line',
        entity_id: String(f.lines.teaBowl),
        before: { state: 'consigned' },
        after: {
          state: 'sold',
          soldOn: f.today,
          salePrice: gbp(47_000),
          discountReason: 'Chipped',
          enteredBy: 'venue',
          split: res.body.split,
        },
        created_at: expect.any(String),
      },
    ]);
  });

  it('answers 404 to another venue’s staff and to another studio, telling them nothing', async () => {
    const f = await salesFixture();
    const { cookie } = await secondVenueStaff(f);
    const other = withCookie(f, cookie);
    const foreign = withCookie(f, await f.cookie('otherOwner'));
    for (const stranger of [other, foreign]) {
      const res = await stranger.post(
        `/api/consignment-lines/${f.lines.moonJar}/sale`,
        saleOf(f, 10_000),
      );
      expect(res.status).toBe(404);
      expect(res.body).toEqual(pieceNotFound);
      expect(JSON.stringify(res.body)).not.toMatch(costWords);
    }
    // The same answer as for a piece that does not exist.
    const missing = await sell(f, 'gallery', 99_999, 10_000);
    expect(missing.status).toBe(404);
    expect(missing.body).toEqual(pieceNotFound);
    await expectUntouched(f, f.lines.moonJar);
  });

  it('answers 401 without a session', async () => {
    const f = await salesFixture();
    const res = await request(f.app)
      .post(`/api/consignment-lines/${f.lines.moonJar}/sale`)
      .send(saleOf(f, 10_000));
    expect(res.status).toBe(401);
    expect(res.body).toEqual({
      error: { code: 'unauthenticated', message: 'Sign in to continue.' },
    });
    await expectUntouched(f, f.lines.moonJar);
  });
});

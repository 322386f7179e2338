import { saleBatchResultSchema } from '@/shared/schemas/sale';

import { as } from '../helpers/consignment-fixture';
import {
  auditOf,
  gbp,
  lineRow,
  saleMails,
  saleOf,
  type SalesFixture,
  salesFixture,
  secondVenueStaff,
  sell,
  studioBShow,
  withCookie,
} from '../helpers/sales-fixture';

const receipt = (f: SalesFixture, who: 'owner' | 'gallery', sales: object[]) =>
  as(f, who).post(`/api/consignments/${f.sent.id}/sales`, { sales });

/** No line of the consignment changed, no audit entry, no e-mail. */
async function expectNothingRecorded(f: SalesFixture) {
  for (const lineId of Object.values(f.lines)) {
    expect((await lineRow(f, lineId)).state).toBe('consigned');
    expect(await auditOf(f, lineId)).toEqual([]);
  }
  expect(await saleMails(f)).toEqual([]);
}

describe('POST /api/consignments/:id/sales', () => {
  it('records a till receipt of several pieces, each with its split', async () => {
    const f = await salesFixture();
    const res = await receipt(f, 'gallery', [
      { lineId: f.lines.moonJar, ...saleOf(f, 10_000) },
      { lineId: f.lines.teaBowl, ...saleOf(f, 43_200, { discountReason: 'Bought with the jar' }) },
    ]);
    expect(res.status).toBe(201);
    expect(saleBatchResultSchema.parse(res.body)).toEqual(res.body);
    // Venue A's terms, 40% commission + 20% VAT on it (HMRC, VAT rates), by hand:
    // £100 → £40.00 + £8.00, maker £52.00 (the worked example in docs/money-rules.md);
    // £432 → £172.80 + £34.56, maker £432 − £172.80 − £34.56 = £224.64.
    expect(res.body.sales.map((s: { line: { id: number } }) => s.line.id)).toEqual([
      f.lines.moonJar,
      f.lines.teaBowl,
    ]);
    expect(res.body.sales[0].split).toMatchObject({
      commission: gbp(4_000),
      vatOnCommission: gbp(800),
      makerShare: gbp(5_200),
    });
    expect(res.body.sales[1].split).toMatchObject({
      commission: gbp(17_280),
      vatOnCommission: gbp(3_456),
      makerShare: gbp(22_464),
    });
    expect(res.body.sales[1].line.sale).toMatchObject({
      discount: gbp(4_800),
      discountReason: 'Bought with the jar',
      enteredBy: 'venue',
    });
    for (const lineId of [f.lines.moonJar, f.lines.teaBowl]) {
      expect((await lineRow(f, lineId)).state).toBe('sold');
      expect((await auditOf(f, lineId)).map((a) => a.action)).toEqual(['line.sold']);
    }
    expect((await lineRow(f, f.lines.tallBottle)).state).toBe('consigned');
    // One e-mail tells the maker of both.
    expect(await saleMails(f)).toHaveLength(1);
  });

  it('records nothing when one sale on the receipt is wrong, and says which', async () => {
    const f = await salesFixture();
    const res = await receipt(f, 'gallery', [
      { lineId: f.lines.moonJar, ...saleOf(f, 10_000) },
      { lineId: f.lines.tallBottle, ...saleOf(f, 25_000) },
      { lineId: f.lines.teaBowl, ...saleOf(f, 48_000) },
    ]);
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: {
        code: 'invalid_request',
        message: 'Some fields need attention.',
        issues: [
          {
            path: ['sales', 1, 'salePrice'],
            message: 'The price paid cannot be above the list price, £240.00.',
          },
        ],
      },
    });
    await expectNothingRecorded(f);
  });

  it('records nothing when one piece is already sold', async () => {
    const f = await salesFixture();
    expect((await sell(f, 'owner', f.lines.teaBowl, 48_000)).status).toBe(201);
    const res = await receipt(f, 'gallery', [
      { lineId: f.lines.moonJar, ...saleOf(f, 10_000) },
      { lineId: f.lines.teaBowl, ...saleOf(f, 48_000) },
    ]);
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(
      /^A-3 Tea bowl is already sold: owner-a \(the studio\) recorded the sale on /,
    );
    expect((await lineRow(f, f.lines.moonJar)).state).toBe('consigned');
    expect(await auditOf(f, f.lines.moonJar)).toEqual([]);
    // The maker's e-mail still tells of the tea bowl alone.
    expect((await saleMails(f)).map((m) => m.subject)).toEqual([
      'Sold at Gallery of A: A-3 Tea bowl, £480.00',
    ]);
  });

  it('refuses a piece from another consignment, or another studio, on its line', async () => {
    const f = await salesFixture();
    const theirs = await studioBShow(f);
    const res = await receipt(f, 'owner', [
      { lineId: f.lines.moonJar, ...saleOf(f, 10_000) },
      { lineId: theirs.bowl, ...saleOf(f, 10_000) },
    ]);
    expect(res.status).toBe(400);
    expect(res.body.error.issues).toEqual([
      { path: ['sales', 1, 'lineId'], message: 'That piece is not on this consignment.' },
    ]);
    await expectNothingRecorded(f);
    expect((await lineRow(f, theirs.bowl)).state).toBe('consigned');
  });

  it('refuses an empty receipt and one naming a piece twice', async () => {
    const f = await salesFixture();
    const empty = await receipt(f, 'gallery', []);
    expect(empty.status).toBe(400);
    expect(empty.body.error.issues).toEqual([
      { path: ['sales'], message: 'List the pieces sold.' },
    ]);
    const twice = await receipt(f, 'gallery', [
      { lineId: f.lines.moonJar, ...saleOf(f, 10_000) },
      { lineId: f.lines.moonJar, ...saleOf(f, 9_000) },
    ]);
    expect(twice.status).toBe(400);
    expect(twice.body.error.issues).toEqual([
      { path: ['sales', 1, 'lineId'], message: 'That piece is already on this receipt.' },
    ]);
    await expectNothingRecorded(f);
  });

  it('answers 404 to another venue’s staff and to another studio', async () => {
    const f = await salesFixture();
    const { cookie } = await secondVenueStaff(f);
    for (const stranger of [withCookie(f, cookie), withCookie(f, await f.cookie('otherOwner'))]) {
      const res = await stranger.post(`/api/consignments/${f.sent.id}/sales`, {
        sales: [{ lineId: f.lines.moonJar, ...saleOf(f, 10_000) }],
      });
      expect(res.status).toBe(404);
      expect(res.body).toEqual({
        error: { code: 'not_found', message: 'That consignment was not found.' },
      });
    }
    await expectNothingRecorded(f);
  });
});

import { as } from '../helpers/consignment-fixture';
import { gbp, twoSalesFixture } from '../helpers/two-sales-fixture';

/** Venue A's two sales (tests/server/helpers/two-sales-fixture.ts), and their year. */
async function yearWithSales() {
  const { f, owner, today } = await twoSalesFixture();
  return { f, owner, today, year: Number(today.slice(0, 4)) };
}

describe('GET /api/year', () => {
  it('totals the sales by month and venue from the money engine, per currency', async () => {
    const { owner, today, year } = await yearWithSales();
    const res = await owner.get(`/api/year?year=${year}`);
    expect(res.status).toBe(200);
    const [gbpYear] = res.body.currencies;
    expect(gbpYear.currency).toBe('GBP');
    // £90 + £240; the maker keeps £46.80 + £124.80 after 40% commission and 20% VAT on it.
    expect(gbpYear.totals).toEqual({ count: 2, sales: gbp(33_000), makerShare: gbp(17_160) });
    const month = gbpYear.byMonth.find((m: { month: string }) => m.month === today.slice(0, 7));
    expect(month).toEqual({
      month: today.slice(0, 7),
      count: 2,
      sales: gbp(33_000),
      makerShare: gbp(17_160),
    });
    expect(gbpYear.byVenue).toEqual([
      {
        venueId: expect.any(Number),
        venueName: 'Gallery of A',
        count: 2,
        sales: gbp(33_000),
        commission: gbp(13_200),
        vatOnCommission: gbp(2_640),
        makerShare: gbp(17_160),
        paid: gbp(0),
      },
    ]);
    // The third piece, £480 listed, is still out: insured at the maker's net, £288.
    expect(gbpYear.exposure.at(-1).total).toEqual(gbp(28_800));
    // The monitor compares turnover with the UK registration threshold, £90,000 from 1 April 2024
    // (HM Treasury, 7 March 2024): through an agent the whole price is the maker's turnover.
    const current = res.body.vatThreshold.months.at(-1);
    expect(current.threshold).toEqual(gbp(9_000_000));
    expect(current.rolling12).toEqual(gbp(33_000));
    expect(current.over).toBe(false);
  });

  it('gives the accountant the sales as CSV', async () => {
    const { owner, year } = await yearWithSales();
    const res = await owner.get(`/api/year/sales.csv?year=${year}`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    const lines = res.text
      .replace(/^\ufeff/, '')
      .trim()
      .split('\r\n');
    expect(lines).toHaveLength(3);
    expect(lines[1]).toContain('90.00');
    expect(lines[1]).toContain('36.00');
    expect(lines[1]).toContain('Returning customer');
  });

  it('is the owner’s only, and checks the year', async () => {
    const { f, owner } = await yearWithSales();
    expect((await as(f, 'assistant').get('/api/year?year=2026')).status).toBe(403);
    expect((await as(f, 'gallery').get('/api/year/sales.csv?year=2026')).status).toBe(403);
    const bad = await owner.get('/api/year?year=twenty');
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].path).toEqual(['year']);
  });
});

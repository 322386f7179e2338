import { overviewSchema } from '@/shared/schemas/overview';

import { as } from '../helpers/consignment-fixture';
import { gbp, salesFixture, sell, undo } from '../helpers/sales-fixture';
import { addConsignment, insertLine, insertWork } from '../helpers/studio-fixture';

describe('GET /api/overview, recent sales', () => {
  it('lists the studio’s latest sales, newest first, with what each leaves the maker', async () => {
    const f = await salesFixture();
    await sell(f, 'gallery', f.lines.tallBottle, 24_000);
    await sell(f, 'owner', f.lines.moonJar, 9_998, { discountReason: 'Mark on rim' });
    await sell(f, 'gallery', f.lines.teaBowl, 48_000);
    await undo(f, 'gallery', f.lines.teaBowl);

    const res = await as(f, 'owner').get('/api/overview');
    expect(res.status).toBe(200);
    expect(overviewSchema.parse(res.body)).toEqual(res.body);
    const common = {
      consignmentId: f.sent.id,
      reference: f.sent.reference,
      venueName: 'Gallery of A',
      soldOn: f.today,
    };
    // Maker's shares on venue A's 40% + 20% VAT terms, worked in sale.test.ts: £99.98 leaves
    // £51.99, £240 leaves £124.80. The undone sale is not a sale.
    expect(res.body.recentSales).toEqual([
      {
        ...common,
        lineId: f.lines.moonJar,
        stockNumber: 'A-1',
        title: 'Moon jar',
        price: gbp(9_998),
        makerShare: gbp(5_199),
        enteredBy: 'studio',
      },
      {
        ...common,
        lineId: f.lines.tallBottle,
        stockNumber: 'A-2',
        title: 'Tall bottle',
        price: gbp(24_000),
        makerShare: gbp(12_480),
        enteredBy: 'venue',
      },
    ]);
    // The assistant sees the same; another studio sees none of them.
    expect((await as(f, 'assistant').get('/api/overview')).body.recentSales).toEqual(
      res.body.recentSales,
    );
    expect((await as(f, 'otherOwner').get('/api/overview')).body.recentSales).toEqual([]);
  });

  it('keeps to the latest eight, by the day of sale', async () => {
    const f = await salesFixture();
    await sell(f, 'gallery', f.lines.moonJar, 10_000);
    const earlier = await addConsignment(f.db, f.studioA, f.venueA, 'C-2026-OLD');
    const days = ['2026-10-03', '2026-10-09', '2026-10-01', '2026-10-07', '2026-10-05'];
    for (const [i, day] of [...days, ...days].entries()) {
      const work = await insertWork(f.db, f.studioA, `OLD-${i}`);
      const line = await insertLine(f.db, f.studioA, earlier, work, 'sold');
      await f.db
        .updateTable('consignment_lines')
        .set({ sold_on: day })
        .where('id', '=', line)
        .execute();
    }
    const res = await as(f, 'owner').get('/api/overview');
    expect(res.body.recentSales.map((s: { soldOn: string }) => s.soldOn)).toEqual([
      f.today,
      '2026-10-09',
      '2026-10-09',
      '2026-10-07',
      '2026-10-07',
      '2026-10-05',
      '2026-10-05',
      '2026-10-03',
    ]);
  });
});

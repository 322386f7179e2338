import request from 'supertest';

import {
  addConsignment,
  addPerson,
  addStudio,
  addVenue,
  createTestApp,
  signIn,
} from '../helpers/test-app';

type Db = Awaited<ReturnType<typeof createTestApp>>['db'];

async function addWork(db: Db, studioId: number, stock: string) {
  const row = await db
    .insertInto('works')
    .values({
      studio_id: studioId,
      stock_number: stock,
      title: `Work ${stock}`,
      retail_price: 10_000,
      currency: 'GBP',
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

async function addLine(
  db: Db,
  studioId: number,
  consignmentId: number,
  workId: number,
  state: 'consigned' | 'sold' | 'returned' | 'withdrawn',
) {
  await db
    .insertInto('consignment_lines')
    .values({
      studio_id: studioId,
      consignment_id: consignmentId,
      work_id: workId,
      currency: 'GBP',
      list_price: 10_000,
      insurance_value: 6_000,
      state,
      ...(state === 'sold' ? { sold_on: '2026-11-02', sale_price: 10_000 } : {}),
    })
    .execute();
}

describe('GET /api/overview', () => {
  it("derives each work's status from its latest consignment line", async () => {
    const { app, db } = await createTestApp();
    const studio = await addStudio(db, 'Studio');
    const other = await addStudio(db, 'Other studio');
    const venue = await addVenue(db, studio, 'Gallery');
    await addVenue(db, other, 'Not ours');
    await addPerson(db, 'owner@example.test', [{ studioId: studio, role: 'owner' }]);
    const earlier = await addConsignment(db, studio, venue, 'S-1');
    const later = await addConsignment(db, studio, venue, 'S-2');

    const inStudio = await addWork(db, studio, '001');
    const out = await addWork(db, studio, '002');
    const sold = await addWork(db, studio, '003');
    const backThenOutAgain = await addWork(db, studio, '004');
    const withdrawn = await addWork(db, studio, '005');
    await addWork(db, other, '001');
    expect(inStudio).toBeGreaterThan(0);
    await addLine(db, studio, later, out, 'consigned');
    await addLine(db, studio, later, sold, 'sold');
    await addLine(db, studio, earlier, backThenOutAgain, 'returned');
    await addLine(db, studio, later, backThenOutAgain, 'consigned');
    await addLine(db, studio, later, withdrawn, 'withdrawn');

    const res = await request(app)
      .get('/api/overview')
      .set('Cookie', await signIn(app, 'owner@example.test'));
    expect(res.status).toBe(200);
    expect(res.body.works).toEqual({
      total: 5,
      byStatus: { 'in-studio': 2, 'on-consignment': 2, sold: 1, returned: 0, damaged: 0, lost: 0 },
    });
    expect(res.body.venues).toEqual({ total: 1 });
    expect(res.body.consignments.outCount).toBe(2);
    const s2 = res.body.consignments.out.find((c: { reference: string }) => c.reference === 'S-2');
    expect(s2).toMatchObject({
      venueName: 'Gallery',
      state: 'on-show',
      lineCount: 3,
      linesOut: 2,
      linesSold: 1,
    });
  });
});

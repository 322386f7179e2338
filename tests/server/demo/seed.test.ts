import request from 'supertest';

import { demoSignIns } from '@/server/demo/demo-studio';
import { clearAllData, seedDemoIfEmpty } from '@/server/demo/seed';
import { termsSchema } from '@/shared/schemas/terms';

import { createTestApp } from '../helpers/test-app';

describe('the demo seed', () => {
  it('seeds the scenario into an empty database, and never into one that holds data', async () => {
    const { db } = await createTestApp();
    expect(await seedDemoIfEmpty(db)).toBe(true);
    expect(await seedDemoIfEmpty(db)).toBe(false);
    const works = await db.selectFrom('works').select(['weight_g', 'retail_price']).execute();
    expect(works).toHaveLength(30);
    // Handling guideline 16 kg, UK HSE INDG143: the demo carries at least one piece above it.
    expect(works.some((w) => (w.weight_g ?? 0) > 16_000)).toBe(true);
  });

  it('has the three venues with their terms, each valid against the Terms schema', async () => {
    const { db } = await createTestApp();
    await seedDemoIfEmpty(db);
    const venues = await db.selectFrom('venues').select(['kind', 'default_terms']).execute();
    const terms = venues.map((v) => ({
      kind: v.kind,
      ...termsSchema.parse(JSON.parse(v.default_terms)),
    }));
    expect(terms.map((t) => [t.kind, t.commissionRateBp, t.commissionVat])).toEqual([
      ['gallery', 4000, 'added'],
      ['shop', 3500, 'none'],
      ['fair', 3000, 'included'],
    ]);
  });

  it('has one consignment on show with two sales and one closed, waiting to be reconciled', async () => {
    const { db } = await createTestApp();
    await seedDemoIfEmpty(db);
    const consignments = await db
      .selectFrom('consignments')
      .select(['id', 'state'])
      .orderBy('id')
      .execute();
    expect(consignments.map((c) => c.state)).toEqual(['on-show', 'closed']);
    const lines = await db
      .selectFrom('consignment_lines')
      .select(['consignment_id', 'state'])
      .execute();
    const onShowSold = lines.filter(
      (l) => l.consignment_id === consignments[0]!.id && l.state === 'sold',
    );
    expect(onShowSold).toHaveLength(2);
    const closedUnresolved = lines.filter(
      (l) => l.consignment_id === consignments[1]!.id && l.state === 'consigned',
    );
    expect(closedUnresolved.length).toBeGreaterThan(0);
  });

  it('lets every demo person sign in with the demo password', async () => {
    const { app, db } = await createTestApp();
    await seedDemoIfEmpty(db);
    for (const person of demoSignIns.people) {
      const res = await request(app)
        .post('/api/auth/sign-in/email')
        .send({ email: person.email, password: demoSignIns.password });
      expect(res.status).toBe(200);
    }
  });

  it('can be cleared and seeded again (npm run seed -- --reset)', async () => {
    const { db } = await createTestApp();
    await seedDemoIfEmpty(db);
    await clearAllData(db);
    expect(await seedDemoIfEmpty(db)).toBe(true);
    const { n } = await db
      .selectFrom('works')
      .select((e) => e.fn.countAll().as('n'))
      .executeTakeFirstOrThrow();
    expect(Number(n)).toBe(30);
  });
});

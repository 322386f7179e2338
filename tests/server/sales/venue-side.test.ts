import request from 'supertest';

import {
  venueConsignmentSchema,
  venueHomeSchema,
  venuePiecesSchema,
} from '@/shared/schemas/venue-side';

import { as } from '../helpers/consignment-fixture';
import {
  auditOf,
  costWords,
  gbp,
  lineRow,
  saleMails,
  saleOf,
  type SalesFixture,
  salesFixture,
  secondVenueStaff,
  sell,
  studioBShow,
  userId,
  withCookie,
} from '../helpers/sales-fixture';
import { addPerson, signIn } from '../helpers/test-app';

type CounterItem = {
  studio: { id: number; name: string };
  consignment: { id: number; reference: string };
  line: { id: number; stockNumber: string; title: string; state: string };
};

/** Studio B's show, and a person on the staff of venue A (studio A) and of venue B (studio B). */
async function twoMakers(f: SalesFixture) {
  const b = await studioBShow(f);
  await addPerson(f.db, 'counter@example.test', [
    { studioId: f.studioA, role: 'gallery', venueId: f.venueA },
    { studioId: f.studioB, role: 'gallery', venueId: f.venueB },
  ]);
  const cookie = await signIn(f.app, 'counter@example.test');
  return { ...b, cookie, counter: withCookie(f, cookie) };
}

const studioA = (f: SalesFixture) => ({ id: f.studioA, name: 'Studio A' });
const studioB = (f: SalesFixture) => ({ id: f.studioB, name: 'Studio B' });
const stock = (items: CounterItem[]) => items.map((i) => i.line.stockNumber);

describe('GET /api/venue/pieces', () => {
  it('gives a person working for two studios one counter list, each piece marked with its maker', async () => {
    const f = await salesFixture();
    const { counter } = await twoMakers(f);
    const res = await counter.get('/api/venue/pieces');
    expect(res.status).toBe(200);
    expect(venuePiecesSchema.parse(res.body)).toEqual(res.body);
    expect(
      res.body.items.map((i: CounterItem) => [i.studio.name, i.line.stockNumber, i.line.title]),
    ).toEqual([
      ['Studio A', 'A-1', 'Moon jar'],
      ['Studio A', 'A-2', 'Tall bottle'],
      ['Studio A', 'A-3', 'Tea bowl'],
      ['Studio B', 'B-7', 'Salt-glazed bowl'],
      ['Studio B', 'B-8', 'Cider jug'],
    ]);
    expect(res.body.items[3]).toMatchObject({
      studio: studioB(f),
      consignment: { reference: 'B-2026-001', state: 'on-show' },
      line: { listPrice: gbp(10_000), state: 'consigned', soldOn: null, salePrice: null },
    });
    expect(res.body.counts).toEqual({ consigned: 5 });
    expect(JSON.stringify(res.body)).not.toMatch(costWords);

    // Someone on one venue's staff sees that venue's pieces only.
    const one = await as(f, 'gallery').get('/api/venue/pieces');
    expect(stock(one.body.items)).toEqual(['A-1', 'A-2', 'A-3']);
  });

  it('puts the pieces still out first, then those sold, with the sale', async () => {
    const f = await salesFixture();
    const { counter, jug } = await twoMakers(f);
    await sell(f, 'gallery', f.lines.moonJar, 9_500, { discountReason: 'Friend of the maker' });
    expect(
      (await counter.post(`/api/consignment-lines/${jug}/sale`, saleOf(f, 10_000))).status,
    ).toBe(201);
    const res = await counter.get('/api/venue/pieces');
    expect(stock(res.body.items)).toEqual(['A-2', 'A-3', 'B-7', 'A-1', 'B-8']);
    expect(res.body.items[3].line).toMatchObject({
      state: 'sold',
      soldOn: f.today,
      salePrice: gbp(9_500),
    });
    expect(res.body.counts).toEqual({ consigned: 3, sold: 2 });
  });

  it('finds pieces by stock number or title, whatever the case, every word', async () => {
    const f = await salesFixture();
    const { counter } = await twoMakers(f);
    const search = async (q: string) => {
      const res = await counter.get(`/api/venue/pieces?q=${encodeURIComponent(q)}`);
      expect(res.status).toBe(200);
      return stock(res.body.items);
    };
    expect(await search('a-2')).toEqual(['A-2']);
    expect(await search('A-2')).toEqual(['A-2']);
    expect(await search('b-8')).toEqual(['B-8']);
    expect(await search('TALL')).toEqual(['A-2']);
    expect(await search('Bowl')).toEqual(['A-3', 'B-7']);
    expect(await search('jar MOON')).toEqual(['A-1']);
    expect(await search('moon bowl')).toEqual([]);
    // What people type is text, not a pattern: % and _ match only themselves.
    expect(await search('%')).toEqual([]);
    expect(await search('A_1')).toEqual([]);
    expect(await search('  ')).toEqual(['A-1', 'A-2', 'A-3', 'B-7', 'B-8']);
  });

  it('counts every piece by state, whatever the search shows', async () => {
    const f = await salesFixture();
    await sell(f, 'gallery', f.lines.teaBowl, 48_000);
    const res = await as(f, 'gallery').get('/api/venue/pieces?q=moon');
    expect(stock(res.body.items)).toEqual(['A-1']);
    // The schema: counts are over all the person's venues, before the search.
    expect(res.body.counts).toEqual({ consigned: 2, sold: 1 });
  });

  it('answers 403 to the studio’s roles and 400 for a search that is too long', async () => {
    const f = await salesFixture();
    for (const who of ['owner', 'assistant'] as const) {
      const res = await as(f, who).get('/api/venue/pieces');
      expect(res.status).toBe(403);
    }
    const long = await as(f, 'gallery').get(`/api/venue/pieces?q=${'x'.repeat(101)}`);
    expect(long.status).toBe(400);
    expect(long.body.error.issues.map((i: { path: string[] }) => i.path)).toEqual([['q']]);
  });
});

describe('GET /api/venue/consignments and /api/venue/consignments/:id', () => {
  it('lists the places and consignments of both studios, and opens each in its own studio', async () => {
    const f = await salesFixture();
    const { counter, consignmentId } = await twoMakers(f);
    const home = await counter.get('/api/venue/consignments');
    expect(home.status).toBe(200);
    expect(venueHomeSchema.parse(home.body)).toEqual(home.body);
    expect(home.body.places).toEqual([
      { studio: studioA(f), venue: { id: f.venueA, name: 'Gallery of A' } },
      { studio: studioB(f), venue: { id: f.venueB, name: 'Gallery of B' } },
    ]);
    expect(
      home.body.consignments.map((c: { id: number; studio: object }) => [c.id, c.studio]),
    ).toEqual([
      [f.sent.id, studioA(f)],
      [consignmentId, studioB(f)],
    ]);
    for (const [id, studio] of [
      [f.sent.id, studioA(f)],
      [consignmentId, studioB(f)],
    ] as const) {
      const one = await counter.get(`/api/venue/consignments/${id}`);
      expect(one.status).toBe(200);
      expect(venueConsignmentSchema.parse(one.body)).toEqual(one.body);
      expect(one.body).toMatchObject({ id, studio });
      expect(JSON.stringify(one.body)).not.toMatch(costWords);
    }
  });

  it('answers 404 to another venue’s staff and another studio’s, with nothing of the consignment', async () => {
    const f = await salesFixture();
    const b = await studioBShow(f);
    const { cookie } = await secondVenueStaff(f);
    await addPerson(f.db, 'staff-b@example.test', [
      { studioId: f.studioB, role: 'gallery', venueId: f.venueB },
    ]);
    const staffOfB = await signIn(f.app, 'staff-b@example.test');
    const notFound = (what: string) => ({
      error: { code: 'not_found', message: `${what} was not found.` },
    });
    const probes = [
      [cookie, `/api/venue/consignments/${f.sent.id}`, 'That consignment'],
      [cookie, `/api/venue/lines/${f.lines.moonJar}`, 'That piece'],
      [staffOfB, `/api/venue/consignments/${f.sent.id}`, 'That consignment'],
      [staffOfB, `/api/venue/lines/${f.lines.moonJar}`, 'That piece'],
      [await f.cookie('gallery'), `/api/venue/consignments/${b.consignmentId}`, 'That consignment'],
      [await f.cookie('gallery'), `/api/venue/lines/${b.jug}`, 'That piece'],
    ] as const;
    for (const [who, path, what] of probes) {
      const res = await request(f.app).get(path).set('Cookie', who);
      expect(res.status).toBe(404);
      expect(res.body).toEqual(notFound(what));
    }
    // Their own venue side holds nothing of the other venue's, nor its studio's totals.
    for (const who of [cookie, staffOfB]) {
      const home = await request(f.app).get('/api/venue/consignments').set('Cookie', who);
      const pieces = await request(f.app).get('/api/venue/pieces').set('Cookie', who);
      const seen = JSON.stringify([home.body, pieces.body]);
      expect(seen).not.toMatch(/Moon jar|Tall bottle|Tea bowl|Winter show|Gallery of A"/);
      expect(seen).not.toMatch(costWords);
      expect(seen).not.toMatch(/totals|insuredOut|makerShare/);
    }
  });
});

describe('POST /api/consignment-lines/:lineId/sale across studios', () => {
  it('sells a piece of the studio that is not active, without switching', async () => {
    const f = await salesFixture();
    const { counter, cookie, jug, bowl } = await twoMakers(f);
    const me = await counter.get('/api/me');
    const inA = me.body.memberships.find((m: { studioId: number }) => m.studioId === f.studioA);
    const chosen = await request(f.app)
      .put('/api/me/active-membership')
      .set('Cookie', cookie)
      .send({ membershipId: inA.id });
    expect(chosen.status).toBe(200);

    const res = await counter.post(`/api/consignment-lines/${jug}/sale`, saleOf(f, 10_000));
    expect(res.status).toBe(201);
    // Studio B's default terms: 40% commission, the venue not charging VAT on it
    // (docs/money-rules.md, `none`): £100 → commission £40.00, maker £60.00.
    expect(res.body.split).toMatchObject({
      commission: gbp(4_000),
      vatOnCommission: gbp(0),
      makerShare: gbp(6_000),
    });
    expect(res.body.line.sale).toMatchObject({ enteredBy: 'venue', recordedBy: 'counter' });
    expect(await auditOf(f, jug)).toEqual([
      expect.objectContaining({
        studio_id: f.studioB,
        user_id: await userId(f, 'counter@example.test'),
        action: 'line.sold',
      }),
    ]);
    // Studio B's maker hears of it; studio A's does not.
    expect(await saleMails(f)).toEqual([
      expect.objectContaining({ studio_id: f.studioB, to_address: 'owner-b@example.test' }),
    ]);
    // The active studio is still A, and the piece of B can be undone and resolved the same way.
    expect((await counter.get('/api/me')).body.activeMembershipId).toBe(inA.id);
    expect((await counter.delete(`/api/consignment-lines/${jug}/sale`)).status).toBe(200);
    const back = await counter.post(`/api/consignment-lines/${bowl}/resolve`, {
      state: 'returned',
      on: f.today,
    });
    expect(back.status).toBe(200);
    expect((await lineRow(f, bowl)).state).toBe('returned');
  });

  it('lets the owner of one studio, on the staff of another’s venue, sell there as the venue', async () => {
    const f = await salesFixture();
    const b = await studioBShow(f);
    await addPerson(f.db, 'potter-and-staff@example.test', [
      { studioId: f.studioA, role: 'owner' },
      { studioId: f.studioB, role: 'gallery', venueId: f.venueB },
    ]);
    const person = withCookie(f, await signIn(f.app, 'potter-and-staff@example.test'));
    const me = await person.get('/api/me');
    const owner = me.body.memberships.find((m: { role: string }) => m.role === 'owner');
    await request(f.app)
      .put('/api/me/active-membership')
      .set('Cookie', await signIn(f.app, 'potter-and-staff@example.test'))
      .send({ membershipId: owner.id });

    const res = await person.post(`/api/consignment-lines/${b.bowl}/sale`, saleOf(f, 10_000));
    expect(res.status).toBe(201);
    expect(res.body.line.sale.enteredBy).toBe('venue');
    // The counter list is B's venue only: in A the person is the owner, not a venue's staff.
    const pieces = await person.get('/api/venue/pieces');
    expect(stock(pieces.body.items)).toEqual(['B-8', 'B-7']);
    // And in A, as its owner, a sale is the studio's.
    const own = await person.post(
      `/api/consignment-lines/${f.lines.moonJar}/sale`,
      saleOf(f, 10_000),
    );
    expect(own.status).toBe(201);
    expect(own.body.line.sale.enteredBy).toBe('studio');
  });
});

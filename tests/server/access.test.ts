import request from 'supertest';

import { mountedRoutes } from './helpers/mounted-routes';
import { callable, protectedRoutes, publicRoutes } from './helpers/routes';
import {
  addConsignment,
  addPerson,
  addStudio,
  addVenue,
  createTestApp,
  signIn,
} from './helpers/test-app';

/** Two studios; a gallery member of studio A's venue, and owners of each. */
async function twoStudios() {
  const ctx = await createTestApp();
  const { db } = ctx;
  const studioA = await addStudio(db, 'Studio A');
  const studioB = await addStudio(db, 'Studio B');
  const venueA = await addVenue(db, studioA, 'Gallery of A');
  const venueB = await addVenue(db, studioB, 'Gallery of B');
  await addPerson(db, 'owner-a@example.test', [{ studioId: studioA, role: 'owner' }]);
  await addPerson(db, 'assistant-a@example.test', [{ studioId: studioA, role: 'assistant' }]);
  await addPerson(db, 'owner-b@example.test', [{ studioId: studioB, role: 'owner' }]);
  await addPerson(db, 'gallery-a@example.test', [
    { studioId: studioA, role: 'gallery', venueId: venueA },
  ]);
  const consignmentA = await addConsignment(db, studioA, venueA, 'A-1');
  const draftA = await addConsignment(db, studioA, venueA, 'A-DRAFT', 'draft');
  const consignmentB = await addConsignment(db, studioB, venueB, 'B-1');
  return { ...ctx, studioA, studioB, venueA, venueB, consignmentA, draftA, consignmentB };
}

const call = (app: Parameters<typeof request>[0], entry: (typeof protectedRoutes)[number]) => {
  const { method, path } = callable(entry.route);
  return request(app)
    [method](path)
    .send(method === 'get' ? undefined : {});
};

describe('the table of routes the access tests check', () => {
  it('lists every route Express has mounted, and nothing it has not', async () => {
    const { app } = await createTestApp();
    const listed = [...publicRoutes, ...protectedRoutes.map((r) => r.route)].sort();
    expect(mountedRoutes(app)).toEqual(listed);
  });
});

describe('every protected /api route', () => {
  it.each(protectedRoutes)('$route answers 401 without a session', async (route) => {
    const { app } = await createTestApp();
    const res = await call(app, route);
    expect(res.status).toBe(401);
    expect(res.body).toEqual({
      error: { code: 'unauthenticated', message: 'Sign in to continue.' },
    });
  });

  it.each(protectedRoutes.filter((r) => !r.roles.includes('gallery')))(
    '$route answers 403 to the gallery role',
    async (route) => {
      const { app } = await twoStudios();
      const cookie = await signIn(app, 'gallery-a@example.test');
      const res = await call(app, route).set('Cookie', cookie);
      expect(res.status).toBe(403);
      expect(res.body).toEqual({
        error: { code: 'forbidden', message: 'Your role in this studio does not allow this.' },
      });
    },
  );

  it.each(protectedRoutes.filter((r) => !r.roles.includes('owner')))(
    '$route answers 403 to the studio roles',
    async (route) => {
      const { app } = await twoStudios();
      for (const email of ['owner-a@example.test', 'assistant-a@example.test']) {
        const res = await call(app, route).set('Cookie', await signIn(app, email));
        expect(res.status).toBe(403);
      }
    },
  );
});

describe('GET /api/me', () => {
  it('returns the user, the memberships and the active one', async () => {
    const { app, studioA, venueA } = await twoStudios();
    const res = await request(app)
      .get('/api/me')
      .set('Cookie', await signIn(app, 'gallery-a@example.test'));
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      user: { id: expect.any(String), name: 'gallery-a', email: 'gallery-a@example.test' },
      memberships: [
        {
          id: expect.any(Number),
          studioId: studioA,
          studioName: 'Studio A',
          role: 'gallery',
          venueId: venueA,
          venueName: 'Gallery of A',
        },
      ],
      activeMembershipId: res.body.memberships[0].id,
    });
  });
});

describe('GET /api/venue/consignments', () => {
  it("shows the gallery member only its venue's agreed consignments from that studio", async () => {
    const { app, studioA, venueA, consignmentA } = await twoStudios();
    const res = await request(app)
      .get('/api/venue/consignments')
      .set('Cookie', await signIn(app, 'gallery-a@example.test'));
    expect(res.status).toBe(200);
    const studio = { id: studioA, name: 'Studio A' };
    expect(res.body.places).toEqual([{ studio, venue: { id: venueA, name: 'Gallery of A' } }]);
    // Not the studio's draft, nor studio B's consignment to its own venue.
    expect(res.body.consignments).toEqual([
      expect.objectContaining({ id: consignmentA, venueId: venueA, studio }),
    ]);
  });
});

describe('a gallery member of one studio', () => {
  it('cannot switch into a membership of another studio', async () => {
    const { app, db } = await twoStudios();
    const other = await db
      .selectFrom('memberships')
      .innerJoin('users', 'users.id', 'memberships.user_id')
      .select('memberships.id')
      .where('users.email', '=', 'owner-b@example.test')
      .executeTakeFirstOrThrow();
    const res = await request(app)
      .put('/api/me/active-membership')
      .set('Cookie', await signIn(app, 'gallery-a@example.test'))
      .send({ membershipId: other.id });
    expect(res.status).toBe(404);
    expect(res.body).toEqual({
      error: { code: 'not_found', message: 'That membership was not found.' },
    });
  });

  it("gets 404 for another studio's photos, even of works on that studio's consignments", async () => {
    const { app, db, studioB, consignmentB } = await twoStudios();
    const work = await db
      .insertInto('works')
      .values({
        studio_id: studioB,
        stock_number: 'B-W1',
        title: 'B work',
        retail_price: 1,
        currency: 'GBP',
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    const file = await db
      .insertInto('files')
      .values({ studio_id: studioB, sha256: 'b'.repeat(64), mime_type: 'image/png', byte_size: 1 })
      .returning('id')
      .executeTakeFirstOrThrow();
    const photo = await db
      .insertInto('work_photos')
      .values({ work_id: work.id, file_id: file.id, position: 0 })
      .returning('id')
      .executeTakeFirstOrThrow();
    await db
      .insertInto('consignment_lines')
      .values({
        studio_id: studioB,
        consignment_id: consignmentB,
        work_id: work.id,
        currency: 'GBP',
        list_price: 1,
        insurance_value: 1,
      })
      .execute();
    const cookie = await signIn(app, 'gallery-a@example.test');
    for (const path of [`/api/photos/${photo.id}`, `/api/photos/${photo.id}/thumbnail`]) {
      const res = await request(app).get(path).set('Cookie', cookie);
      expect(res.status).toBe(404);
      expect(res.body).toEqual({
        error: { code: 'not_found', message: 'That photo was not found.' },
      });
    }
  });

  it('reads nothing of another studio anywhere it may go', async () => {
    const { app } = await twoStudios();
    const cookie = await signIn(app, 'gallery-a@example.test');
    for (const { route } of protectedRoutes.filter((r) => r.route.startsWith('GET '))) {
      const res = await request(app).get(callable(route).path).set('Cookie', cookie);
      expect(JSON.stringify(res.body)).not.toMatch(/Studio B|Gallery of B|B-1/);
    }
  });
});

describe('PUT /api/me/active-membership', () => {
  it('leaves a person with several memberships to choose, then scopes to the choice', async () => {
    const { app, db, studioA, studioB, venueB, consignmentB } = await twoStudios();
    await addPerson(db, 'both@example.test', [
      { studioId: studioA, role: 'assistant' },
      { studioId: studioB, role: 'gallery', venueId: venueB },
    ]);
    const cookie = await signIn(app, 'both@example.test');

    const before = await request(app).get('/api/me').set('Cookie', cookie);
    expect(before.body.activeMembershipId).toBeNull();
    const refused = await request(app).get('/api/overview').set('Cookie', cookie);
    expect(refused.status).toBe(403);
    expect(refused.body.error.message).toBe('Choose which studio to work in first.');

    const [inA, inB] = before.body.memberships as { id: number; studioId: number }[];
    const chosen = await request(app)
      .put('/api/me/active-membership')
      .set('Cookie', cookie)
      .send({ membershipId: inA!.studioId === studioA ? inA!.id : inB!.id });
    expect(chosen.status).toBe(200);
    const overview = await request(app).get('/api/overview').set('Cookie', cookie);
    expect(overview.status).toBe(200);
    expect(overview.body.studio.name).toBe('Studio A');
    // The venue side is the person's venue in B whichever studio is active (a scanned label
    // opens its piece without switching); it never shows A, where the person is no venue's staff.
    const venueSide = await request(app).get('/api/venue/consignments').set('Cookie', cookie);
    expect(venueSide.status).toBe(200);
    expect(venueSide.body.places).toEqual([
      { studio: { id: studioB, name: 'Studio B' }, venue: { id: venueB, name: 'Gallery of B' } },
    ]);
    expect(venueSide.body.consignments.map((c: { id: number }) => c.id)).toEqual([consignmentB]);

    await request(app)
      .put('/api/me/active-membership')
      .set('Cookie', cookie)
      .send({ membershipId: inA!.studioId === studioB ? inA!.id : inB!.id });
    const gallerySide = await request(app).get('/api/venue/consignments').set('Cookie', cookie);
    expect(gallerySide.status).toBe(200);
    expect(gallerySide.body).toEqual(venueSide.body);
    expect((await request(app).get('/api/overview').set('Cookie', cookie)).status).toBe(403);
  });
});

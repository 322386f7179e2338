import { checkVAT, countries } from 'jsvat';
import { isValid as isUkPostcode } from 'postcode';
import request from 'supertest';

import { defaultTerms } from '@/shared/schemas/terms';
import { venueDetailSchema, venueSchema } from '@/shared/schemas/venue';

import { addConsignment, type Fixture, studioFixture } from '../helpers/studio-fixture';
import { addPerson } from '../helpers/test-app';

const as = async (f: Fixture, who: Parameters<Fixture['cookie']>[0] = 'owner') => ({
  Cookie: await f.cookie(who),
});

// A GB number that passes the mod-97 check and one that fails it, as jsvat (the reference
// general-purpose reference library) judges them; a postcode as the `postcode` package does.
const goodVat = 'GB980780684';
const badVat = 'GB123456789';
const goodPostcode = 'ip15 5ab';

const harbour = {
  name: 'Harbour Shop',
  kind: 'shop',
  addressLine1: '1 Quay Street',
  town: 'Aldeburgh',
  postcode: goodPostcode,
  country: 'GB',
  email: 'shop@example.test',
  vatNumber: 'gb 980 7806 84',
};

describe('POST /api/venues', () => {
  it('adds a venue with the product’s default terms when the studio has none', async () => {
    expect([checkVAT(goodVat, countries).isValid, checkVAT(badVat, countries).isValid]).toEqual([
      true,
      false,
    ]);
    expect(isUkPostcode(goodPostcode)).toBe(true);
    const f = await studioFixture();
    const res = await request(f.app)
      .post('/api/venues')
      .set(await as(f, 'assistant'))
      .send(harbour);
    expect(res.status).toBe(201);
    expect(venueSchema.parse(res.body)).toEqual(res.body);
    expect(res.body).toMatchObject({
      name: 'Harbour Shop',
      postcode: 'IP15 5AB',
      vatNumber: goodVat,
      addressLine2: null,
      archivedAt: null,
      // Product defaults (common practice): maker-net insurance, agent, shared discount.
      defaultTerms: { ...defaultTerms, currency: 'GBP' },
    });
  });

  it('starts from the studio’s own default terms, in its currency, when it has them', async () => {
    const f = await studioFixture();
    const studioTerms = { ...defaultTerms, currency: 'EUR', commissionRateBp: 5000 };
    await f.db
      .updateTable('studios')
      .set({ default_terms: JSON.stringify(studioTerms) })
      .where('id', '=', f.studioA)
      .execute();
    const res = await request(f.app)
      .post('/api/venues')
      .set(await as(f))
      .send({ name: 'Fair', kind: 'fair' });
    expect(res.status).toBe(201);
    expect(res.body.defaultTerms).toEqual(studioTerms);
  });

  it('answers 400 with the field issues for bad input', async () => {
    const f = await studioFixture();
    const res = await request(f.app)
      .post('/api/venues')
      .set(await as(f))
      .send({
        name: '',
        kind: 'pub',
        postcode: 'NOT A CODE',
        vatNumber: badVat,
        email: 'nope',
        defaultTerms: { ...defaultTerms, commissionRateBp: 12000 },
      });
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: {
        code: 'invalid_request',
        message: 'Some fields need attention.',
        issues: [
          { path: ['name'], message: 'Enter the venue’s name.' },
          { path: ['kind'], message: 'Choose gallery, shop, fair, exhibition or open studio.' },
          { path: ['email'], message: expect.any(String) },
          {
            path: ['defaultTerms', 'commissionRateBp'],
            message: 'The commission rate cannot be above 100%.',
          },
        ],
      },
    });
    const ids = await request(f.app)
      .post('/api/venues')
      .set(await as(f))
      .send({ name: 'X', kind: 'shop', postcode: 'NOT A CODE', vatNumber: badVat });
    expect(ids.body.error.issues).toEqual([
      { path: ['postcode'], message: 'Enter a UK postcode such as IP15 5AB.' },
      {
        path: ['vatNumber'],
        message: 'That is not a valid VAT number; check the country letters and digits.',
      },
    ]);
  });

  it('answers 403 to the venue’s staff', async () => {
    const f = await studioFixture();
    const res = await request(f.app)
      .post('/api/venues')
      .set(await as(f, 'gallery'))
      .send(harbour);
    expect(res.status).toBe(403);
  });
});

describe('GET /api/venues', () => {
  it('lists the studio’s venues by name, leaving archived ones out unless asked', async () => {
    const f = await studioFixture();
    await request(f.app)
      .post('/api/venues')
      .set(await as(f))
      .send({ ...harbour, name: 'a small shop' });
    await f.db
      .updateTable('venues')
      .set({ archived_at: '2026-01-01T00:00:00Z' })
      .where('name', '=', 'a small shop')
      .execute();
    const res = await request(f.app)
      .get('/api/venues')
      .set(await as(f, 'assistant'));
    expect(res.status).toBe(200);
    expect(res.body.total).toBe(1);
    expect(res.body.items.map((v: { name: string }) => v.name)).toEqual(['Gallery of A']);
    const all = await request(f.app)
      .get('/api/venues?archived=include')
      .set(await as(f));
    expect(all.body.items.map((v: { name: string }) => v.name)).toEqual([
      'a small shop',
      'Gallery of A',
    ]);
  });

  it('answers 400 to a bad query and 403 to the venue’s staff', async () => {
    const f = await studioFixture();
    const bad = await request(f.app)
      .get('/api/venues?archived=maybe')
      .set(await as(f));
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues).toEqual([
      { path: ['archived'], message: 'Choose exclude, include or only.' },
    ]);
    const venue = await request(f.app)
      .get('/api/venues')
      .set(await as(f, 'gallery'));
    expect(venue.status).toBe(403);
  });
});

describe('GET /api/venues/:id', () => {
  it('returns the venue, its consignments and the staff who may sign in for it', async () => {
    const f = await studioFixture();
    const show = await addConsignment(f.db, f.studioA, f.venueA, 'S-1');
    const other = await request(f.app)
      .post('/api/venues')
      .set(await as(f))
      .send(harbour);
    await addConsignment(f.db, f.studioA, other.body.id, 'S-2');
    const res = await request(f.app)
      .get(`/api/venues/${f.venueA}`)
      .set(await as(f));
    expect(res.status).toBe(200);
    expect(venueDetailSchema.parse(res.body)).toEqual(res.body);
    expect(res.body.venue.name).toBe('Gallery of A');
    expect(res.body.consignments.map((c: { id: number }) => c.id)).toEqual([show]);
    expect(res.body.staff).toEqual([
      { userId: expect.any(String), name: 'gallery-a', email: 'gallery-a@example.test' },
    ]);
  });

  it('answers 404 for another studio’s venue and leaves out its staff', async () => {
    const f = await studioFixture();
    await addPerson(f.db, 'staff-b@example.test', [
      { studioId: f.studioB, role: 'gallery', venueId: f.venueB },
    ]);
    const res = await request(f.app)
      .get(`/api/venues/${f.venueB}`)
      .set(await as(f));
    expect(res.status).toBe(404);
    expect(res.body).toEqual({
      error: { code: 'not_found', message: 'That venue was not found.' },
    });
    const venue = await request(f.app)
      .get(`/api/venues/${f.venueA}`)
      .set(await as(f, 'gallery'));
    expect(venue.status).toBe(403);
  });
});

describe('PATCH /api/venues/:id', () => {
  it('changes the fields sent and keeps the rest', async () => {
    const f = await studioFixture();
    const created = await request(f.app)
      .post('/api/venues')
      .set(await as(f))
      .send(harbour);
    const terms = {
      ...defaultTerms,
      commissionRateBp: 3500,
      insuranceBasis: 'agreed',
      agreedInsuranceValue: { amount: 50_000, currency: 'GBP' },
    };
    const res = await request(f.app)
      .patch(`/api/venues/${created.body.id}`)
      .set(await as(f))
      .send({ town: 'Orford', phone: '', defaultTerms: terms });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      name: 'Harbour Shop',
      town: 'Orford',
      phone: null,
      postcode: 'IP15 5AB',
      defaultTerms: terms,
    });
  });

  it('lets an assistant change the details but not the terms, which are the owner’s (docs/domain.md roles)', async () => {
    const f = await studioFixture();
    const created = await request(f.app)
      .post('/api/venues')
      .set(await as(f, 'assistant'))
      .send(harbour);
    expect(created.status).toBe(201);
    const details = await request(f.app)
      .patch(`/api/venues/${created.body.id}`)
      .set(await as(f, 'assistant'))
      .send({ town: 'Orford' });
    expect(details.status).toBe(200);
    const refused = await request(f.app)
      .patch(`/api/venues/${created.body.id}`)
      .set(await as(f, 'assistant'))
      .send({ defaultTerms: { ...defaultTerms, commissionRateBp: 2000 } });
    expect(refused.status).toBe(403);
    expect(refused.body).toEqual({
      error: { code: 'forbidden', message: 'Only the studio’s owner can set a venue’s terms.' },
    });
    const withTerms = await request(f.app)
      .post('/api/venues')
      .set(await as(f, 'assistant'))
      .send({ ...harbour, defaultTerms });
    expect(withTerms.status).toBe(403);
  });

  it('checks a postcode against the venue’s stored country', async () => {
    const f = await studioFixture();
    const created = await request(f.app)
      .post('/api/venues')
      .set(await as(f))
      .send({ name: 'Paris', kind: 'gallery', country: 'FR' });
    // 75001 is a French postcode, not a UK one: fine for a venue in France.
    const res = await request(f.app)
      .patch(`/api/venues/${created.body.id}`)
      .set(await as(f))
      .send({ postcode: '75001' });
    expect(res.status).toBe(200);
    expect(res.body.postcode).toBe('75001');
    const uk = await request(f.app)
      .patch(`/api/venues/${f.venueA}`)
      .set(await as(f))
      .send({ postcode: '75001' });
    expect(uk.status).toBe(400);
    expect(uk.body.error.issues).toEqual([
      { path: ['postcode'], message: 'Enter a UK postcode such as IP15 5AB.' },
    ]);
  });

  it('answers 400 for bad input, 404 for another studio’s venue, 403 to the venue’s staff', async () => {
    const f = await studioFixture();
    const bad = await request(f.app)
      .patch(`/api/venues/${f.venueA}`)
      .set(await as(f))
      .send({ kind: 'pub' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues).toEqual([
      { path: ['kind'], message: 'Choose gallery, shop, fair, exhibition or open studio.' },
    ]);
    const other = await request(f.app)
      .patch(`/api/venues/${f.venueB}`)
      .set(await as(f))
      .send({ name: 'Mine' });
    expect(other.status).toBe(404);
    const row = await f.db
      .selectFrom('venues')
      .select('name')
      .where('id', '=', f.venueB)
      .executeTakeFirstOrThrow();
    expect(row.name).toBe('Gallery of B');
    const venue = await request(f.app)
      .patch(`/api/venues/${f.venueA}`)
      .set(await as(f, 'gallery'))
      .send({ name: 'x' });
    expect(venue.status).toBe(403);
  });
});

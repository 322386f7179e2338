import request from 'supertest';

import { studioSettingsSchema } from '@/shared/schemas/studio';

import { type Fixture, insertWork, studioFixture } from '../helpers/studio-fixture';

const as = async (f: Fixture, who: Parameters<Fixture['cookie']>[0] = 'owner') => ({
  Cookie: await f.cookie(who),
});

describe('GET /api/studio', () => {
  it('returns the settings and the next stock number from the pattern', async () => {
    const f = await studioFixture();
    const year = new Date().getUTCFullYear();
    await insertWork(f.db, f.studioA, `${year}-041`);
    await insertWork(f.db, f.studioA, `${year - 1}-099`);
    const res = await request(f.app)
      .get('/api/studio')
      .set(await as(f, 'assistant'));
    expect(res.status).toBe(200);
    expect(studioSettingsSchema.parse(res.body)).toEqual(res.body);
    expect(res.body).toEqual({
      id: f.studioA,
      name: 'Studio A',
      currency: 'GBP',
      locale: 'en-GB',
      timeZone: 'Europe/London',
      vatNumber: null,
      stockNumberPattern: '{YYYY}-{NNN}',
      priceStep: 500,
      nextStockNumber: `${year}-042`,
    });
  });

  it('answers 403 to the venue’s staff', async () => {
    const f = await studioFixture();
    const res = await request(f.app)
      .get('/api/studio')
      .set(await as(f, 'gallery'));
    expect(res.status).toBe(403);
  });
});

describe('PATCH /api/studio', () => {
  it('lets the owner change the pattern and the price step', async () => {
    const f = await studioFixture();
    const res = await request(f.app)
      .patch('/api/studio')
      .set(await as(f))
      .send({ stockNumberPattern: 'SK/{YY}/{NNNN}', priceStep: 250 });
    expect(res.status).toBe(200);
    const yy = String(new Date().getUTCFullYear() % 100).padStart(2, '0');
    expect(res.body).toMatchObject({
      stockNumberPattern: 'SK/{YY}/{NNNN}',
      priceStep: 250,
      nextStockNumber: `SK/${yy}/0001`,
    });
    // Another studio is untouched.
    const other = await request(f.app)
      .get('/api/studio')
      .set(await as(f, 'otherOwner'));
    expect(other.body.stockNumberPattern).toBe('{YYYY}-{NNN}');
  });

  it('answers 400 with the field issues for bad input', async () => {
    const f = await studioFixture();
    const res = await request(f.app)
      .patch('/api/studio')
      .set(await as(f))
      .send({ stockNumberPattern: '{YYYY}-{X}', priceStep: 0 });
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: {
        code: 'invalid_request',
        message: 'Some fields need attention.',
        issues: [
          {
            path: ['stockNumberPattern'],
            message: 'Include a counter such as {NNN} in the pattern.',
          },
          { path: ['stockNumberPattern'], message: 'Use one counter only.' },
          { path: ['stockNumberPattern'], message: 'Use only {YYYY}, {YY} and {NNN} in braces.' },
          { path: ['priceStep'], message: 'The price step must be at least 1.' },
        ],
      },
    });
  });

  it('answers 403 to the assistant and to the venue’s staff', async () => {
    const f = await studioFixture();
    for (const who of ['assistant', 'gallery'] as const) {
      const res = await request(f.app)
        .patch('/api/studio')
        .set(await as(f, who))
        .send({ priceStep: 100 });
      expect(res.status).toBe(403);
      expect(res.body).toEqual({
        error: { code: 'forbidden', message: 'Your role in this studio does not allow this.' },
      });
    }
    const row = await f.db
      .selectFrom('studios')
      .select('price_step')
      .where('id', '=', f.studioA)
      .executeTakeFirstOrThrow();
    expect(row.price_step).toBe(500);
  });
});

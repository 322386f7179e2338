import request from 'supertest';

import { workListSchema } from '@/shared/schemas/work';

import {
  addConsignment,
  type Fixture,
  insertLine,
  insertWork,
  studioFixture,
} from '../helpers/studio-fixture';
import { addVenue } from '../helpers/test-app';

/** Five works of studio A in every state, and one of studio B. */
async function catalogue() {
  const f = await studioFixture();
  const { db, studioA, studioB, venueA, venueB } = f;
  const venueA2 = await addVenue(db, studioA, 'Harbour Shop');
  const show = await addConsignment(db, studioA, venueA, 'A-1');
  const shop = await addConsignment(db, studioA, venueA2, 'A-2');
  const ids = {
    bowl: await insertWork(db, studioA, '2026-001', {
      title: 'Tall bowl',
      year: 2026,
      series: 'Saltmarsh',
      category: 'Bowl',
      glaze: 'Celadon',
      retail_price: 12_000,
    }),
    jug: await insertWork(db, studioA, '2026-002', {
      title: 'Jug 50%_off',
      year: 2024,
      series: 'Saltmarsh',
      category: 'Jug',
      clay_body: 'Porcelain',
      retail_price: 8_000,
    }),
    vase: await insertWork(db, studioA, '2026-003', {
      title: 'vase',
      year: null,
      series: 'Estuary',
      category: 'Vase',
      retail_price: 30_000,
    }),
    plate: await insertWork(db, studioA, '2026-004', { title: 'Plate', year: 2025 }),
    archived: await insertWork(db, studioA, '2026-005', {
      title: 'Old plate',
      archived_at: '2026-01-01T00:00:00.000Z',
    }),
  };
  await insertLine(db, studioA, show, ids.bowl, 'consigned');
  await insertLine(db, studioA, show, ids.jug, 'sold');
  await insertLine(db, studioA, show, ids.vase, 'returned');
  await insertLine(db, studioA, shop, ids.vase, 'consigned');
  const otherShow = await addConsignment(db, studioB, venueB, 'B-1');
  const other = await insertWork(db, studioB, '2026-001', { title: 'Tall bowl of B' });
  await insertLine(db, studioB, otherShow, other, 'consigned');
  return { ...f, ids, venueA2 };
}

async function list(f: Fixture, query: string) {
  const res = await request(f.app)
    .get(`/api/works${query}`)
    .set('Cookie', await f.cookie('owner'));
  return res;
}

const stockNumbers = (body: { items: { stockNumber: string }[] }) =>
  body.items.map((w) => w.stockNumber);

describe('GET /api/works', () => {
  it('pages the studio’s current works by stock number, with status, place and photos', async () => {
    const f = await catalogue();
    const res = await list(f, '');
    expect(res.status).toBe(200);
    expect(workListSchema.parse(res.body)).toEqual(res.body);
    expect(res.body.total).toBe(4);
    expect(stockNumbers(res.body)).toEqual(['2026-001', '2026-002', '2026-003', '2026-004']);
    expect(res.body.items.map((w: { status: string }) => w.status)).toEqual([
      'on-consignment',
      'sold',
      'on-consignment',
      'in-studio',
    ]);
    expect(res.body.items[0]).toMatchObject({
      title: 'Tall bowl',
      retailPrice: { amount: 12_000, currency: 'GBP' },
      venue: { id: f.venueA, name: 'Gallery of A' },
      photos: [],
    });
    // The vase came back from the first show and is out again at the shop.
    expect(res.body.items[2].venue).toEqual({ id: f.venueA2, name: 'Harbour Shop' });
    expect(res.body.items[1].venue).toBeNull();
  });

  it('filters by status, series, category and the venue a work is at', async () => {
    const f = await catalogue();
    expect(stockNumbers((await list(f, '?status=on-consignment')).body)).toEqual([
      '2026-001',
      '2026-003',
    ]);
    expect(stockNumbers((await list(f, '?status=in-studio')).body)).toEqual(['2026-004']);
    expect(stockNumbers((await list(f, '?series=Saltmarsh')).body)).toEqual([
      '2026-001',
      '2026-002',
    ]);
    expect(stockNumbers((await list(f, '?category=Vase')).body)).toEqual(['2026-003']);
    // At the first gallery only the bowl is still out; the vase is now at the shop.
    expect(stockNumbers((await list(f, `?venueId=${f.venueA}`)).body)).toEqual(['2026-001']);
    expect(stockNumbers((await list(f, `?venueId=${f.venueA2}`)).body)).toEqual(['2026-003']);
    expect((await list(f, '?archived=only')).body.total).toBe(1);
    expect((await list(f, '?archived=include')).body.total).toBe(5);
  });

  it('searches every word over stock number, title, series, category, clay and glaze', async () => {
    const f = await catalogue();
    expect(stockNumbers((await list(f, '?search=celadon')).body)).toEqual(['2026-001']);
    expect(stockNumbers((await list(f, '?search=PORCELAIN')).body)).toEqual(['2026-002']);
    expect(stockNumbers((await list(f, '?search=saltmarsh%20jug')).body)).toEqual(['2026-002']);
    expect(stockNumbers((await list(f, '?search=2026-00')).body)).toHaveLength(4);
    // % and _ are letters to search for, not wildcards.
    expect(stockNumbers((await list(f, '?search=50%25_')).body)).toEqual(['2026-002']);
    expect(stockNumbers((await list(f, '?search=%25')).body)).toEqual(['2026-002']);
    expect((await list(f, '?search=nothing-like-this')).body).toEqual({ items: [], total: 0 });
  });

  it('sorts by title, year, price and status either way, and pages without overlap', async () => {
    const f = await catalogue();
    expect(stockNumbers((await list(f, '?sort=title')).body)).toEqual([
      '2026-002',
      '2026-004',
      '2026-001',
      '2026-003',
    ]);
    // Works without a year come last either way.
    expect(stockNumbers((await list(f, '?sort=year')).body)).toEqual([
      '2026-002',
      '2026-004',
      '2026-001',
      '2026-003',
    ]);
    expect(stockNumbers((await list(f, '?sort=-year')).body)).toEqual([
      '2026-001',
      '2026-004',
      '2026-002',
      '2026-003',
    ]);
    expect(stockNumbers((await list(f, '?sort=-price')).body)).toEqual([
      '2026-003',
      '2026-001',
      '2026-004',
      '2026-002',
    ]);
    expect(stockNumbers((await list(f, '?sort=status')).body)).toEqual([
      '2026-004',
      '2026-001',
      '2026-003',
      '2026-002',
    ]);
    expect(stockNumbers((await list(f, '?sort=-stockNumber')).body)[0]).toBe('2026-004');
    const first = await list(f, '?pageSize=3&page=1');
    const second = await list(f, '?pageSize=3&page=2');
    expect([...stockNumbers(first.body), ...stockNumbers(second.body)]).toEqual([
      '2026-001',
      '2026-002',
      '2026-003',
      '2026-004',
    ]);
    expect(second.body.total).toBe(4);
  });

  it('answers 400 with the field issues for a bad query', async () => {
    const f = await catalogue();
    const res = await list(f, '?sort=colour&page=0&pageSize=500&status=lent&extra=1');
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: {
        code: 'invalid_request',
        message: 'Some fields need attention.',
        issues: [
          { path: ['status'], message: expect.any(String) },
          { path: ['sort'], message: 'Choose a sort the list offers.' },
          { path: ['page'], message: 'Pages start at 1.' },
          { path: ['pageSize'], message: 'Ask for at most 100 works a page.' },
          { path: [], message: expect.stringContaining('extra') },
        ],
      },
    });
  });

  it('answers 403 to the venue’s staff', async () => {
    const f = await catalogue();
    const res = await request(f.app)
      .get('/api/works')
      .set('Cookie', await f.cookie('gallery'));
    expect(res.status).toBe(403);
    expect(res.body).toEqual({
      error: { code: 'forbidden', message: 'Your role in this studio does not allow this.' },
    });
  });

  it('shows another studio only its own works, and nothing for this studio’s venue', async () => {
    const f = await catalogue();
    const res = await request(f.app)
      .get(`/api/works?venueId=${f.venueA}`)
      .set('Cookie', await f.cookie('otherOwner'));
    expect(res.body).toEqual({ items: [], total: 0 });
    const all = await request(f.app)
      .get('/api/works')
      .set('Cookie', await f.cookie('otherOwner'));
    expect(stockNumbers(all.body)).toEqual(['2026-001']);
    expect(all.body.items[0].title).toBe('Tall bowl of B');
  });
});

describe('GET /api/works/facets', () => {
  it('offers the series, categories and venues of the studio', async () => {
    const f = await catalogue();
    const res = await request(f.app)
      .get('/api/works/facets')
      .set('Cookie', await f.cookie('assistant'));
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      series: ['Estuary', 'Saltmarsh'],
      categories: ['Bowl', 'Jug', 'Vase'],
      venues: [
        { id: f.venueA, name: 'Gallery of A' },
        { id: f.venueA2, name: 'Harbour Shop' },
      ],
    });
  });

  it('answers 400 to a query it does not take', async () => {
    const f = await catalogue();
    const res = await request(f.app)
      .get('/api/works/facets?series=x')
      .set('Cookie', await f.cookie('owner'));
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_request');
  });

  it('answers 403 to the venue’s staff', async () => {
    const f = await catalogue();
    const res = await request(f.app)
      .get('/api/works/facets')
      .set('Cookie', await f.cookie('gallery'));
    expect(res.status).toBe(403);
  });
});

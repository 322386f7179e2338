import Papa from 'papaparse';
import request from 'supertest';

import {
  addConsignment,
  type Fixture,
  insertLine,
  insertWork,
  studioFixture,
} from '../helpers/studio-fixture';

const as = async (f: Fixture, who: Parameters<Fixture['cookie']>[0] = 'owner') => ({
  Cookie: await f.cookie(who),
});

/** Read back with papaparse, the reference CSV reader; it drops the byte-order mark itself. */
const parse = (text: string) =>
  Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true });

describe('GET /api/works/export.csv', () => {
  it('writes the catalogue as CSV that parses back to the same works', async () => {
    const f = await studioFixture();
    const tricky = {
      title: 'Jug, "large", with\nsecond line',
      series: '=HYPERLINK("x")',
      glaze: 'Shino — wood-fired',
      // A formula with a line break in it must be escaped too (papaparse's default misses it).
      notes: '=HYPERLINK("http://example.invalid","click")\nsecond line',
      retail_price: 12_050,
      cost_price: 3_005,
      weight_g: 17_500,
      food_use: 'food-safe' as const,
    };
    await insertWork(f.db, f.studioA, 'A-1', tricky);
    const out = await insertWork(f.db, f.studioA, 'A-2', { title: 'Bowl' });
    await insertLine(f.db, f.studioA, await addConsignment(f.db, f.studioA, f.venueA, 'S'), out);
    await insertWork(f.db, f.studioB, 'B-1', { title: 'Not ours' });

    const res = await request(f.app)
      .get('/api/works/export.csv')
      .set(await as(f, 'assistant'));
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toMatch(
      /^attachment; filename="?works-\d{4}-\d{2}-\d{2}\.csv"?$/,
    );
    const { data, errors, meta } = parse(res.text);
    expect(errors).toEqual([]);
    expect(meta.fields).toEqual([
      'Stock number',
      'Title',
      'Year',
      'Series',
      'Category',
      'Clay body',
      'Glaze',
      'Firing temperature (°C)',
      'Atmosphere',
      'Kiln',
      'Height (mm)',
      'Width (mm)',
      'Depth (mm)',
      'Weight (g)',
      'Retail price',
      'Cost price',
      'Food use',
      'Care notes',
      'Notes',
      'Currency',
      'Status',
      'Venue',
      'Archived at',
    ]);
    expect(data).toHaveLength(2);
    expect(data[0]).toMatchObject({
      'Stock number': 'A-1',
      Title: tricky.title,
      // Formula-like cells carry an apostrophe so a spreadsheet does not run them.
      Series: `'${tricky.series}`,
      Notes: `'${tricky.notes}`,
      Glaze: tricky.glaze,
      'Retail price': '120.50',
      'Cost price': '30.05',
      'Weight (g)': '17500',
      'Food use': 'food-safe',
      Currency: 'GBP',
      Status: 'in-studio',
      Venue: '',
    });
    expect(data[1]).toMatchObject({
      'Stock number': 'A-2',
      Status: 'on-consignment',
      Venue: 'Gallery of A',
    });
  });

  it('imports back into another studio as the same works', async () => {
    const f = await studioFixture();
    await insertWork(f.db, f.studioA, 'A-1', {
      title: 'Jug, "large"',
      series: '-dash',
      height_mm: 240,
      retail_price: 12_050,
    });
    const csv = (
      await request(f.app)
        .get('/api/works/export.csv')
        .set(await as(f))
    ).text;
    const res = await request(f.app)
      .post('/api/works/import')
      .set(await as(f, 'otherOwner'))
      .send({ mode: 'commit', csv });
    expect(res.body).toEqual({
      mode: 'commit',
      imported: 1,
      skippedCount: 0,
      skipped: [],
      problems: [],
      duplicates: [],
      skippedCsv: null,
    });
    const back = await request(f.app)
      .get('/api/works')
      .set(await as(f, 'otherOwner'));
    expect(back.body.items[0]).toMatchObject({
      stockNumber: 'A-1',
      title: 'Jug, "large"',
      series: '-dash',
      heightMm: 240,
      retailPrice: { amount: 12_050, currency: 'GBP' },
    });
  });

  it('answers 400 to a bad query and 403 to the venue', async () => {
    const f = await studioFixture();
    const bad = await request(f.app)
      .get('/api/works/export.csv?sort=colour')
      .set(await as(f));
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues).toEqual([
      { path: ['sort'], message: 'Choose a sort the list offers.' },
    ]);
    const venue = await request(f.app)
      .get('/api/works/export.csv')
      .set(await as(f, 'gallery'));
    expect(venue.status).toBe(403);
  });
});

import Papa from 'papaparse';
import request from 'supertest';

import {
  addConsignment,
  type Fixture,
  insertLine,
  insertWork,
  studioFixture,
} from '../helpers/studio-fixture';
import { addTestTrigger } from '../helpers/test-triggers';

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

const sheet = [
  'Stock number,Title,Price,Year,Food use,Weight',
  'P-1,Tea bowl,45.00,2025,food safe,300',
  'P-2,,12.5,2025,,',
  'P-3,Vase,twelve,1800,,',
  'P-4,Jug,20,2026,maybe,1.5',
  'P-1,Second tea bowl,45,2025,,',
  'OLD-1,Clash,30,,,',
  ',Unnumbered dish,8,,,',
  '',
].join('\n');

describe('POST /api/works/import', () => {
  async function withExisting() {
    const f = await studioFixture();
    await insertWork(f.db, f.studioA, 'OLD-1');
    return f;
  }

  it('previews every row with its errors and writes nothing', async () => {
    const f = await withExisting();
    const res = await request(f.app)
      .post('/api/works/import')
      .set(await as(f, 'assistant'))
      .send({ mode: 'preview', csv: sheet });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      mode: 'preview',
      rowCount: 7,
      columns: ['Stock number', 'Title', 'Price', 'Year', 'Food use', 'Weight'],
      mapping: {
        stockNumber: 'Stock number',
        title: 'Title',
        year: 'Year',
        weightG: 'Weight',
        retailPrice: 'Price',
        foodUse: 'Food use',
      },
      rows: [
        {
          rowNumber: 2,
          stockNumber: 'P-1',
          title: 'Tea bowl',
          errors: [
            { field: 'stockNumber', message: 'The stock number P-1 is also on row 6 of the file.' },
          ],
        },
        {
          rowNumber: 3,
          stockNumber: 'P-2',
          title: null,
          errors: [{ field: 'title', message: 'Enter a title.' }],
        },
        {
          rowNumber: 4,
          stockNumber: 'P-3',
          title: 'Vase',
          errors: [
            {
              field: 'retailPrice',
              message: 'Enter the price in GBP as a number such as 12.50, not “twelve”.',
            },
            { field: 'year', message: 'The year must be at least 1900.' },
          ],
        },
        {
          rowNumber: 5,
          stockNumber: 'P-4',
          title: 'Jug',
          errors: [
            { field: 'weightG', message: 'Enter the weight as a whole number of grams.' },
            { field: 'foodUse', message: 'Choose food-safe, decorative only, or not stated.' },
          ],
        },
        {
          rowNumber: 6,
          stockNumber: 'P-1',
          title: 'Second tea bowl',
          errors: [
            { field: 'stockNumber', message: 'The stock number P-1 is also on row 2 of the file.' },
          ],
        },
        {
          rowNumber: 7,
          stockNumber: 'OLD-1',
          title: 'Clash',
          errors: [
            {
              field: 'stockNumber',
              message: 'The stock number OLD-1 is already used by a work in the catalogue.',
            },
          ],
        },
        { rowNumber: 8, stockNumber: null, title: 'Unnumbered dish', errors: [] },
      ],
      validCount: 1,
      errorCount: 6,
      problems: [
        {
          field: 'stockNumber',
          message: 'The stock number P-1 is also on row 6 of the file.',
          rowNumbers: [2],
        },
        { field: 'title', message: 'Enter a title.', rowNumbers: [3] },
        {
          field: 'retailPrice',
          message: 'Enter the price in GBP as a number such as 12.50, not “twelve”.',
          rowNumbers: [4],
        },
        { field: 'year', message: 'The year must be at least 1900.', rowNumbers: [4] },
        {
          field: 'weightG',
          message: 'Enter the weight as a whole number of grams.',
          rowNumbers: [5],
        },
        {
          field: 'foodUse',
          message: 'Choose food-safe, decorative only, or not stated.',
          rowNumbers: [5],
        },
        {
          field: 'stockNumber',
          message: 'The stock number P-1 is also on row 2 of the file.',
          rowNumbers: [6],
        },
        {
          field: 'stockNumber',
          message: 'The stock number OLD-1 is already used by a work in the catalogue.',
          rowNumbers: [7],
        },
      ],
    });
    expect(await f.db.selectFrom('works').select('stock_number').execute()).toEqual([
      { stock_number: 'OLD-1' },
    ]);
  });

  it('commits only the valid rows, in one transaction, numbering those without a stock number', async () => {
    const f = await withExisting();
    const csv =
      'Ref,Name,Retail price (GBP),Clay\nN-1,Dish,8.00,Stoneware\n,Cup,£12,Porcelain\nN-2,,5,\n';
    const res = await request(f.app)
      .post('/api/works/import')
      .set(await as(f))
      .send({
        mode: 'commit',
        csv,
        mapping: {
          stockNumber: 'Ref',
          title: 'Name',
          retailPrice: 'Retail price (GBP)',
          clayBody: 'Clay',
        },
      });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      mode: 'commit',
      imported: 2,
      skippedCount: 1,
      skipped: [
        {
          rowNumber: 4,
          stockNumber: 'N-2',
          title: null,
          errors: [{ field: 'title', message: 'Enter a title.' }],
        },
      ],
      problems: [{ field: 'title', message: 'Enter a title.', rowNumbers: [4] }],
    });
    const year = new Date().getUTCFullYear();
    const rows = await f.db
      .selectFrom('works')
      .select(['stock_number', 'title', 'retail_price', 'currency', 'clay_body'])
      .where('studio_id', '=', f.studioA)
      .orderBy('id')
      .execute();
    expect(rows).toEqual([
      {
        stock_number: 'OLD-1',
        title: 'Work OLD-1',
        retail_price: 10_000,
        currency: 'GBP',
        clay_body: null,
      },
      {
        stock_number: 'N-1',
        title: 'Dish',
        retail_price: 800,
        currency: 'GBP',
        clay_body: 'Stoneware',
      },
      {
        stock_number: `${year}-001`,
        title: 'Cup',
        retail_price: 1_200,
        currency: 'GBP',
        clay_body: 'Porcelain',
      },
    ]);
  });

  it('writes nothing at all when an insert fails part way', async () => {
    const f = await withExisting();
    // A trigger makes the second insert fail, as a full disk or a constraint would.
    await addTestTrigger(f.db, {
      name: 'refuse_second',
      table: 'works',
      event: 'insert',
      when: "new.title = 'Second'",
      then: { refuse: 'refused' },
    });
    const res = await request(f.app)
      .post('/api/works/import')
      .set(await as(f))
      .send({ mode: 'commit', csv: 'Title,Price\nFirst,1\nSecond,2\n' });
    expect(res.status).toBe(500);
    expect(await f.db.selectFrom('works').select('stock_number').execute()).toEqual([
      { stock_number: 'OLD-1' },
    ]);
  });

  it('answers 400 for a bad request, a mapping to a missing column, and 403 to the venue', async () => {
    const f = await studioFixture();
    const bad = await request(f.app)
      .post('/api/works/import')
      .set(await as(f))
      .send({ mode: 'save', csv: '', mapping: { colour: 'A' } });
    expect(bad.status).toBe(400);
    expect(bad.body).toEqual({
      error: {
        code: 'invalid_request',
        message: 'Some fields need attention.',
        issues: [
          { path: ['mode'], message: 'Say whether to preview or commit.' },
          { path: ['csv'], message: 'The file is empty.' },
          { path: ['mapping'], message: expect.any(String) },
        ],
      },
    });
    const missing = await request(f.app)
      .post('/api/works/import')
      .set(await as(f))
      .send({ mode: 'preview', csv: 'Title\nBowl\n', mapping: { title: 'Name' } });
    expect(missing.status).toBe(400);
    expect(missing.body.error.issues).toEqual([
      { path: ['mapping', 'title'], message: 'There is no column called “Name” in the file.' },
    ]);
    const venue = await request(f.app)
      .post('/api/works/import')
      .set(await as(f, 'gallery'))
      .send({ mode: 'preview', csv: sheet });
    expect(venue.status).toBe(403);
  });

  it('takes a file over the global 100 kB body limit, up to its own', async () => {
    const f = await studioFixture();
    const rows = Array.from(
      { length: 3000 },
      (_, i) => `L-${i},Large import piece number ${i},${i}.00`,
    );
    const csv = ['Stock number,Title,Retail price', ...rows].join('\n');
    expect(csv.length).toBeGreaterThan(100_000);
    const res = await request(f.app)
      .post('/api/works/import')
      .set(await as(f))
      .send({ mode: 'commit', csv });
    expect(res.status).toBe(200);
    expect(res.body.imported).toBe(3000);
  });
});

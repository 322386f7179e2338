import Papa from 'papaparse';
import request from 'supertest';

import { importColumnLabels, importColumns } from '@/shared/schemas/work-import';

import { type Fixture, insertWork, studioFixture } from '../helpers/studio-fixture';
import { addTestTrigger } from '../helpers/test-triggers';

const as = async (f: Fixture, who: Parameters<Fixture['cookie']>[0] = 'owner') => ({
  Cookie: await f.cookie(who),
});

/** Read back with papaparse, the reference CSV reader; it drops the byte-order mark itself. */
const parse = (text: string) => Papa.parse<string[]>(text, { skipEmptyLines: true });

const importCsv = async (
  f: Fixture,
  body: { mode: 'preview' | 'commit'; csv: string; importDuplicates?: boolean },
) =>
  request(f.app)
    .post('/api/works/import')
    .set(await as(f))
    .send(body);

const gbp = (amount: number) => ({ amount, currency: 'GBP' });
const nothingRead = {
  retailPrice: null,
  costPrice: null,
  heightMm: null,
  widthMm: null,
  depthMm: null,
  weightG: null,
};

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

const stockInCatalogue =
  'The stock number OLD-1 is already used by a work in the catalogue; stock numbers are unique, so this row cannot be imported.';
const stockInFile =
  'The stock number P-1 is also on row 2, which is imported; stock numbers are unique, so this row cannot be.';

describe('POST /api/works/import', () => {
  async function withExisting() {
    const f = await studioFixture();
    await insertWork(f.db, f.studioA, 'OLD-1');
    return f;
  }

  it('previews every row with what it reads as, its problems and duplicates, and writes nothing', async () => {
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
          read: { ...nothingRead, retailPrice: gbp(4500), weightG: 300 },
          errors: [],
          duplicate: null,
        },
        {
          rowNumber: 3,
          stockNumber: 'P-2',
          title: null,
          read: { ...nothingRead, retailPrice: gbp(1250) },
          errors: [{ field: 'title', message: 'Enter a title.' }],
          duplicate: null,
        },
        {
          rowNumber: 4,
          stockNumber: 'P-3',
          title: 'Vase',
          read: nothingRead,
          errors: [
            {
              field: 'retailPrice',
              message: 'Enter the price in GBP as a number such as 12.50, not “twelve”.',
            },
            { field: 'year', message: 'The year must be at least 1900.' },
          ],
          duplicate: null,
        },
        {
          rowNumber: 5,
          stockNumber: 'P-4',
          title: 'Jug',
          read: { ...nothingRead, retailPrice: gbp(2000) },
          errors: [
            {
              field: 'weightG',
              message: 'Enter the weight to the nearest gram, such as 850 g or 1.25 kg.',
            },
            { field: 'foodUse', message: 'Choose food-safe, decorative only, or not stated.' },
          ],
          duplicate: null,
        },
        {
          rowNumber: 6,
          stockNumber: 'P-1',
          title: 'Second tea bowl',
          read: { ...nothingRead, retailPrice: gbp(4500) },
          errors: [],
          duplicate: { kind: 'stock-number-in-file', message: stockInFile },
        },
        {
          rowNumber: 7,
          stockNumber: 'OLD-1',
          title: 'Clash',
          read: { ...nothingRead, retailPrice: gbp(3000) },
          errors: [],
          duplicate: { kind: 'stock-number-in-catalogue', message: stockInCatalogue },
        },
        {
          rowNumber: 8,
          stockNumber: null,
          title: 'Unnumbered dish',
          read: { ...nothingRead, retailPrice: gbp(800) },
          errors: [],
          duplicate: null,
        },
      ],
      validCount: 2,
      errorCount: 3,
      duplicateCount: 2,
      importableDuplicateCount: 0,
      problems: [
        { field: 'title', message: 'Enter a title.', rowNumbers: [3] },
        {
          field: 'retailPrice',
          message: 'Enter the price in GBP as a number such as 12.50, not “twelve”.',
          rowNumbers: [4],
        },
        { field: 'year', message: 'The year must be at least 1900.', rowNumbers: [4] },
        {
          field: 'weightG',
          message: 'Enter the weight to the nearest gram, such as 850 g or 1.25 kg.',
          rowNumbers: [5],
        },
        {
          field: 'foodUse',
          message: 'Choose food-safe, decorative only, or not stated.',
          rowNumbers: [5],
        },
      ],
      duplicates: [
        { kind: 'stock-number-in-file', rowNumbers: [6] },
        { kind: 'stock-number-in-catalogue', rowNumbers: [7] },
      ],
    });
    expect(await f.db.selectFrom('works').select('stock_number').execute()).toEqual([
      { stock_number: 'OLD-1' },
    ]);
  });

  it('reads prices with either decimal mark and sizes with their units, and flags what either mark could mean', async () => {
    const f = await studioFixture();
    // Decimal marks as Unicode CLDR's number symbols have them: en-GB "1,250.00", de-DE and
    // fr-FR "12,50". "1,250" is 1250 to one and 1.25 to the other, so it is asked about.
    const csv = [
      'Title,Price,Cost,Height,Width,Depth,Weight',
      'Jug,£85.00,,14 cm,140 mm,14 cm,1.2 kg',
      'Charger,"1,250.00",300,,,,1200 g',
      'Cup,"12,50","4,5",90,,,',
      'Platter,"1,250",,,,,',
      'Vase,€20,,,,,"1,250 kg"',
    ].join('\n');
    const res = await importCsv(f, { mode: 'preview', csv });
    expect(res.status).toBe(200);
    expect(
      res.body.rows.map((r: { read: unknown; errors: unknown }) => [r.read, r.errors]),
    ).toEqual([
      [
        {
          retailPrice: gbp(8500),
          costPrice: null,
          heightMm: 140,
          widthMm: 140,
          depthMm: 140,
          weightG: 1200,
        },
        [],
      ],
      [{ ...nothingRead, retailPrice: gbp(125_000), costPrice: gbp(30_000), weightG: 1200 }, []],
      [{ ...nothingRead, retailPrice: gbp(1250), costPrice: gbp(450), heightMm: 90 }, []],
      [
        nothingRead,
        [
          {
            field: 'retailPrice',
            message:
              '“1,250” could be 1250 or 1.25: write the price with a decimal point and no thousands separator, such as 1250.00 or 1.25.',
          },
        ],
      ],
      [
        nothingRead,
        [
          {
            field: 'weightG',
            message:
              '“1,250 kg” could be 1250 or 1.25: write the weight with a decimal point and no thousands separator.',
          },
          {
            field: 'retailPrice',
            message:
              '“€20” is in €; the studio’s works are in GBP. Convert the price, or leave the row out.',
          },
        ],
      ],
    ]);
    expect(res.body).toMatchObject({ validCount: 3, errorCount: 2 });
  });

  it('lists the skipped rows after an import, with a CSV of them to correct and import again', async () => {
    const f = await withExisting();
    const res = await importCsv(f, { mode: 'commit', csv: sheet });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ mode: 'commit', imported: 2, skippedCount: 5 });
    expect(res.body.skipped.map((r: { rowNumber: number }) => r.rowNumber)).toEqual([
      3, 4, 5, 6, 7,
    ]);
    expect(res.body.skipped[0]).toEqual({
      rowNumber: 3,
      stockNumber: 'P-2',
      title: null,
      read: { ...nothingRead, retailPrice: gbp(1250) },
      errors: [{ field: 'title', message: 'Enter a title.' }],
      duplicate: null,
    });
    expect(res.body.duplicates).toEqual([
      { kind: 'stock-number-in-file', rowNumbers: [6] },
      { kind: 'stock-number-in-catalogue', rowNumbers: [7] },
    ]);

    const { data, errors } = parse(res.body.skippedCsv);
    expect(errors).toEqual([]);
    expect(data).toEqual([
      ['Stock number', 'Title', 'Price', 'Year', 'Food use', 'Weight', 'Problem'],
      ['P-2', '', '12.5', '2025', '', '', 'Title: Enter a title.'],
      [
        'P-3',
        'Vase',
        'twelve',
        '1800',
        '',
        '',
        'Retail price: Enter the price in GBP as a number such as 12.50, not “twelve”. Year: The year must be at least 1900.',
      ],
      [
        'P-4',
        'Jug',
        '20',
        '2026',
        'maybe',
        '1.5',
        'Weight (g): Enter the weight to the nearest gram, such as 850 g or 1.25 kg. Food use: Choose food-safe, decorative only, or not stated.',
      ],
      ['P-1', 'Second tea bowl', '45', '2025', '', '', stockInFile],
      ['OLD-1', 'Clash', '30', '', '', '', stockInCatalogue],
    ]);

    // Corrected in a spreadsheet, the file imports; the Problem column is not read.
    const corrected = data.map((row, i) => {
      if (i === 1) return ['P-2', 'Saucer', ...row.slice(2)];
      if (i === 2) return ['P-3', 'Vase', '12.00', '2019', ...row.slice(4)];
      if (i === 3) return ['P-4', 'Jug', '20', '2026', 'decorative', '1.5 kg', row[6]!];
      return row;
    });
    const again = await importCsv(f, { mode: 'commit', csv: Papa.unparse(corrected) });
    expect(again.body).toMatchObject({ imported: 3, skippedCount: 2 });
    // A second round rewrites the Problem column rather than adding another.
    expect(parse(again.body.skippedCsv).data).toEqual([
      ['Stock number', 'Title', 'Price', 'Year', 'Food use', 'Weight', 'Problem'],
      [
        'P-1',
        'Second tea bowl',
        '45',
        '2025',
        '',
        '',
        expect.stringContaining('P-1 is already used'),
      ],
      ['OLD-1', 'Clash', '30', '', '', '', stockInCatalogue],
    ]);
    const weights = await f.db
      .selectFrom('works')
      .select(['stock_number', 'weight_g'])
      .where('stock_number', '=', 'P-4')
      .execute();
    expect(weights).toEqual([{ stock_number: 'P-4', weight_g: 1500 }]);
  });

  it('catches the same file imported twice, and imports look-alikes only when asked', async () => {
    const f = await studioFixture();
    const csv = [
      'Stock number,Title,Year,Retail price',
      'S-1,Moon jar,2024,450.00',
      ',Beaker,2025,38.00',
      ',Beaker,2025,38.00',
      ',Beaker,2024,38.00',
      '',
    ].join('\n');
    const first = await importCsv(f, { mode: 'commit', csv });
    // Within the file: the second identical unnumbered row is a duplicate of the first.
    expect(first.body).toMatchObject({
      imported: 3,
      skippedCount: 1,
      duplicates: [{ kind: 'same-in-file', rowNumbers: [4] }],
    });
    expect(first.body.skipped[0].duplicate).toEqual({
      kind: 'same-in-file',
      message: 'Same title, year and price as row 3.',
    });

    const preview = await importCsv(f, { mode: 'preview', csv });
    const year = new Date().getUTCFullYear();
    expect(preview.body).toMatchObject({
      rowCount: 4,
      validCount: 0,
      errorCount: 0,
      duplicateCount: 4,
      importableDuplicateCount: 3,
      duplicates: [
        { kind: 'stock-number-in-catalogue', rowNumbers: [2] },
        { kind: 'same-in-catalogue', rowNumbers: [3, 4, 5] },
      ],
    });
    expect(preview.body.rows[1].duplicate).toEqual({
      kind: 'same-in-catalogue',
      message: `Same title, year and price as ${year}-001 in the catalogue.`,
    });
    const again = await importCsv(f, { mode: 'commit', csv });
    expect(again.body).toMatchObject({ imported: 0, skippedCount: 4 });

    // Asked to, the look-alikes go in as new works; the stock number never does.
    const anyway = await importCsv(f, { mode: 'commit', csv, importDuplicates: true });
    expect(anyway.body).toMatchObject({
      imported: 3,
      skippedCount: 1,
      duplicates: [{ kind: 'stock-number-in-catalogue', rowNumbers: [2] }],
    });
    const counts = await f.db
      .selectFrom('works')
      .select(['title', (eb) => eb.fn.countAll<number>().as('n')])
      .where('studio_id', '=', f.studioA)
      .groupBy('title')
      .orderBy('title')
      .execute();
    expect(counts).toEqual([
      { title: 'Beaker', n: 5 },
      { title: 'Moon jar', n: 1 },
    ]);
  });

  it('commits only the rows that go in, in one transaction, numbering those without a stock number', async () => {
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
          read: { ...nothingRead, retailPrice: gbp(500) },
          errors: [{ field: 'title', message: 'Enter a title.' }],
          duplicate: null,
        },
      ],
      problems: [{ field: 'title', message: 'Enter a title.', rowNumbers: [4] }],
      duplicates: [],
      skippedCsv: 'Ref,Name,Retail price (GBP),Clay,Problem\r\nN-2,,5,,Title: Enter a title.\r\n',
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
      .send({ mode: 'save', csv: '', mapping: { colour: 'A' }, importDuplicates: 'yes' });
    expect(bad.status).toBe(400);
    expect(bad.body).toEqual({
      error: {
        code: 'invalid_request',
        message: 'Some fields need attention.',
        issues: [
          { path: ['mode'], message: 'Say whether to preview or commit.' },
          { path: ['csv'], message: 'The file is empty.' },
          { path: ['mapping'], message: expect.any(String) },
          { path: ['importDuplicates'], message: 'Say yes or no.' },
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

describe('GET /api/works/import/template.csv', () => {
  it('gives every column the import reads and an example row that imports cleanly', async () => {
    const f = await studioFixture();
    const res = await request(f.app)
      .get('/api/works/import/template.csv')
      .set(await as(f, 'assistant'));
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toBe(
      'attachment; filename=works-import-template.csv',
    );
    const { data, errors } = parse(res.text);
    expect(errors).toEqual([]);
    expect(data).toHaveLength(2);
    expect(data[0]).toEqual(importColumns.map((c) => importColumnLabels[c]));
    expect(data[1]![importColumns.indexOf('currency')]).toBe('GBP');

    const imported = await importCsv(f, { mode: 'commit', csv: res.text });
    expect(imported.body).toMatchObject({ imported: 1, skippedCount: 0, problems: [] });
  });

  it('answers 400 to a query and 403 to the venue', async () => {
    const f = await studioFixture();
    const bad = await request(f.app)
      .get('/api/works/import/template.csv?x=1')
      .set(await as(f));
    expect(bad.status).toBe(400);
    const venue = await request(f.app)
      .get('/api/works/import/template.csv')
      .set(await as(f, 'gallery'));
    expect(venue.status).toBe(403);
  });
});

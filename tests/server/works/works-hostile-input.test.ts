import request from 'supertest';

import { maxImportRows } from '@/shared/schemas/work-import';

import { type Fixture, insertWork, studioFixture } from '../helpers/studio-fixture';
import { addTestTrigger } from '../helpers/test-triggers';

const as = async (f: Fixture, who: Parameters<Fixture['cookie']>[0] = 'owner') => ({
  Cookie: await f.cookie(who),
});

const gbp = (amount: number) => ({ amount, currency: 'GBP' });
const year = new Date().getUTCFullYear();

describe('stock numbers a person types', () => {
  it('refuses a stock number over 32 characters', async () => {
    const f = await studioFixture();
    const res = await request(f.app)
      .post('/api/works')
      .set(await as(f))
      .send({ title: 'Jug', retailPrice: gbp(1000), stockNumber: 'X'.repeat(33) });
    expect(res.status).toBe(400);
    expect(res.body.error.issues).toEqual([
      { path: ['stockNumber'], message: 'Keep the stock number to 32 characters or fewer.' },
    ]);
  });

  it('never turns a huge counter typed by hand into “1e+21” or stops automatic numbering', async () => {
    const f = await studioFixture();
    const huge = `${year}-999999999999999999999`;
    const typed = await request(f.app)
      .post('/api/works')
      .set(await as(f))
      .send({ title: 'Typed', retailPrice: gbp(1000), stockNumber: huge });
    expect(typed.status).toBe(201);

    const settings = await request(f.app)
      .get('/api/studio')
      .set(await as(f));
    expect(settings.body.nextStockNumber).toBe(`${year}-1000000000000000000000`);
    const made: string[] = [];
    for (const title of ['First', 'Second']) {
      const res = await request(f.app)
        .post('/api/works')
        .set(await as(f))
        .send({ title, retailPrice: gbp(1000) });
      expect(res.status).toBe(201);
      made.push(res.body.stockNumber);
    }
    expect(made).toEqual([`${year}-1000000000000000000000`, `${year}-1000000000000000000001`]);
    expect(made.join()).not.toMatch(/e\+/);
  });

  it('falls back to the lowest unused number when the next would be too long', async () => {
    const f = await studioFixture();
    await insertWork(f.db, f.studioA, `${year}-${'9'.repeat(27)}`);
    await insertWork(f.db, f.studioA, `${year}-001`);
    const res = await request(f.app)
      .post('/api/works')
      .set(await as(f))
      .send({ title: 'Next', retailPrice: gbp(1000) });
    expect(res.status).toBe(201);
    expect(res.body.stockNumber).toBe(`${year}-002`);
  });

  it('refuses a pattern whose numbers could not fit', async () => {
    const f = await studioFixture();
    const res = await request(f.app)
      .patch('/api/studio')
      .set(await as(f))
      .send({ stockNumberPattern: `SALTMARSH-KILN-WORKS-{YYYY}-{NNN}` });
    expect(res.status).toBe(400);
    expect(res.body.error.issues).toEqual([
      {
        path: ['stockNumberPattern'],
        message: 'Shorten the pattern: its stock numbers must fit in 32 characters.',
      },
    ]);
  });
});

describe('text with hidden characters', () => {
  it.each([
    ['a NUL', 'Moon\u0000jar'],
    ['an escape sequence', 'Moon \u001b[2J jar'],
    ['a right-to-left override', 'Moon jar \u202egpj.exe'],
    ['an isolate', 'Moon \u2066jar\u2069'],
  ])('refuses a title with %s', async (_what, title) => {
    const f = await studioFixture();
    const res = await request(f.app)
      .post('/api/works')
      .set(await as(f))
      .send({ title, retailPrice: gbp(1000) });
    expect(res.status).toBe(400);
    expect(res.body.error.issues).toEqual([
      {
        path: ['title'],
        message: 'The title has a hidden control or text-direction character; retype it without.',
      },
    ]);
  });

  it('keeps line breaks in notes but refuses a NUL there', async () => {
    const f = await studioFixture();
    const ok = await request(f.app)
      .post('/api/works')
      .set(await as(f))
      .send({ title: 'Jug', retailPrice: gbp(1000), notes: 'Line one\nLine two\tindented' });
    expect(ok.status).toBe(201);
    expect(ok.body.notes).toBe('Line one\nLine two\tindented');
    const bad = await request(f.app)
      .post('/api/works')
      .set(await as(f))
      .send({ title: 'Jug', retailPrice: gbp(1000), notes: 'Line\u0000' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].path).toEqual(['notes']);
  });

  it('refuses a venue name with a bidirectional override', async () => {
    const f = await studioFixture();
    const res = await request(f.app)
      .post('/api/venues')
      .set(await as(f))
      .send({ name: 'The \u202eyrellag', kind: 'gallery' });
    expect(res.status).toBe(400);
    expect(res.body.error.issues).toEqual([
      {
        path: ['name'],
        message: 'The name has a hidden control or text-direction character; retype it without.',
      },
    ]);
  });
});

describe('a work’s currency', () => {
  it('refuses a new retail currency that would relabel the stored cost', async () => {
    const f = await studioFixture();
    const id = await insertWork(f.db, f.studioA, 'A-1', { cost_price: 2_000 });
    const res = await request(f.app)
      .patch(`/api/works/${id}`)
      .set(await as(f))
      .send({ retailPrice: { amount: 9_000, currency: 'EUR' } });
    expect(res.status).toBe(400);
    expect(res.body.error.issues).toEqual([
      {
        path: ['costPrice'],
        message:
          'The cost is in GBP. Enter it in EUR as well, or clear it, when the retail price changes currency.',
      },
    ]);
    const work = await request(f.app)
      .get(`/api/works/${id}`)
      .set(await as(f));
    expect(work.body.costPrice).toEqual(gbp(2_000));
    expect(work.body.retailPrice).toEqual(gbp(10_000));
  });

  it('changes every amount together when both come in the new currency', async () => {
    const f = await studioFixture();
    const id = await insertWork(f.db, f.studioA, 'A-1', { cost_price: 2_000 });
    const res = await request(f.app)
      .patch(`/api/works/${id}`)
      .set(await as(f))
      .send({
        retailPrice: { amount: 11_500, currency: 'EUR' },
        costPrice: { amount: 2_300, currency: 'EUR' },
      });
    expect(res.status).toBe(200);
    expect(res.body.retailPrice).toEqual({ amount: 11_500, currency: 'EUR' });
    expect(res.body.costPrice).toEqual({ amount: 2_300, currency: 'EUR' });
  });

  it('refuses a cost alone in another currency than the retail price’s', async () => {
    const f = await studioFixture();
    const id = await insertWork(f.db, f.studioA, 'A-1');
    const res = await request(f.app)
      .patch(`/api/works/${id}`)
      .set(await as(f))
      .send({ costPrice: { amount: 2_300, currency: 'EUR' } });
    expect(res.status).toBe(400);
    expect(res.body.error.issues[0].path).toEqual(['costPrice', 'currency']);
  });
});

describe('POST /api/works/import with heavy or hostile files', () => {
  const nothingRead = {
    retailPrice: null,
    costPrice: null,
    heightMm: null,
    widthMm: null,
    depthMm: null,
    weightG: null,
  };
  const commit = async (f: Fixture, csv: string) =>
    request(f.app)
      .post('/api/works/import')
      .set(await as(f))
      .send({ mode: 'commit', csv });

  it('numbers rows after a huge stock number in the file without clashing (no 500)', async () => {
    const f = await studioFixture();
    const res = await commit(
      f,
      `Stock number,Title,Price\n${year}-999999999999999999999,Typed,10\n,Blank one,11\n,Blank two,12\n`,
    );
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      mode: 'commit',
      imported: 3,
      skippedCount: 0,
      skipped: [],
      problems: [],
      duplicates: [],
      skippedCsv: null,
    });
    const numbers = await f.db.selectFrom('works').select('stock_number').execute();
    expect(numbers.map((n) => n.stock_number).sort()).toEqual([
      `${year}-1000000000000000000000`,
      `${year}-1000000000000000000001`,
      `${year}-999999999999999999999`,
    ]);
  });

  it('reports a row whose stock number is taken between the check and the insert', async () => {
    const f = await studioFixture();
    // When "First" goes in, the trigger takes "CLASH-2" in its place, as a racing request would.
    await addTestTrigger(f.db, {
      name: 'take_clash',
      table: 'works',
      event: 'insert',
      when: "new.title = 'First'",
      then: {
        run:
          'insert into works (studio_id, stock_number, title, retail_price, currency) ' +
          "values (new.studio_id, 'CLASH-2', 'Raced in', 1, 'GBP')",
      },
    });
    const res = await commit(f, 'Stock number,Title,Price\nCLASH-1,First,10\nCLASH-2,Second,11\n');
    expect(res.status).toBe(200);
    const taken = {
      kind: 'stock-number-in-catalogue',
      message:
        'The stock number CLASH-2 is already used by a work in the catalogue; stock numbers are unique, so this row cannot be imported.',
    };
    expect(res.body).toEqual({
      mode: 'commit',
      imported: 1,
      skippedCount: 1,
      skipped: [
        {
          rowNumber: 3,
          stockNumber: 'CLASH-2',
          title: 'Second',
          read: { ...nothingRead, retailPrice: { amount: 1100, currency: 'GBP' } },
          errors: [],
          duplicate: taken,
        },
      ],
      problems: [],
      duplicates: [{ kind: taken.kind, rowNumbers: [3] }],
      skippedCsv: `Stock number,Title,Price,Problem\r\nCLASH-2,Second,11,"${taken.message}"\r\n`,
    });
  });

  it('refuses a row whose currency column names another currency than the studio’s', async () => {
    const f = await studioFixture();
    const res = await commit(f, 'Title,Price,Currency\nJug,10,GBP\nBowl,12,EUR\nCup,4,\n');
    expect(res.status).toBe(200);
    const otherCurrency = {
      field: 'currency',
      message:
        'This row is in EUR; the studio’s works are in GBP. Convert its prices, or leave it out.',
    };
    expect(res.body).toEqual({
      mode: 'commit',
      imported: 2,
      skippedCount: 1,
      skipped: [
        {
          rowNumber: 3,
          stockNumber: null,
          title: 'Bowl',
          read: { ...nothingRead, retailPrice: { amount: 1200, currency: 'GBP' } },
          errors: [otherCurrency],
          duplicate: null,
        },
      ],
      problems: [{ ...otherCurrency, rowNumbers: [3] }],
      duplicates: [],
      skippedCsv: `Title,Price,Currency,Problem\r\nBowl,12,EUR,"Currency: ${otherCurrency.message}"\r\n`,
    });
  });

  it(`refuses a file of more than ${maxImportRows} rows, saying the limit`, async () => {
    const f = await studioFixture();
    const rows = Array.from({ length: maxImportRows + 1 }, (_, i) => `Work ${i},10`);
    const res = await request(f.app)
      .post('/api/works/import')
      .set(await as(f))
      .send({ mode: 'preview', csv: ['Title,Price', ...rows].join('\n') });
    const message =
      'The file has 5,001 rows; an import takes at most 5,000. Split it into smaller files.';
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: { code: 'invalid_request', message, issues: [{ path: ['csv'], message }] },
    });
  });

  it('answers a preview of a maximal file of bad rows in a fraction of the file’s size', async () => {
    const f = await studioFixture();
    // Every row fails twice (no price, a year out of range), padded to about the 2 MB limit.
    const padding = 'x'.repeat(380);
    const rows = Array.from({ length: maxImportRows }, (_, i) => `Work ${i},,1066,${padding}`);
    const csv = ['Title,Price,Year,Notes', ...rows].join('\n');
    const res = await request(f.app)
      .post('/api/works/import')
      .set(await as(f))
      .send({ mode: 'preview', csv });
    expect(res.status).toBe(200);
    expect(Buffer.byteLength(csv)).toBeGreaterThan(1_900_000);
    expect(res.body.errorCount).toBe(maxImportRows);
    expect(res.body.rows).toHaveLength(200);
    expect(res.body.problems).toEqual([
      {
        field: 'retailPrice',
        message: 'Enter the retail price, such as 12.50.',
        rowNumbers: expect.any(Array),
      },
      { field: 'year', message: 'The year must be at least 1900.', rowNumbers: expect.any(Array) },
    ]);
    expect(res.body.problems[0].rowNumbers).toHaveLength(maxImportRows);
    expect(Buffer.byteLength(res.text)).toBeLessThan(Buffer.byteLength(csv) / 10);
  });

  it('lists the rows with a problem and the first 50 ready ones in a preview', async () => {
    const f = await studioFixture();
    const rows = Array.from({ length: 120 }, (_, i) => (i === 100 ? 'Bad,' : `Work ${i},10`));
    const res = await request(f.app)
      .post('/api/works/import')
      .set(await as(f))
      .send({ mode: 'preview', csv: ['Title,Price', ...rows].join('\n') });
    expect(res.body).toMatchObject({ rowCount: 120, validCount: 119, errorCount: 1 });
    expect(res.body.rows).toHaveLength(51);
    expect(res.body.rows.at(-1).rowNumber).toBe(102);
  });
});

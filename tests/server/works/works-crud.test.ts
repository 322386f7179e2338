import request from 'supertest';

import { workSchema } from '@/shared/schemas/work';

import {
  addConsignment,
  type Fixture,
  insertLine,
  insertWork,
  studioFixture,
} from '../helpers/studio-fixture';

const newWork = {
  title: 'Moon jar',
  year: 2026,
  series: 'Tideline',
  clayBody: 'Porcelain',
  firingTempC: 1285,
  weightG: 2400,
  retailPrice: { amount: 48_000, currency: 'GBP' },
  costPrice: { amount: 9_000, currency: 'GBP' },
  foodUse: 'decorative',
};

const as = async (f: Fixture, who: Parameters<Fixture['cookie']>[0] = 'owner') => ({
  Cookie: await f.cookie(who),
});

async function otherStudiosWork(f: Fixture) {
  return insertWork(f.db, f.studioB, 'B-001', { title: 'Not yours' });
}

describe('POST /api/works', () => {
  it('creates the work with the next stock number from the studio’s pattern', async () => {
    const f = await studioFixture();
    const year = new Date().getUTCFullYear();
    await insertWork(f.db, f.studioA, `${year}-007`);
    const res = await request(f.app)
      .post('/api/works')
      .set(await as(f, 'assistant'))
      .send(newWork);
    expect(res.status).toBe(201);
    expect(workSchema.parse(res.body)).toEqual(res.body);
    expect(res.body).toMatchObject({
      ...newWork,
      stockNumber: `${year}-008`,
      status: 'in-studio',
      venue: null,
      photos: [],
      deletable: true,
      archivedAt: null,
      glaze: null,
    });
  });

  it('keeps a stock number the maker gives, and food use "not stated" when left out', async () => {
    const f = await studioFixture();
    const rest: Partial<typeof newWork> = { ...newWork };
    delete rest.foodUse;
    const res = await request(f.app)
      .post('/api/works')
      .set(await as(f))
      .send({ ...rest, stockNumber: ' TL-1 ' });
    expect(res.status).toBe(201);
    expect(res.body.stockNumber).toBe('TL-1');
    expect(res.body.foodUse).toBe('not-stated');
  });

  it('answers 409 with an issue on the stock number when the studio already uses it', async () => {
    const f = await studioFixture();
    await insertWork(f.db, f.studioA, 'TL-1');
    // Another studio's use of the same number does not matter.
    await insertWork(f.db, f.studioB, 'TL-2');
    const message = 'The stock number TL-1 is already used by another work in this studio.';
    const res = await request(f.app)
      .post('/api/works')
      .set(await as(f))
      .send({ ...newWork, stockNumber: 'TL-1' });
    expect(res.status).toBe(409);
    expect(res.body).toEqual({
      error: { code: 'conflict', message, issues: [{ path: ['stockNumber'], message }] },
    });
    const ok = await request(f.app)
      .post('/api/works')
      .set(await as(f))
      .send({ ...newWork, stockNumber: 'TL-2' });
    expect(ok.status).toBe(201);
  });

  it('answers 400 with the field issues for bad input', async () => {
    const f = await studioFixture();
    const res = await request(f.app)
      .post('/api/works')
      .set(await as(f))
      .send({
        title: '',
        year: 1850,
        weightG: 2.5,
        retailPrice: { amount: -1, currency: 'GBP' },
        costPrice: { amount: 100, currency: 'EUR' },
        glazeColour: 'blue',
      });
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: {
        code: 'invalid_request',
        message: 'Some fields need attention.',
        issues: [
          { path: ['title'], message: 'Enter a title.' },
          { path: ['year'], message: 'The year must be at least 1900.' },
          {
            path: ['weightG'],
            message: 'Enter the weight to the nearest gram, such as 850 g or 1.25 kg.',
          },
          { path: ['retailPrice', 'amount'], message: 'A price cannot be below zero.' },
          { path: [], message: expect.stringContaining('glazeColour') },
        ],
      },
    });
  });

  it('answers 403 to the venue’s staff', async () => {
    const f = await studioFixture();
    const res = await request(f.app)
      .post('/api/works')
      .set(await as(f, 'gallery'))
      .send(newWork);
    expect(res.status).toBe(403);
    expect(await f.db.selectFrom('works').select('id').execute()).toEqual([]);
  });
});

describe('GET /api/works/:id', () => {
  it('returns the work with every field', async () => {
    const f = await studioFixture();
    const created = await request(f.app)
      .post('/api/works')
      .set(await as(f))
      .send(newWork);
    const res = await request(f.app)
      .get(`/api/works/${created.body.id}`)
      .set(await as(f, 'assistant'));
    expect(res.status).toBe(200);
    expect(res.body).toEqual(created.body);
  });

  it('says it may be deleted only until it is consigned or condition-checked', async () => {
    const f = await studioFixture();
    const fresh = await insertWork(f.db, f.studioA, 'A-1');
    const consigned = await insertWork(f.db, f.studioA, 'A-2');
    const checked = await insertWork(f.db, f.studioA, 'A-3');
    const show = await addConsignment(f.db, f.studioA, f.venueA, 'S-1');
    // A line later withdrawn still leaves the work on the record.
    await insertLine(f.db, f.studioA, show, consigned, 'withdrawn');
    await f.db
      .insertInto('condition_reports')
      .values({
        studio_id: f.studioA,
        work_id: checked,
        stage: 'dispatch',
        examiner_name: 'Ann',
        examined_on: '2026-09-30',
      })
      .execute();
    const deletable = async (id: number) =>
      (
        await request(f.app)
          .get(`/api/works/${id}`)
          .set(await as(f))
      ).body.deletable;
    expect(await deletable(fresh)).toBe(true);
    expect(await deletable(consigned)).toBe(false);
    expect(await deletable(checked)).toBe(false);
    const refused = await request(f.app)
      .delete(`/api/works/${checked}`)
      .set(await as(f));
    expect(refused.status).toBe(409);
  });

  it('answers 404 for another studio’s work and 400 for an id that is not a number', async () => {
    const f = await studioFixture();
    const other = await otherStudiosWork(f);
    const res = await request(f.app)
      .get(`/api/works/${other}`)
      .set(await as(f));
    expect(res.status).toBe(404);
    expect(res.body).toEqual({ error: { code: 'not_found', message: 'That work was not found.' } });
    const bad = await request(f.app)
      .get('/api/works/abc')
      .set(await as(f));
    expect(bad.status).toBe(400);
    expect(bad.body).toEqual({
      error: {
        code: 'invalid_request',
        message: 'Some fields need attention.',
        issues: [{ path: ['id'], message: 'The id must be a number.' }],
      },
    });
  });

  it('answers 403 to the venue’s staff, even for a work their venue holds', async () => {
    const f = await studioFixture();
    const work = await insertWork(f.db, f.studioA, 'A-1', { cost_price: 4_000 });
    await insertLine(f.db, f.studioA, await addConsignment(f.db, f.studioA, f.venueA, 'C'), work);
    const res = await request(f.app)
      .get(`/api/works/${work}`)
      .set(await as(f, 'gallery'));
    expect(res.status).toBe(403);
    expect(JSON.stringify(res.body)).not.toContain('4000');
  });
});

describe('PATCH /api/works/:id', () => {
  it('changes the fields sent, clears blank ones and audits a price change', async () => {
    const f = await studioFixture();
    const created = await request(f.app)
      .post('/api/works')
      .set(await as(f))
      .send(newWork);
    const id = created.body.id;
    const res = await request(f.app)
      .patch(`/api/works/${id}`)
      .set(await as(f, 'assistant'))
      .send({ retailPrice: { amount: 52_000, currency: 'GBP' }, series: '', glaze: 'Tenmoku' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      title: 'Moon jar',
      series: null,
      glaze: 'Tenmoku',
      retailPrice: { amount: 52_000, currency: 'GBP' },
    });
    const audit = await f.db
      .selectFrom('audit_log')
      .innerJoin('users', 'users.id', 'audit_log.user_id')
      .select([
        'audit_log.studio_id',
        'users.email',
        'audit_log.action',
        'audit_log.entity',
        'audit_log.entity_id',
        'audit_log.before',
        'audit_log.after',
      ])
      .execute();
    expect(audit).toEqual([
      {
        studio_id: f.studioA,
        email: 'assistant-a@example.test',
        action: 'work.price-changed',
        entity: 'work',
        entity_id: String(id),
        before: JSON.stringify({ retailPrice: { amount: 48_000, currency: 'GBP' } }),
        after: JSON.stringify({ retailPrice: { amount: 52_000, currency: 'GBP' } }),
      },
    ]);
  });

  it('writes no audit row when the price stays the same', async () => {
    const f = await studioFixture();
    const id = await insertWork(f.db, f.studioA, 'A-1');
    const res = await request(f.app)
      .patch(`/api/works/${id}`)
      .set(await as(f))
      .send({ title: 'Renamed', retailPrice: { amount: 10_000, currency: 'GBP' } });
    expect(res.status).toBe(200);
    expect(await f.db.selectFrom('audit_log').select('id').execute()).toEqual([]);
  });

  it('refuses a stock number another work has (409) and a cost in another currency (400)', async () => {
    const f = await studioFixture();
    await insertWork(f.db, f.studioA, 'A-1');
    const id = await insertWork(f.db, f.studioA, 'A-2');
    const taken = await request(f.app)
      .patch(`/api/works/${id}`)
      .set(await as(f))
      .send({ stockNumber: 'A-1' });
    expect(taken.status).toBe(409);
    expect(taken.body.error.issues).toEqual([
      {
        path: ['stockNumber'],
        message: 'The stock number A-1 is already used by another work in this studio.',
      },
    ]);
    const same = await request(f.app)
      .patch(`/api/works/${id}`)
      .set(await as(f))
      .send({ stockNumber: 'A-2' });
    expect(same.status).toBe(200);
    const cost = await request(f.app)
      .patch(`/api/works/${id}`)
      .set(await as(f))
      .send({ costPrice: { amount: 100, currency: 'EUR' } });
    expect(cost.status).toBe(400);
    expect(cost.body).toEqual({
      error: {
        code: 'invalid_request',
        message: 'Some fields need attention.',
        issues: [
          {
            path: ['costPrice', 'currency'],
            message: 'Enter the cost in the same currency as the retail price.',
          },
        ],
      },
    });
  });

  it('answers 400 for bad input, 404 for another studio’s work, 403 to the venue', async () => {
    const f = await studioFixture();
    const id = await insertWork(f.db, f.studioA, 'A-1');
    const bad = await request(f.app)
      .patch(`/api/works/${id}`)
      .set(await as(f))
      .send({ heightMm: 0, foodUse: 'maybe' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues).toEqual([
      { path: ['heightMm'], message: 'The size must be at least 1 mm.' },
      { path: ['foodUse'], message: 'Choose food-safe, decorative only, or not stated.' },
    ]);
    const other = await request(f.app)
      .patch(`/api/works/${await otherStudiosWork(f)}`)
      .set(await as(f))
      .send({ title: 'Mine now' });
    expect(other.status).toBe(404);
    expect(
      (
        await f.db
          .selectFrom('works')
          .select('title')
          .where('stock_number', '=', 'B-001')
          .executeTakeFirst()
      )?.title,
    ).toBe('Not yours');
    const venue = await request(f.app)
      .patch(`/api/works/${id}`)
      .set(await as(f, 'gallery'))
      .send({ title: 'x' });
    expect(venue.status).toBe(403);
  });
});

describe('POST /api/works/:id/archive', () => {
  it('archives the work, which leaves the default list', async () => {
    const f = await studioFixture();
    const id = await insertWork(f.db, f.studioA, 'A-1');
    const res = await request(f.app)
      .post(`/api/works/${id}/archive`)
      .set(await as(f));
    expect(res.status).toBe(200);
    expect(res.body.archivedAt).toEqual(expect.any(String));
    const list = await request(f.app)
      .get('/api/works')
      .set(await as(f));
    expect(list.body.total).toBe(0);
  });

  it('answers 404 for another studio’s work and 403 to the venue', async () => {
    const f = await studioFixture();
    const other = await otherStudiosWork(f);
    const res = await request(f.app)
      .post(`/api/works/${other}/archive`)
      .set(await as(f));
    expect(res.status).toBe(404);
    const venue = await request(f.app)
      .post(`/api/works/${other}/archive`)
      .set(await as(f, 'gallery'));
    expect(venue.status).toBe(403);
  });
});

describe('POST /api/works/:id/restore', () => {
  it('brings an archived work back', async () => {
    const f = await studioFixture();
    const id = await insertWork(f.db, f.studioA, 'A-1', { archived_at: '2026-01-01T00:00:00Z' });
    const res = await request(f.app)
      .post(`/api/works/${id}/restore`)
      .set(await as(f, 'assistant'));
    expect(res.status).toBe(200);
    expect(res.body.archivedAt).toBeNull();
  });

  it('answers 404 for another studio’s work and 400 for a bad id', async () => {
    const f = await studioFixture();
    const res = await request(f.app)
      .post(`/api/works/${await otherStudiosWork(f)}/restore`)
      .set(await as(f));
    expect(res.status).toBe(404);
    const bad = await request(f.app)
      .post('/api/works/0/restore')
      .set(await as(f));
    expect(bad.status).toBe(400);
  });
});

describe('DELETE /api/works/:id', () => {
  it('deletes a work that was never consigned, with its photo rows', async () => {
    const f = await studioFixture();
    const id = await insertWork(f.db, f.studioA, 'A-1');
    const { id: fileId } = await f.db
      .insertInto('files')
      .values({ studio_id: f.studioA, sha256: 'ab', mime_type: 'image/png', byte_size: 1 })
      .returning('id')
      .executeTakeFirstOrThrow();
    await f.db
      .insertInto('work_photos')
      .values({ work_id: id, file_id: fileId, position: 0 })
      .execute();
    const res = await request(f.app)
      .delete(`/api/works/${id}`)
      .set(await as(f));
    expect(res.status).toBe(204);
    expect(await f.db.selectFrom('works').select('id').execute()).toEqual([]);
    expect(await f.db.selectFrom('work_photos').select('id').execute()).toEqual([]);
  });

  it('refuses with 409 a work that has ever been on a consignment, saying to archive it', async () => {
    const f = await studioFixture();
    const id = await insertWork(f.db, f.studioA, 'A-1');
    const show = await addConsignment(f.db, f.studioA, f.venueA, 'S-1');
    await insertLine(f.db, f.studioA, show, id, 'returned');
    const res = await request(f.app)
      .delete(`/api/works/${id}`)
      .set(await as(f));
    expect(res.status).toBe(409);
    expect(res.body).toEqual({
      error: {
        code: 'conflict',
        message:
          'A-1 has been on a consignment, so it stays in the catalogue for the record. ' +
          'Archive it instead to hide it from lists.',
      },
    });
    expect(await f.db.selectFrom('works').select('id').execute()).toEqual([{ id }]);
  });

  it('answers 404 for another studio’s work and 403 to the venue', async () => {
    const f = await studioFixture();
    const other = await otherStudiosWork(f);
    const res = await request(f.app)
      .delete(`/api/works/${other}`)
      .set(await as(f));
    expect(res.status).toBe(404);
    const venue = await request(f.app)
      .delete(`/api/works/${other}`)
      .set(await as(f, 'gallery'));
    expect(venue.status).toBe(403);
    expect(await f.db.selectFrom('works').select('id').execute()).toEqual([{ id: other }]);
  });
});

describe('GET /api/works/:id/history', () => {
  it('lists its consignments and condition reports, newest first, graded by the worst finding', async () => {
    const f = await studioFixture();
    const id = await insertWork(f.db, f.studioA, 'A-1');
    const first = await addConsignment(f.db, f.studioA, f.venueA, 'S-1');
    const second = await addConsignment(f.db, f.studioA, f.venueA, 'S-2');
    const returned = await insertLine(f.db, f.studioA, first, id, 'returned');
    await insertLine(f.db, f.studioA, second, id, 'sold');
    const report = async (
      stage: 'dispatch' | 'return',
      on: string,
      grades: ('slight' | 'marked' | 'serious')[],
    ) => {
      const { id: reportId } = await f.db
        .insertInto('condition_reports')
        .values({
          studio_id: f.studioA,
          work_id: id,
          consignment_line_id: returned,
          stage,
          examiner_name: 'Ann',
          examined_on: on,
        })
        .returning('id')
        .executeTakeFirstOrThrow();
      for (const grade of grades) {
        await f.db
          .insertInto('condition_findings')
          .values({ report_id: reportId, kind: 'chip', grade })
          .execute();
      }
      return reportId;
    };
    const dispatch = await report('dispatch', '2026-09-30', []);
    // Spectrum "Condition": the overall grade is that of the most serious finding.
    const back = await report('return', '2026-12-01', ['slight', 'serious', 'marked']);

    const res = await request(f.app)
      .get(`/api/works/${id}/history`)
      .set(await as(f));
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      consignments: [
        {
          lineId: expect.any(Number),
          consignmentId: second,
          reference: 'S-2',
          title: 'Show S-2',
          consignmentState: 'on-show',
          venueName: 'Gallery of A',
          lineState: 'sold',
          listPrice: { amount: 10_000, currency: 'GBP' },
          salePrice: { amount: 9_000, currency: 'GBP' },
          soldOn: '2026-11-02',
          dispatchDate: '2026-10-01',
        },
        {
          lineId: returned,
          consignmentId: first,
          reference: 'S-1',
          title: 'Show S-1',
          consignmentState: 'on-show',
          venueName: 'Gallery of A',
          lineState: 'returned',
          listPrice: { amount: 10_000, currency: 'GBP' },
          salePrice: null,
          soldOn: null,
          dispatchDate: '2026-10-01',
        },
      ],
      conditionReports: [
        {
          id: back,
          stage: 'return',
          grade: 'serious',
          examinedOn: '2026-12-01',
          examinerName: 'Ann',
          findingCount: 3,
        },
        {
          id: dispatch,
          stage: 'dispatch',
          grade: 'sound',
          examinedOn: '2026-09-30',
          examinerName: 'Ann',
          findingCount: 0,
        },
      ],
    });
  });

  it('answers 404 for another studio’s work and 403 to the venue', async () => {
    const f = await studioFixture();
    const other = await otherStudiosWork(f);
    const res = await request(f.app)
      .get(`/api/works/${other}/history`)
      .set(await as(f));
    expect(res.status).toBe(404);
    const venue = await request(f.app)
      .get(`/api/works/${other}/history`)
      .set(await as(f, 'gallery'));
    expect(venue.status).toBe(403);
  });
});

import { as, consignmentFixture, draftWith, insertWork } from '../helpers/consignment-fixture';

const gbp = (amount: number) => ({ amount, currency: 'GBP' });

describe('POST /api/consignments/:id/lines', () => {
  it('adds a work at its retail price, or at the price given', async () => {
    const f = await consignmentFixture();
    const draft = await draftWith(f, []);
    const owner = as(f, 'owner');
    const first = await owner.post(`/api/consignments/${draft.id}/lines`, { workId: f.works[0] });
    expect(first.status).toBe(201);
    expect(first.body.lines[0]).toMatchObject({ workId: f.works[0], listPrice: gbp(10_000) });
    const second = await owner.post(`/api/consignments/${draft.id}/lines`, {
      workId: f.works[1],
      listPrice: gbp(25_000),
    });
    expect(second.body.lines[1]).toMatchObject({ listPrice: gbp(25_000) });
  });

  it('refuses a work another open consignment holds, naming it', async () => {
    const f = await consignmentFixture();
    const held = await draftWith(f, [f.works[0]!], 'Winter show');
    const other = await draftWith(f, [], 'Spring show');
    const res = await as(f, 'owner').post(`/api/consignments/${other.id}/lines`, {
      workId: f.works[0],
    });
    const message = `A-1 is on ${held.reference} “Winter show” (reserved, not yet sent): a work goes on one open consignment at a time.`;
    expect(res.status).toBe(409);
    expect(res.body).toEqual({
      error: { code: 'conflict', message, issues: [{ path: ['workId'], message }] },
    });
    const again = await as(f, 'owner').post(`/api/consignments/${held.id}/lines`, {
      workId: f.works[0],
    });
    expect(again.status).toBe(409);
    expect(again.body.error.message).toBe('A-1 is already on this consignment.');
  });

  it('lets exactly one of 20 racing drafts have the same work', async () => {
    const f = await consignmentFixture();
    const drafts = [];
    for (let i = 0; i < 20; i += 1) drafts.push(await draftWith(f, [], `Show ${i}`));
    const owner = as(f, 'owner');
    const results = await Promise.all(
      drafts.map((d) => owner.post(`/api/consignments/${d.id}/lines`, { workId: f.works[2] })),
    );
    expect(results.filter((r) => r.status === 201)).toHaveLength(1);
    expect(results.filter((r) => r.status === 409)).toHaveLength(19);
    const holds = await f.db
      .selectFrom('consignment_lines')
      .select('id')
      .where('work_id', '=', f.works[2]!)
      .execute();
    expect(holds).toHaveLength(1);
  });

  it('frees a work once its consignment is cancelled', async () => {
    const f = await consignmentFixture();
    const first = await draftWith(f, [f.works[0]!]);
    await as(f, 'owner').post(`/api/consignments/${first.id}/cancel`);
    const second = await draftWith(f, []);
    const res = await as(f, 'owner').post(`/api/consignments/${second.id}/lines`, {
      workId: f.works[0],
    });
    expect(res.status).toBe(201);
  });

  it('refuses a price in another currency, an archived or sold work, another studio’s work', async () => {
    const f = await consignmentFixture();
    const draft = await draftWith(f, []);
    const owner = as(f, 'owner');
    const euro = await owner.post(`/api/consignments/${draft.id}/lines`, {
      workId: f.works[0],
      listPrice: { amount: 100, currency: 'EUR' },
    });
    expect(euro.status).toBe(400);
    expect(euro.body.error.issues).toEqual([
      {
        path: ['listPrice', 'currency'],
        message: "This consignment's terms are in GBP: price the piece in GBP.",
      },
    ]);
    const archived = await insertWork(f.db, f.studioA, 'A-OLD', {
      archived_at: '2026-01-01T00:00:00.000Z',
    });
    const res = await owner.post(`/api/consignments/${draft.id}/lines`, { workId: archived });
    expect(res.status).toBe(400);
    expect(res.body.error.issues[0].message).toBe('A-OLD is archived: restore it first.');
    const theirs = await insertWork(f.db, f.studioB, 'B-1');
    const foreign = await owner.post(`/api/consignments/${draft.id}/lines`, { workId: theirs });
    expect(foreign.status).toBe(400);
    expect(foreign.body.error.issues[0]).toEqual({
      path: ['workId'],
      message: 'That work was not found.',
    });
  });

  it('takes no more pieces once the terms are agreed; the venue cannot add any', async () => {
    const f = await consignmentFixture();
    const draft = await draftWith(f, [f.works[0]!]);
    await as(f, 'owner').post(`/api/consignments/${draft.id}/agree`);
    const late = await as(f, 'owner').post(`/api/consignments/${draft.id}/lines`, {
      workId: f.works[1],
    });
    expect(late.status).toBe(409);
    const venue = await as(f, 'gallery').post(`/api/consignments/${draft.id}/lines`, {
      workId: f.works[1],
    });
    expect(venue.status).toBe(403);
  });
});

describe('PATCH and DELETE /api/consignments/:id/lines/:lineId', () => {
  it('reprices and removes a piece of a draft, 404 for a line of another consignment', async () => {
    const f = await consignmentFixture();
    const draft = await draftWith(f, [f.works[0]!, f.works[1]!]);
    const other = await draftWith(f, [f.works[2]!]);
    const owner = as(f, 'owner');
    const priced = await owner.patch(`/api/consignments/${draft.id}/lines/${draft.lines[0]!.id}`, {
      listPrice: gbp(12_000),
    });
    expect(priced.status).toBe(200);
    expect(priced.body.lines[0]).toMatchObject({
      listPrice: gbp(12_000),
      insuranceValue: gbp(7_200),
    });
    const removed = await owner.delete(`/api/consignments/${draft.id}/lines/${draft.lines[1]!.id}`);
    expect(removed.status).toBe(200);
    expect(removed.body.lines).toHaveLength(1);
    const wrong = await owner.delete(`/api/consignments/${draft.id}/lines/${other.lines[0]!.id}`);
    expect(wrong.status).toBe(404);
  });
});

describe('where a work is while a consignment is put together and sent', () => {
  it('stays in the studio, reserved, until dispatch', async () => {
    const f = await consignmentFixture();
    const draft = await draftWith(f, [f.works[0]!]);
    const work = await as(f, 'owner').get(`/api/works/${f.works[0]}`);
    expect(work.body.status).toBe('in-studio');
    expect(work.body.consignment).toEqual({
      id: draft.id,
      reference: draft.reference,
      reserved: true,
    });
    expect(work.body.venue).toBeNull();
  });
});

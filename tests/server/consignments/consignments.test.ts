import { consignmentSchema } from '@/shared/schemas/consignment';

import { as, consignmentFixture, draftWith, galleryTerms } from '../helpers/consignment-fixture';

const gbp = (amount: number) => ({ amount, currency: 'GBP' });

describe('POST /api/consignments', () => {
  it('makes a draft for the venue, its terms copied from the venue’s, with a reference', async () => {
    const f = await consignmentFixture();
    const res = await as(f, 'assistant').post('/api/consignments', {
      venueId: f.venueA,
      title: 'Winter show',
      dispatchDate: '2026-11-20',
      openingDate: '2026-11-28',
      closingDate: '2027-01-10',
      returnDueDate: '2027-01-17',
    });
    expect(res.status).toBe(201);
    expect(consignmentSchema.parse(res.body)).toEqual(res.body);
    expect(res.body).toMatchObject({
      reference: `C-${new Date().getUTCFullYear()}-001`,
      state: 'draft',
      title: 'Winter show',
      terms: galleryTerms,
      lines: [],
      totals: null,
      venue: { id: f.venueA, name: 'Gallery of A', email: 'desk@gallery-a.example' },
      openingDate: '2026-11-28',
    });
    const second = await as(f, 'owner').post('/api/consignments', {
      venueId: f.venueA,
      title: 'Spring',
    });
    expect(second.body.reference).toBe(`C-${new Date().getUTCFullYear()}-002`);
  });

  it('takes other terms from the owner, but not from an assistant', async () => {
    const f = await consignmentFixture();
    const terms = { ...galleryTerms, commissionRateBp: 3500 };
    const owner = await as(f, 'owner').post('/api/consignments', {
      venueId: f.venueA,
      title: 'Fair',
      terms,
    });
    expect(owner.status).toBe(201);
    expect(owner.body.terms.commissionRateBp).toBe(3500);
    const assistant = await as(f, 'assistant').post('/api/consignments', {
      venueId: f.venueA,
      title: 'Fair',
      terms,
    });
    expect(assistant.status).toBe(403);
    expect(assistant.body).toEqual({
      error: {
        code: 'forbidden',
        message: 'Only the studio’s owner can set a consignment’s terms.',
      },
    });
  });

  it('answers 400 with field issues, 404 for another studio’s venue, 403 to the venue', async () => {
    const f = await consignmentFixture();
    const bad = await as(f, 'owner').post('/api/consignments', {
      venueId: f.venueA,
      title: '',
      openingDate: '2026-12-01',
      closingDate: '2026-11-01',
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues).toEqual([
      { path: ['title'], message: 'Give the show or batch a title.' },
      { path: ['closingDate'], message: 'The closing date cannot come before the opening date.' },
    ]);
    const other = await as(f, 'owner').post('/api/consignments', { venueId: f.venueB, title: 'X' });
    expect(other.status).toBe(404);
    expect(other.body).toEqual({
      error: { code: 'not_found', message: 'That venue was not found.' },
    });
    const gallery = await as(f, 'gallery').post('/api/consignments', {
      venueId: f.venueA,
      title: 'X',
    });
    expect(gallery.status).toBe(403);
  });
});

describe('GET /api/consignments/:id', () => {
  it('gives each piece the split of a sale at its list price and the totals, by the money engine', async () => {
    const f = await consignmentFixture();
    const draft = await draftWith(f, [f.works[0]!, f.works[1]!]);
    const res = await as(f, 'owner').get(`/api/consignments/${draft.id}`);
    expect(res.status).toBe(200);
    // Worked example (docs/money-rules.md, HMRC 20%): 40% commission with VAT added on £100
    // gives commission £40.00, VAT £8.00, maker £52.00.
    expect(res.body.lines[0]).toMatchObject({
      stockNumber: 'A-1',
      listPrice: gbp(10_000),
      state: 'consigned',
      split: { commission: gbp(4_000), vatOnCommission: gbp(800), makerShare: gbp(5_200) },
      // Maker-net insurance: the list price less commission, without VAT (common practice).
      insuranceValue: gbp(6_000),
      dispatchCheck: null,
      differences: [],
    });
    expect(res.body.totals).toEqual({
      listPrice: gbp(34_000),
      commission: gbp(13_600),
      vatOnCommission: gbp(2_720),
      makerShare: gbp(17_680),
      insuranceValue: gbp(20_400),
    });
    // Nothing has left the studio yet.
    expect(res.body.insuredOut).toEqual(gbp(0));
  });

  it('keeps drafts from the venue and every consignment from another studio', async () => {
    const f = await consignmentFixture();
    const draft = await draftWith(f, [f.works[0]!]);
    const gallery = await as(f, 'gallery').get(`/api/consignments/${draft.id}`);
    expect(gallery.status).toBe(404);
    const other = await as(f, 'otherOwner').get(`/api/consignments/${draft.id}`);
    expect(other.status).toBe(404);
    expect(other.body).toEqual({
      error: { code: 'not_found', message: 'That consignment was not found.' },
    });
    const bad = await as(f, 'owner').get('/api/consignments/one');
    expect(bad.status).toBe(400);
  });

  it('shows the venue an agreed consignment, without the maker’s notes', async () => {
    const f = await consignmentFixture();
    const draft = await draftWith(f, [f.works[0]!]);
    await as(f, 'owner').patch(`/api/consignments/${draft.id}`, { notes: 'Ask about the plinth' });
    await as(f, 'owner').post(`/api/consignments/${draft.id}/agree`);
    const gallery = await as(f, 'gallery').get(`/api/consignments/${draft.id}`);
    expect(gallery.status).toBe(200);
    expect(gallery.body.notes).toBeNull();
    expect((await as(f, 'owner').get(`/api/consignments/${draft.id}`)).body.notes).toBe(
      'Ask about the plinth',
    );
  });
});

describe('GET /api/consignments', () => {
  it('lists and filters by state and venue; the venue sees only its agreed ones', async () => {
    const f = await consignmentFixture();
    const first = await draftWith(f, [f.works[0]!], 'First');
    await draftWith(f, [f.works[1]!], 'Second');
    await as(f, 'owner').post(`/api/consignments/${first.id}/agree`);
    const all = await as(f, 'owner').get('/api/consignments');
    expect(all.body.total).toBe(2);
    const agreed = await as(f, 'owner').get('/api/consignments?state=agreed');
    expect(agreed.body.items.map((c: { title: string }) => c.title)).toEqual(['First']);
    const elsewhere = await as(f, 'owner').get(`/api/consignments?venueId=${f.venueB}`);
    expect(elsewhere.body).toEqual({ items: [], total: 0 });
    const venue = await as(f, 'gallery').get('/api/consignments');
    expect(venue.body.items.map((c: { title: string }) => c.title)).toEqual(['First']);
    const bad = await as(f, 'owner').get('/api/consignments?state=lost');
    expect(bad.status).toBe(400);
  });
});

describe('PATCH /api/consignments/:id', () => {
  it('changes a draft; new terms bring the insurance values up to date', async () => {
    const f = await consignmentFixture();
    const draft = await draftWith(f, [f.works[0]!]);
    const res = await as(f, 'owner').patch(`/api/consignments/${draft.id}`, {
      title: 'Winter show, renamed',
      terms: { ...galleryTerms, insuranceBasis: 'retail' },
    });
    expect(res.status).toBe(200);
    expect(res.body.title).toBe('Winter show, renamed');
    expect(res.body.lines[0].insuranceValue).toEqual(gbp(10_000));
  });

  it('refuses dates out of order once merged with the stored ones', async () => {
    const f = await consignmentFixture();
    const owner = as(f, 'owner');
    const created = await owner.post('/api/consignments', {
      venueId: f.venueA,
      title: 'Show',
      openingDate: '2026-12-01',
    });
    const res = await owner.patch(`/api/consignments/${created.body.id}`, {
      closingDate: '2026-11-01',
    });
    expect(res.status).toBe(400);
    expect(res.body.error.issues).toEqual([
      { path: ['closingDate'], message: 'The closing date cannot come before the opening date.' },
    ]);
  });

  it('refuses any change once agreed, and keeps the agreed terms when the venue’s change', async () => {
    const f = await consignmentFixture();
    const draft = await draftWith(f, [f.works[0]!]);
    await as(f, 'owner').post(`/api/consignments/${draft.id}/agree`);
    const res = await as(f, 'owner').patch(`/api/consignments/${draft.id}`, { title: 'Later' });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/has its terms agreed: only a draft can be changed\.$/);
    const venueEdit = await as(f, 'owner').patch(`/api/venues/${f.venueA}`, {
      defaultTerms: { ...galleryTerms, commissionRateBp: 5000 },
    });
    expect(venueEdit.status).toBe(200);
    const after = await as(f, 'owner').get(`/api/consignments/${draft.id}`);
    expect(after.body.terms).toEqual(galleryTerms);
    expect(after.body.lines[0].split.commission).toEqual(gbp(4_000));
  });

  it('keeps terms changes to the owner', async () => {
    const f = await consignmentFixture();
    const draft = await draftWith(f, []);
    const res = await as(f, 'assistant').patch(`/api/consignments/${draft.id}`, {
      terms: galleryTerms,
    });
    expect(res.status).toBe(403);
  });
});

describe('an audit of every change', () => {
  it('records creation, pieces, prices and each change of state', async () => {
    const f = await consignmentFixture();
    const draft = await draftWith(f, [f.works[0]!]);
    const owner = as(f, 'owner');
    await owner.patch(`/api/consignments/${draft.id}/lines/${draft.lines[0]!.id}`, {
      listPrice: gbp(12_000),
    });
    await owner.post(`/api/consignments/${draft.id}/agree`);
    await owner.post(`/api/consignments/${draft.id}/cancel`);
    const rows = await f.db
      .selectFrom('audit_log')
      .select(['action', 'entity_id'])
      .where('entity', '=', 'consignment')
      .orderBy('id')
      .execute();
    expect(rows.map((r) => r.action)).toEqual([
      'consignment.created',
      'consignment.line-added',
      'consignment.line-price-changed',
      'consignment.agreed',
      'consignment.cancelled',
    ]);
    expect(new Set(rows.map((r) => r.entity_id))).toEqual(new Set([String(draft.id)]));
  });
});

import { isoDateInTimeZone } from '@/shared/money';

import {
  as,
  consignmentFixture,
  dispatchedWith,
  draftWith,
  soundCheck,
} from '../helpers/consignment-fixture';

const gbp = (amount: number) => ({ amount, currency: 'GBP' });

describe('POST /api/consignments/:id/agree', () => {
  it('freezes a draft with pieces; refuses an empty one and a second agreement', async () => {
    const f = await consignmentFixture();
    const empty = await draftWith(f, []);
    const refused = await as(f, 'owner').post(`/api/consignments/${empty.id}/agree`);
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toBe(
      `Add the pieces to ${empty.reference} before agreeing its terms.`,
    );
    const draft = await draftWith(f, [f.works[0]!]);
    const agreed = await as(f, 'assistant').post(`/api/consignments/${draft.id}/agree`);
    expect(agreed.status).toBe(200);
    expect(agreed.body.state).toBe('agreed');
    expect(agreed.body.agreedAt).toEqual(expect.any(String));
    const twice = await as(f, 'owner').post(`/api/consignments/${draft.id}/agree`);
    expect(twice.status).toBe(409);
  });
});

describe('POST /api/consignment-lines/:lineId/condition-reports', () => {
  it('grades a dispatch check by its most serious finding (Collections Trust, Spectrum)', async () => {
    const f = await consignmentFixture();
    const draft = await draftWith(f, [f.works[0]!]);
    const res = await as(f, 'assistant').post(
      `/api/consignment-lines/${draft.lines[0]!.id}/condition-reports`,
      {
        stage: 'dispatch',
        examinerName: 'Tomas',
        examinedOn: '2026-11-19',
        findings: [
          { kind: 'crazing', grade: 'slight', location: 'inside' },
          { kind: 'chip', grade: 'marked', location: 'foot ring', sizeMm: 3 },
        ],
      },
    );
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      lineId: draft.lines[0]!.id,
      stage: 'dispatch',
      overallGrade: 'marked',
      findings: [
        { kind: 'crazing', grade: 'slight', location: 'inside', sizeMm: null },
        { kind: 'chip', grade: 'marked', location: 'foot ring', sizeMm: 3 },
      ],
    });
    const none = await as(f, 'owner').post(
      `/api/consignment-lines/${draft.lines[0]!.id}/condition-reports`,
      { stage: 'dispatch', ...soundCheck },
    );
    expect(none.body.overallGrade).toBe('sound');
  });

  it('keeps each stage to its people and its moment', async () => {
    const f = await consignmentFixture();
    const draft = await draftWith(f, [f.works[0]!]);
    const line = draft.lines[0]!.id;
    await as(f, 'owner').post(`/api/consignments/${draft.id}/agree`);
    const venueDispatch = await as(f, 'gallery').post(
      `/api/consignment-lines/${line}/condition-reports`,
      { stage: 'dispatch', ...soundCheck },
    );
    expect(venueDispatch.status).toBe(403);
    const early = await as(f, 'gallery').post(`/api/consignment-lines/${line}/condition-reports`, {
      stage: 'arrival',
      ...soundCheck,
    });
    expect(early.status).toBe(409);
    expect(early.body.error.message).toBe(
      'Arrival checks are recorded once the consignment has been sent.',
    );
    const foreign = await as(f, 'otherOwner').post(
      `/api/consignment-lines/${line}/condition-reports`,
      { stage: 'dispatch', ...soundCheck },
    );
    expect(foreign.status).toBe(404);
  });

  it('refuses a finding photo that is not the studio’s, and bad findings', async () => {
    const f = await consignmentFixture();
    const draft = await draftWith(f, [f.works[0]!]);
    const { id: theirs } = await f.db
      .insertInto('files')
      .values({
        studio_id: f.studioB,
        sha256: 'c'.repeat(64),
        mime_type: 'image/png',
        byte_size: 1,
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    const res = await as(f, 'owner').post(
      `/api/consignment-lines/${draft.lines[0]!.id}/condition-reports`,
      {
        stage: 'dispatch',
        ...soundCheck,
        findings: [{ kind: 'chip', grade: 'slight', photoFileId: theirs }],
      },
    );
    expect(res.status).toBe(400);
    expect(res.body.error.issues).toEqual([
      { path: ['findings', 0, 'photoFileId'], message: 'That photo was not found; add it again.' },
    ]);
    const bad = await as(f, 'owner').post(
      `/api/consignment-lines/${draft.lines[0]!.id}/condition-reports`,
      {
        stage: 'dispatch',
        examinerName: '',
        examinedOn: '2026-02-30',
        findings: [{ kind: 'scratchy', grade: 'awful', sizeMm: 0 }],
      },
    );
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues.map((i: { path: unknown[] }) => i.path.join('.'))).toEqual([
      'examinerName',
      'examinedOn',
      'findings.0.kind',
      'findings.0.grade',
      'findings.0.sizeMm',
    ]);
  });
});

describe('POST /api/consignments/:id/dispatch', () => {
  it('refuses until every piece has its dispatch check, and lists those without', async () => {
    const f = await consignmentFixture();
    const draft = await draftWith(f, [f.works[0]!, f.works[1]!]);
    const owner = as(f, 'owner');
    const notAgreed = await owner.post(`/api/consignments/${draft.id}/dispatch`);
    expect(notAgreed.status).toBe(409);
    await owner.post(`/api/consignments/${draft.id}/agree`);
    await owner.post(`/api/consignment-lines/${draft.lines[0]!.id}/condition-reports`, {
      stage: 'dispatch',
      ...soundCheck,
    });
    const refused = await owner.post(`/api/consignments/${draft.id}/dispatch`);
    expect(refused.status).toBe(409);
    expect(refused.body).toEqual({
      error: {
        code: 'conflict',
        message: `Check the condition of every piece before sending ${draft.reference}. Not yet checked: A-2 Work A-2.`,
        issues: [{ path: ['lines', draft.lines[1]!.id], message: 'A-2 has no dispatch check.' }],
      },
    });
  });

  it('sends the batch: its works are on consignment and insured out; the venue is invited', async () => {
    const f = await consignmentFixture();
    const sent = await dispatchedWith(f, [f.works[0]!, f.works[1]!]);
    const res = await as(f, 'owner').get(`/api/consignments/${sent.id}`);
    expect(res.body).toMatchObject({ state: 'dispatched', dispatchedAt: expect.any(String) });
    // The day it went, in the studio's time zone, whatever date was planned.
    expect(res.body.dispatchDate).toBe(isoDateInTimeZone(new Date(), 'Europe/London'));
    // Insured at the maker's net: £60.00 + £144.00 (common practice; docs/money-rules.md).
    expect(res.body.insuredOut).toEqual(gbp(20_400));
    const work = await as(f, 'owner').get(`/api/works/${f.works[0]}`);
    expect(work.body).toMatchObject({
      status: 'on-consignment',
      venue: { id: f.venueA, name: 'Gallery of A' },
      consignment: { id: sent.id, reserved: false },
    });
    const invitations = await f.db.selectFrom('invitations').selectAll().execute();
    expect(invitations).toEqual([
      expect.objectContaining({
        email: 'desk@gallery-a.example',
        role: 'gallery',
        venue_id: f.venueA,
        accepted_at: null,
      }),
    ]);
    const twice = await as(f, 'owner').post(`/api/consignments/${sent.id}/dispatch`);
    expect(twice.status).toBe(409);
    const overview = await as(f, 'owner').get('/api/overview');
    expect(overview.body.exposure).toEqual([
      {
        currency: 'GBP',
        total: gbp(20_400),
        lineCount: 2,
        byVenue: [
          { venueId: f.venueA, venueName: 'Gallery of A', value: gbp(20_400), lineCount: 2 },
        ],
      },
    ]);
  });
});

describe('POST /api/consignments/:id/acknowledge', () => {
  it('records the venue’s arrival checks, flags what differs from dispatch, and puts it on show', async () => {
    const f = await consignmentFixture();
    const draft = await draftWith(f, [f.works[0]!, f.works[1]!]);
    const owner = as(f, 'owner');
    await owner.post(`/api/consignments/${draft.id}/agree`);
    await owner.post(`/api/consignment-lines/${draft.lines[0]!.id}/condition-reports`, {
      stage: 'dispatch',
      ...soundCheck,
      findings: [{ kind: 'crazing', grade: 'slight', location: 'inside' }],
    });
    await owner.post(`/api/consignment-lines/${draft.lines[1]!.id}/condition-reports`, {
      stage: 'dispatch',
      ...soundCheck,
    });
    await owner.post(`/api/consignments/${draft.id}/dispatch`);

    const venue = as(f, 'gallery');
    const res = await venue.post(`/api/consignments/${draft.id}/acknowledge`, {
      reports: [
        {
          lineId: draft.lines[0]!.id,
          examinerName: 'Priya',
          examinedOn: '2026-11-22',
          findings: [{ kind: 'crazing', grade: 'slight', location: 'Inside' }],
        },
        {
          lineId: draft.lines[1]!.id,
          examinerName: 'Priya',
          examinedOn: '2026-11-22',
          findings: [{ kind: 'chip', grade: 'marked', location: 'rim', sizeMm: 4 }],
        },
      ],
    });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      state: 'on-show',
      acknowledgedAt: expect.any(String),
      acknowledgedBy: 'gallery-a',
    });
    expect(res.body.lines[0].differences).toEqual([]);
    expect(res.body.lines[1].arrivalCheck.overallGrade).toBe('marked');
    expect(res.body.lines[1].differences).toEqual([
      {
        change: 'new',
        finding: expect.objectContaining({ kind: 'chip', location: 'rim', sizeMm: 4 }),
        before: null,
      },
    ]);
    const again = await venue.post(`/api/consignments/${draft.id}/acknowledge`, { reports: [] });
    expect(again.status).toBe(400);
    const twice = await venue.post(`/api/consignments/${draft.id}/acknowledge`, {
      reports: [
        { lineId: draft.lines[0]!.id, ...soundCheck },
        { lineId: draft.lines[1]!.id, ...soundCheck },
      ],
    });
    expect(twice.status).toBe(409);
    expect(twice.body.error.message).toMatch(
      /was acknowledged on \d{4}-\d{2}-\d{2} by gallery-a\.$/,
    );
  });

  it('wants one check for each piece sent, and only the venue’s staff', async () => {
    const f = await consignmentFixture();
    const sent = await dispatchedWith(f, [f.works[0]!, f.works[1]!]);
    const partial = await as(f, 'gallery').post(`/api/consignments/${sent.id}/acknowledge`, {
      reports: [{ lineId: sent.lines[0]!.id, ...soundCheck }],
    });
    expect(partial.status).toBe(400);
    expect(partial.body.error.issues).toEqual([
      { path: ['reports'], message: 'Check A-2 Work A-2 too.' },
    ]);
    const owner = await as(f, 'owner').post(`/api/consignments/${sent.id}/acknowledge`, {
      reports: sent.lines.map((l) => ({ lineId: l.id, ...soundCheck })),
    });
    expect(owner.status).toBe(403);
    const state = await as(f, 'owner').get(`/api/consignments/${sent.id}`);
    expect(state.body.state).toBe('dispatched');
  });
});

describe('POST /api/consignments/:id/cancel', () => {
  it('withdraws the pieces of a draft or agreed consignment, and refuses one already sent', async () => {
    const f = await consignmentFixture();
    const draft = await draftWith(f, [f.works[0]!]);
    const res = await as(f, 'owner').post(`/api/consignments/${draft.id}/cancel`);
    expect(res.status).toBe(200);
    expect(res.body.state).toBe('cancelled');
    expect(res.body.lines[0].state).toBe('withdrawn');
    const work = await as(f, 'owner').get(`/api/works/${f.works[0]}`);
    expect(work.body).toMatchObject({ status: 'in-studio', consignment: null });
    const sent = await dispatchedWith(f, [f.works[1]!]);
    const late = await as(f, 'owner').post(`/api/consignments/${sent.id}/cancel`);
    expect(late.status).toBe(409);
  });
});

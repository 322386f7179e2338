import request from 'supertest';

import { isoDateInTimeZone } from '@/shared/money';
import { venuePieceSchema } from '@/shared/schemas/consignment';

import {
  as,
  type ConsignmentFixture,
  consignmentFixture,
  dispatchedWith,
  draftWith,
  galleryTerms,
} from '../helpers/consignment-fixture';
import { addConsignment, insertLine, insertWork } from '../helpers/studio-fixture';
import { addPerson, addVenue, signIn } from '../helpers/test-app';

const pieceNotFound = { error: { code: 'not_found', message: 'That piece was not found.' } };
const forbidden = {
  error: { code: 'forbidden', message: 'Your role in this studio does not allow this.' },
};

const piece = (
  f: ConsignmentFixture,
  lineId: number | string,
  who: 'gallery' | 'owner' = 'gallery',
) => as(f, who).get(`/api/venue/lines/${lineId}`);

describe('GET /api/venue/lines/:lineId', () => {
  it('gives the venue’s staff the piece, its consignment and the studio', async () => {
    const f = await consignmentFixture();
    const sent = await dispatchedWith(f, [f.works[0]!, f.works[1]!]);
    const consignment = await as(f, 'gallery').get(`/api/consignments/${sent.id}`);
    expect(consignment.status).toBe(200);
    // Sending dates the consignment the day it happens, in the studio's time zone (docs/states.md).
    const today = isoDateInTimeZone(new Date(), 'Europe/London');
    for (const [i, line] of sent.lines.entries()) {
      const res = await piece(f, line.id);
      expect(res.status).toBe(200);
      expect(venuePieceSchema.parse(res.body)).toEqual(res.body);
      expect(res.body).toEqual({
        studio: { id: f.studioA, name: 'Studio A' },
        consignment: {
          id: sent.id,
          reference: sent.reference,
          title: 'Winter show',
          state: 'dispatched',
          // What a sale from the label needs: its earliest day, the terms agreed, and today.
          dispatchDate: today,
          terms: galleryTerms,
          today,
        },
        // The same line the consignment's page shows the venue, prices and checks included.
        line: consignment.body.lines[i],
      });
    }
    // The fixture's prices: £100 and £240, insured at the maker's net, 60% of each
    // (docs/money-rules.md, venue A's 40% commission).
    const second = await piece(f, sent.lines[1]!.id);
    expect(second.body.line).toMatchObject({
      stockNumber: 'A-2',
      listPrice: { amount: 24_000, currency: 'GBP' },
      insuranceValue: { amount: 14_400, currency: 'GBP' },
      dispatchCheck: { stage: 'dispatch', overallGrade: 'sound' },
    });
  });

  it('answers 404 for a piece on a consignment the venue may not see yet, or no longer', async () => {
    const f = await consignmentFixture();
    const draft = await draftWith(f, [f.works[0]!]);
    let res = await piece(f, draft.lines[0]!.id);
    expect(res.status).toBe(404);
    expect(res.body).toEqual(pieceNotFound);
    // Agreed: the venue sees it. Cancelled before sending: it does not.
    await as(f, 'owner').post(`/api/consignments/${draft.id}/agree`);
    res = await piece(f, draft.lines[0]!.id);
    expect(res.status).toBe(200);
    expect(res.body.consignment.state).toBe('agreed');
    await as(f, 'owner').post(`/api/consignments/${draft.id}/cancel`);
    res = await piece(f, draft.lines[0]!.id);
    expect(res.status).toBe(404);
    expect(res.body).toEqual(pieceNotFound);
  });

  it('answers 404 to the staff of another venue, and for another studio’s piece', async () => {
    const f = await consignmentFixture();
    const sent = await dispatchedWith(f, [f.works[0]!]);
    const otherVenue = await addVenue(f.db, f.studioA, 'Second venue of A');
    await addPerson(f.db, 'second-venue@example.test', [
      { studioId: f.studioA, role: 'gallery', venueId: otherVenue },
    ]);
    const stranger = await signIn(f.app, 'second-venue@example.test');
    const res = await request(f.app)
      .get(`/api/venue/lines/${sent.lines[0]!.id}`)
      .set('Cookie', stranger);
    expect(res.status).toBe(404);
    expect(res.body).toEqual(pieceNotFound);

    const theirs = await addConsignment(f.db, f.studioB, f.venueB, 'B-1');
    const theirWork = await insertWork(f.db, f.studioB, 'B-1');
    const theirLine = await insertLine(f.db, f.studioB, theirs, theirWork);
    const foreign = await piece(f, theirLine);
    expect(foreign.status).toBe(404);
    expect(foreign.body).toEqual(pieceNotFound);
  });

  it('answers 403 to the studio’s own roles', async () => {
    const f = await consignmentFixture();
    const sent = await dispatchedWith(f, [f.works[0]!]);
    for (const who of ['owner', 'assistant'] as const) {
      const res = await as(f, who).get(`/api/venue/lines/${sent.lines[0]!.id}`);
      expect(res.status).toBe(403);
      expect(res.body).toEqual(forbidden);
    }
  });

  it('answers 400 with the issues for a line id that is not a number', async () => {
    const f = await consignmentFixture();
    const res = await piece(f, 'abc');
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: {
        code: 'invalid_request',
        message: 'Some fields need attention.',
        issues: [{ path: ['lineId'], message: 'The line id must be a number.' }],
      },
    });
  });

  it('answers 401 without a session', async () => {
    const f = await consignmentFixture();
    const sent = await dispatchedWith(f, [f.works[0]!]);
    const res = await request(f.app).get(`/api/venue/lines/${sent.lines[0]!.id}`);
    expect(res.status).toBe(401);
    expect(res.body).toEqual({
      error: { code: 'unauthenticated', message: 'Sign in to continue.' },
    });
  });
});

import { as } from '../helpers/consignment-fixture';
import {
  auditOf,
  gbp,
  lineRow,
  type SalesFixture,
  salesFixture,
  secondVenueStaff,
  sell,
  undo,
  userId,
  withCookie,
} from '../helpers/sales-fixture';

const pieceNotFound = { error: { code: 'not_found', message: 'That piece was not found.' } };

/** A statement of studio A to venue A in `state`, covering the line's sale as issued. */
async function statementCovering(
  f: SalesFixture,
  lineId: number,
  state: string,
  reference: string,
) {
  const { id } = await f.db
    .insertInto('statements')
    .values({
      studio_id: f.studioA,
      venue_id: f.venueA,
      consignment_id: f.sent.id,
      reference,
      period_start: f.today,
      period_end: f.today,
      state: state as 'draft' | 'issued' | 'settled' | 'void',
      currency: 'GBP',
      issued_at: state === 'draft' ? null : '2026-12-01T10:30:00.000Z',
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  // The £240 sale's split as issued (venue A's terms, see sale.test.ts).
  await f.db
    .insertInto('statement_lines')
    .values({
      statement_id: id,
      consignment_line_id: lineId,
      sale_price: 24_000,
      commission: 9_600,
      vat_on_commission: 1_920,
      maker_share: 12_480,
    })
    .execute();
}

describe('DELETE /api/consignment-lines/:lineId/sale', () => {
  it('puts the piece out again, to be sold again', async () => {
    const f = await salesFixture();
    expect(
      (await sell(f, 'gallery', f.lines.tallBottle, 22_000, { discountReason: 'x' })).status,
    ).toBe(201);
    const res = await undo(f, 'gallery', f.lines.tallBottle);
    expect(res.status).toBe(200);
    expect(res.body.line).toMatchObject({
      id: f.lines.tallBottle,
      state: 'consigned',
      sale: null,
      resolution: null,
    });
    expect(await lineRow(f, f.lines.tallBottle)).toMatchObject({
      state: 'consigned',
      sold_on: null,
      sale_price: null,
      discount: null,
      discount_reason: null,
      sale_recorded_by: null,
      sale_recorded_at: null,
      sale_entered_by: null,
      sale_mail_id: null,
      holds_work: 1,
    });
    // Out again: on the counter list, and the work back on consignment (docs/states.md).
    const pieces = await as(f, 'gallery').get('/api/venue/pieces?q=A-2');
    expect(pieces.body.items.map((p: { line: object }) => p.line)).toEqual([
      expect.objectContaining({ id: f.lines.tallBottle, state: 'consigned', salePrice: null }),
    ]);
    const work = await as(f, 'owner').get(`/api/works/${f.works[1]}`);
    expect(work.body.status).toBe('on-consignment');

    const again = await sell(f, 'owner', f.lines.tallBottle, 24_000);
    expect(again.status).toBe(201);
    expect(again.body.line.sale).toMatchObject({ price: gbp(24_000), enteredBy: 'studio' });

    const [sold, undone, resold] = await auditOf(f, f.lines.tallBottle);
    expect([sold!.action, undone!.action, resold!.action]).toEqual([
      'line.sold',
      'line.sale-undone',
      'line.sold',
    ]);
    expect(undone).toMatchObject({
      user_id: await userId(f, 'gallery-a@example.test'),
      before: {
        state: 'sold',
        soldOn: f.today,
        salePrice: gbp(22_000),
        enteredBy: 'venue',
      },
      after: { state: 'consigned' },
    });
  });

  it('lets the studio undo a sale the venue entered, but not the venue one the studio entered', async () => {
    const f = await salesFixture();
    await sell(f, 'gallery', f.lines.moonJar, 10_000);
    await sell(f, 'owner', f.lines.tallBottle, 24_000);
    const refused = await undo(f, 'gallery', f.lines.tallBottle);
    expect(refused.status).toBe(403);
    expect(refused.body).toEqual({
      error: {
        code: 'forbidden',
        message: 'The studio entered the sale of A-2 Tall bottle: ask the maker to undo it.',
      },
    });
    expect((await lineRow(f, f.lines.tallBottle)).state).toBe('sold');
    expect((await auditOf(f, f.lines.tallBottle)).map((a) => a.action)).toEqual(['line.sold']);

    expect((await undo(f, 'assistant', f.lines.moonJar)).status).toBe(200);
    expect((await undo(f, 'owner', f.lines.tallBottle)).status).toBe(200);
  });

  it('answers 409 when there is no sale to undo', async () => {
    const f = await salesFixture();
    const res = await undo(f, 'owner', f.lines.moonJar);
    expect(res.status).toBe(409);
    expect(res.body).toEqual({
      error: {
        code: 'conflict',
        message: 'A-1 Moon jar is not sold: there is no sale to undo.',
      },
    });
    expect(await auditOf(f, f.lines.moonJar)).toEqual([]);
  });

  it('locks a sale an issued or settled statement covers; a draft or void one does not', async () => {
    const f = await salesFixture();
    await sell(f, 'gallery', f.lines.tallBottle, 24_000);
    await statementCovering(f, f.lines.tallBottle, 'draft', 'S-2026-001');
    await statementCovering(f, f.lines.tallBottle, 'void', 'S-2026-002');
    expect((await undo(f, 'owner', f.lines.tallBottle)).status).toBe(200);

    for (const [state, reference] of [
      ['issued', 'S-2026-003'],
      ['settled', 'S-2026-004'],
    ] as const) {
      const lineId = state === 'issued' ? f.lines.tallBottle : f.lines.teaBowl;
      expect((await sell(f, 'gallery', lineId, 24_000)).status).toBe(201);
      await statementCovering(f, lineId, state, reference);
      const shown = await as(f, 'owner').get(`/api/consignments/${f.sent.id}`);
      const line = shown.body.lines.find((l: { id: number }) => l.id === lineId);
      expect(line.sale.lockedBy).toBe(reference);
      for (const who of ['owner', 'assistant', 'gallery'] as const) {
        const res = await undo(f, who, lineId);
        expect(res.status).toBe(409);
        expect(res.body.error).toEqual({
          code: 'conflict',
          message: `The sale of ${
            lineId === f.lines.tallBottle ? 'A-2 Tall bottle' : 'A-3 Tea bowl'
          } is on statement ${reference}, issued on 2026-12-01: it is locked. A correction goes on a new statement.`,
        });
      }
      expect((await lineRow(f, lineId)).state).toBe('sold');
    }
  });

  it('answers 404 to another venue’s staff and to another studio', async () => {
    const f = await salesFixture();
    await sell(f, 'gallery', f.lines.moonJar, 10_000);
    const { cookie } = await secondVenueStaff(f);
    for (const stranger of [withCookie(f, cookie), withCookie(f, await f.cookie('otherOwner'))]) {
      const res = await stranger.delete(`/api/consignment-lines/${f.lines.moonJar}/sale`);
      expect(res.status).toBe(404);
      expect(res.body).toEqual(pieceNotFound);
    }
    expect((await lineRow(f, f.lines.moonJar)).state).toBe('sold');
  });
});

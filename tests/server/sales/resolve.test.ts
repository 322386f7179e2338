import request from 'supertest';

import { formatDate } from '@/shared/format/dates';

import { as } from '../helpers/consignment-fixture';
import { picture } from '../helpers/pictures';
import {
  auditOf,
  dayAfter,
  lineRow,
  recordedTime,
  resolve,
  type SalesFixture,
  salesFixture,
  secondVenueStaff,
  sell,
  userId,
  withCookie,
} from '../helpers/sales-fixture';

/** A photo of the damage, sent as the venue's staff naming the piece (its studio's, not the active one). */
async function damagePhoto(f: SalesFixture, lineId: number) {
  const res = await request(f.app)
    .post(`/api/condition-photos?lineId=${lineId}`)
    .set('Cookie', await f.cookie('gallery'))
    .attach('photo', await picture(800, 600, '#7a4a3a'), 'crack.jpg');
  expect(res.status).toBe(201);
  return res.body as { fileId: number; url: string };
}

describe('POST /api/consignment-lines/:lineId/resolve', () => {
  it('records a piece returned by the venue, with its note, and who did it', async () => {
    const f = await salesFixture();
    const res = await resolve(f, 'gallery', f.lines.moonJar, {
      state: 'returned',
      on: f.today,
      note: 'Collected by the maker\nwith its box',
    });
    expect(res.status).toBe(200);
    expect(res.body.line).toMatchObject({
      id: f.lines.moonJar,
      state: 'returned',
      sale: null,
      resolution: {
        on: f.today,
        note: 'Collected by the maker\nwith its box',
        photo: null,
        enteredBy: 'venue',
        recordedBy: 'gallery-a',
      },
    });
    expect(await lineRow(f, f.lines.moonJar)).toMatchObject({
      state: 'returned',
      resolved_on: f.today,
      resolved_by: await userId(f, 'gallery-a@example.test'),
      resolution_entered_by: 'venue',
      holds_work: null,
    });
    const work = await as(f, 'owner').get(`/api/works/${f.works[0]}`);
    expect(work.body.status).toBe('returned');
    expect(await auditOf(f, f.lines.moonJar)).toEqual([
      expect.objectContaining({
        action: 'line.returned',
        user_id: await userId(f, 'gallery-a@example.test'),
        before: { state: 'consigned' },
        after: {
          state: 'returned',
          on: f.today,
          note: 'Collected by the maker\nwith its box',
          photoFileId: null,
          enteredBy: 'venue',
        },
      }),
    ]);
  });

  it('records damage with a photo the venue uploaded for the piece; the studio sees it, others do not', async () => {
    const f = await salesFixture();
    const photo = await damagePhoto(f, f.lines.tallBottle);
    const res = await resolve(f, 'gallery', f.lines.tallBottle, {
      state: 'damaged',
      on: f.today,
      note: 'Knocked off the plinth: crack through the neck.',
      photoFileId: photo.fileId,
    });
    expect(res.status).toBe(200);
    expect(res.body.line.resolution).toMatchObject({
      photo: { fileId: photo.fileId, url: photo.url },
      enteredBy: 'venue',
    });
    for (const who of ['owner', 'assistant', 'gallery'] as const) {
      const shown = await request(f.app)
        .get(photo.url)
        .set('Cookie', await f.cookie(who));
      expect(shown.status).toBe(200);
      expect(shown.headers['content-type']).toBe('image/webp');
    }
    const { cookie } = await secondVenueStaff(f);
    for (const stranger of [cookie, await f.cookie('otherOwner')]) {
      const hidden = await request(f.app).get(photo.url).set('Cookie', stranger);
      expect(hidden.status).toBe(404);
    }
    expect((await auditOf(f, f.lines.tallBottle))[0]).toMatchObject({
      action: 'line.damaged',
      after: { state: 'damaged', photoFileId: photo.fileId },
    });
    expect((await as(f, 'owner').get(`/api/works/${f.works[1]}`)).body.status).toBe('damaged');
  });

  it('records a piece lost, entered by the studio', async () => {
    const f = await salesFixture();
    const res = await resolve(f, 'assistant', f.lines.teaBowl, {
      state: 'lost',
      on: f.today,
    });
    expect(res.status).toBe(200);
    expect(res.body.line).toMatchObject({
      state: 'lost',
      resolution: { note: null, photo: null, enteredBy: 'studio', recordedBy: 'assistant-a' },
    });
    expect((await auditOf(f, f.lines.teaBowl)).map((a) => a.action)).toEqual(['line.lost']);
  });

  it('lets only the studio withdraw a piece', async () => {
    const f = await salesFixture();
    const refused = await resolve(f, 'gallery', f.lines.moonJar, {
      state: 'withdrawn',
      on: f.today,
    });
    expect(refused.status).toBe(403);
    expect(refused.body).toEqual({
      error: { code: 'forbidden', message: 'Only the studio withdraws a piece.' },
    });
    expect((await lineRow(f, f.lines.moonJar)).state).toBe('consigned');
    expect(await auditOf(f, f.lines.moonJar)).toEqual([]);

    for (const [who, lineId] of [
      ['owner', f.lines.moonJar],
      ['assistant', f.lines.tallBottle],
    ] as const) {
      const res = await resolve(f, who, lineId, { state: 'withdrawn', on: f.today });
      expect(res.status).toBe(200);
      expect(res.body.line).toMatchObject({
        state: 'withdrawn',
        resolution: { enteredBy: 'studio' },
      });
      expect((await auditOf(f, lineId)).map((a) => a.action)).toEqual(['line.withdrawn']);
    }
    // A withdrawn piece is back in the studio (docs/states.md).
    expect((await as(f, 'owner').get(`/api/works/${f.works[0]}`)).body.status).toBe('in-studio');
  });

  it('refuses a day outside the show, a photo not the studio’s, and an unknown outcome', async () => {
    const f = await salesFixture();
    const early = await resolve(f, 'gallery', f.lines.moonJar, {
      state: 'returned',
      on: dayAfter(f.today, -1),
    });
    expect(early.status).toBe(400);
    expect(early.body.error.issues).toEqual([
      { path: ['on'], message: `The date cannot come before the piece was sent, on ${f.today}.` },
    ]);
    const late = await resolve(f, 'owner', f.lines.moonJar, {
      state: 'lost',
      on: dayAfter(f.today),
    });
    expect(late.body.error.issues).toEqual([
      { path: ['on'], message: `The date cannot be after today, ${f.today}.` },
    ]);
    const { id: theirs } = await f.db
      .insertInto('files')
      .values({
        studio_id: f.studioB,
        sha256: 'd'.repeat(64),
        mime_type: 'image/png',
        byte_size: 1,
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    const foreignPhoto = await resolve(f, 'gallery', f.lines.moonJar, {
      state: 'damaged',
      on: f.today,
      photoFileId: theirs,
    });
    expect(foreignPhoto.status).toBe(400);
    expect(foreignPhoto.body.error.issues).toEqual([
      { path: ['photoFileId'], message: 'That photo was not found: send it again.' },
    ]);
    const unknown = await resolve(f, 'gallery', f.lines.moonJar, { state: 'broken', on: f.today });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.issues).toEqual([
      { path: ['state'], message: 'Choose returned, damaged, lost or withdrawn.' },
    ]);
    expect(await auditOf(f, f.lines.moonJar)).toEqual([]);
    expect((await lineRow(f, f.lines.moonJar)).state).toBe('consigned');
  });

  it('answers 409 for a piece already sold or resolved, naming who and when', async () => {
    const f = await salesFixture();
    const day = formatDate(f.today, 'en-GB');
    await resolve(f, 'assistant', f.lines.moonJar, { state: 'lost', on: f.today });
    const twice = await resolve(f, 'gallery', f.lines.moonJar, { state: 'returned', on: f.today });
    expect(twice.status).toBe(409);
    expect(twice.body).toEqual({
      error: {
        code: 'conflict',
        message: `A-1 Moon jar is no longer out: it was marked lost by assistant-a on ${day}.`,
      },
    });
    const sold = await sell(f, 'gallery', f.lines.tallBottle, 24_000);
    const at = recordedTime(sold.body.line.sale.recordedAt);
    const back = await resolve(f, 'owner', f.lines.tallBottle, { state: 'returned', on: f.today });
    expect(back.status).toBe(409);
    expect(back.body.error.message).toBe(
      `A-2 Tall bottle is already sold: gallery-a at Gallery of A recorded the sale on ${day} at ${at}.`,
    );
  });

  it('answers 404 to another venue’s staff and to another studio', async () => {
    const f = await salesFixture();
    const { cookie } = await secondVenueStaff(f);
    for (const stranger of [withCookie(f, cookie), withCookie(f, await f.cookie('otherOwner'))]) {
      const res = await stranger.post(`/api/consignment-lines/${f.lines.moonJar}/resolve`, {
        state: 'returned',
        on: f.today,
      });
      expect(res.status).toBe(404);
      expect(res.body).toEqual({
        error: { code: 'not_found', message: 'That piece was not found.' },
      });
    }
    expect((await lineRow(f, f.lines.moonJar)).state).toBe('consigned');
  });
});

import request from 'supertest';

import { as, consignmentFixture, dispatchedWith, soundCheck } from '../helpers/consignment-fixture';
import { picture } from '../helpers/pictures';
import { addPerson, addVenue, signIn } from '../helpers/test-app';

describe('/api/condition-photos', () => {
  it('takes a finding’s photo from the venue and shows it to those who may see the report', async () => {
    const f = await consignmentFixture();
    const sent = await dispatchedWith(f, [f.works[0]!]);
    const upload = await request(f.app)
      .post('/api/condition-photos')
      .set('Cookie', await f.cookie('gallery'))
      .attach('photo', await picture(600, 400, '#a05030'), 'chip.jpg');
    expect(upload.status).toBe(201);
    expect(upload.body).toEqual({
      fileId: expect.any(Number),
      url: `/api/condition-photos/${upload.body.fileId}`,
    });
    const ack = await as(f, 'gallery').post(`/api/consignments/${sent.id}/acknowledge`, {
      reports: [
        {
          lineId: sent.lines[0]!.id,
          ...soundCheck,
          findings: [{ kind: 'chip', grade: 'slight', photoFileId: upload.body.fileId }],
        },
      ],
    });
    expect(ack.status).toBe(200);
    expect(ack.body.lines[0].arrivalCheck.findings[0].photoUrl).toBe(upload.body.url);

    for (const who of ['owner', 'gallery'] as const) {
      const shown = await request(f.app)
        .get(upload.body.url)
        .set('Cookie', await f.cookie(who));
      expect(shown.status).toBe(200);
      expect(shown.headers['content-type']).toBe('image/webp');
    }
    // Staff of another venue of the same studio, and another studio's owner, see nothing.
    const otherVenue = await addVenue(f.db, f.studioA, 'Second venue of A');
    await addPerson(f.db, 'other-venue@example.test', [
      { studioId: f.studioA, role: 'gallery', venueId: otherVenue },
    ]);
    const stranger = await signIn(f.app, 'other-venue@example.test');
    for (const cookie of [stranger, await f.cookie('otherOwner')]) {
      const hidden = await request(f.app).get(upload.body.url).set('Cookie', cookie);
      expect(hidden.status).toBe(404);
    }
  });

  it('refuses a file that is not a picture and an upload without one', async () => {
    const f = await consignmentFixture();
    const cookie = await f.cookie('owner');
    const text = await request(f.app)
      .post('/api/condition-photos')
      .set('Cookie', cookie)
      .attach('photo', Buffer.from('not a picture'), 'chip.jpg');
    expect(text.status).toBe(400);
    const none = await request(f.app).post('/api/condition-photos').set('Cookie', cookie).send({});
    expect(none.status).toBe(400);
    expect(none.body).toEqual({
      error: { code: 'invalid_request', message: 'Choose a photo to upload.' },
    });
  });
});

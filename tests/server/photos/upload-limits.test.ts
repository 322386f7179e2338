import os from 'node:os';
import path from 'node:path';

import request from 'supertest';

import { filesUnder } from '../../../scripts/lib/files';
import { picture as solidPicture } from '../helpers/pictures';
import { type Fixture, insertWork, studioFixture } from '../helpers/studio-fixture';

const picture = (width: number, height: number, colour: string) =>
  solidPicture(width, height, colour, 'png');

const incoming = path.join(os.tmpdir(), 'saggar-incoming');

async function postRaw(f: Fixture, workId: number, contentType: string, body: string) {
  return request(f.app)
    .post(`/api/works/${workId}/photos`)
    .set('Cookie', await f.cookie('owner'))
    .set('Content-Type', contentType)
    .send(body);
}

const part = (name: string, filename: string, content: string) =>
  `--b0undary\r\nContent-Disposition: form-data; name="${name}"; filename="${filename}"\r\n` +
  `Content-Type: image/png\r\n\r\n${content}\r\n`;

describe('POST /api/works/:id/photos with a malformed body', () => {
  const unreadable = {
    error: { code: 'invalid_request', message: 'The upload could not be read. Try again.' },
  };

  it.each([
    ['no boundary', 'multipart/form-data', part('photos', 'a.png', 'x') + '--b0undary--\r\n'],
    ['a truncated body', 'multipart/form-data; boundary=b0undary', part('photos', 'a.png', 'xx')],
    [
      'a bad part header',
      'multipart/form-data; boundary=b0undary',
      '--b0undary\r\nContent-Disposition form-data no colon\r\n\r\nx\r\n--b0undary--\r\n',
    ],
    [
      'multipart/mixed',
      'multipart/mixed; boundary=b0undary',
      part('photos', 'a.png', 'x') + '--b0undary--\r\n',
    ],
  ])('answers 400 in the error shape for %s', async (_what, contentType, body) => {
    const f = await studioFixture();
    const work = await insertWork(f.db, f.studioA, 'A-1');
    const res = await postRaw(f, work, contentType, body);
    expect(res.status).toBe(400);
    expect(res.body).toEqual(unreadable);
  });

  it.each([
    ['a NUL', 'jar\u0000.png'],
    ['a bell', 'jar\u0007.png'],
    ['an escape', 'jar\u001b[31m.png'],
  ])('refuses a file name with %s character, storing nothing', async (_what, filename) => {
    const f = await studioFixture();
    const work = await insertWork(f.db, f.studioA, 'A-1');
    const res = await postRaw(
      f,
      work,
      'multipart/form-data; boundary=b0undary',
      part('photos', filename, 'x') + '--b0undary--\r\n',
    );
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_request');
    expect(res.body.error.message).toMatch(/could not be read|cannot be read/);
    expect(filesUnder(f.context.filesDir)).toEqual([]);
  });
});

describe('POST /api/works/:id/photos and the size of a picture', () => {
  it('refuses a picture over 40 megapixels before decoding it', async () => {
    const f = await studioFixture();
    const work = await insertWork(f.db, f.studioA, 'A-1');
    // 7,000 × 6,000 = 42 megapixels; a flat colour keeps the PNG small to send.
    const huge = await picture(7000, 6000, '#7a8f7c');
    const res = await request(f.app)
      .post(`/api/works/${work}/photos`)
      .set('Cookie', await f.cookie('owner'))
      .attach('photos', huge, { filename: 'wall.png', contentType: 'image/png' });
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: {
        code: 'invalid_request',
        message:
          '“wall.png” is 42 megapixels; photos up to 40 megapixels are accepted. Scale it down and upload it again.',
      },
    });
    expect(filesUnder(f.context.filesDir)).toEqual([]);
  });

  it('leaves no uploaded file behind in the temporary folder, accepted or refused', async () => {
    const f = await studioFixture();
    const work = await insertWork(f.db, f.studioA, 'A-1');
    const before = new Set(filesUnder(incoming));
    const ok = await request(f.app)
      .post(`/api/works/${work}/photos`)
      .set('Cookie', await f.cookie('owner'))
      .attach('photos', await picture(200, 200, '#334455'), 'a.png');
    expect(ok.status).toBe(201);
    const refused = await request(f.app)
      .post(`/api/works/${work}/photos`)
      .set('Cookie', await f.cookie('owner'))
      .attach('photos', Buffer.from('not a picture'), 'b.png');
    expect(refused.status).toBe(400);
    // The response ends before the files are unlinked; give the unlinks a moment.
    await new Promise((r) => setTimeout(r, 100));
    expect(filesUnder(incoming).filter((file) => !before.has(file))).toEqual([]);
  });
});

describe('stored pictures once nothing shows them', () => {
  async function withPhoto(f: Fixture, workId: number, colour: string) {
    const res = await request(f.app)
      .post(`/api/works/${workId}/photos`)
      .set('Cookie', await f.cookie('owner'))
      .attach('photos', await picture(300, 300, colour), 'p.png');
    expect(res.status).toBe(201);
    return res.body.at(-1).id as number;
  }

  it('are removed from disk when their last photo is deleted', async () => {
    const f = await studioFixture();
    const work = await insertWork(f.db, f.studioA, 'A-1');
    const photo = await withPhoto(f, work, '#aa3311');
    expect(filesUnder(f.context.filesDir)).toHaveLength(3);
    const res = await request(f.app)
      .delete(`/api/works/${work}/photos/${photo}`)
      .set('Cookie', await f.cookie('owner'));
    expect(res.status).toBe(200);
    expect(filesUnder(f.context.filesDir)).toEqual([]);
    expect(await f.db.selectFrom('files').selectAll().execute()).toEqual([]);
  });

  it('stay while another work, or another studio, shows the same picture', async () => {
    const f = await studioFixture();
    const first = await insertWork(f.db, f.studioA, 'A-1');
    const second = await insertWork(f.db, f.studioA, 'A-2');
    const photo = await withPhoto(f, first, '#1133aa');
    await withPhoto(f, second, '#1133aa');
    const otherStudioWork = await insertWork(f.db, f.studioB, 'B-1');
    const otherUpload = await request(f.app)
      .post(`/api/works/${otherStudioWork}/photos`)
      .set('Cookie', await f.cookie('otherOwner'))
      .attach('photos', await picture(300, 300, '#1133aa'), 'p.png');
    expect(otherUpload.status).toBe(201);

    await request(f.app)
      .delete(`/api/works/${first}/photos/${photo}`)
      .set('Cookie', await f.cookie('owner'))
      .expect(200);
    expect(filesUnder(f.context.filesDir)).toHaveLength(3);

    await request(f.app)
      .delete(`/api/works/${second}`)
      .set('Cookie', await f.cookie('owner'))
      .expect(204);
    // Studio A has no use for it now; studio B's upload of the same picture keeps the bytes.
    const rows = await f.db.selectFrom('files').select('studio_id').execute();
    expect(rows).toEqual([{ studio_id: f.studioB }]);
    expect(filesUnder(f.context.filesDir)).toHaveLength(3);
  });

  it('are removed when a work with photos is deleted', async () => {
    const f = await studioFixture();
    const work = await insertWork(f.db, f.studioA, 'A-1');
    await withPhoto(f, work, '#22aa44');
    await withPhoto(f, work, '#44aa22');
    expect(filesUnder(f.context.filesDir)).toHaveLength(6);
    await request(f.app)
      .delete(`/api/works/${work}`)
      .set('Cookie', await f.cookie('owner'))
      .expect(204);
    expect(filesUnder(f.context.filesDir)).toEqual([]);
  });
});

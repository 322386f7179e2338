import { createHash } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';

import sharp from 'sharp';
import request from 'supertest';

import { filesUnder } from '../../../scripts/lib/files';
import { picture } from '../helpers/pictures';
import {
  addConsignment,
  type Fixture,
  insertLine,
  insertWork,
  studioFixture,
} from '../helpers/studio-fixture';

const as = async (f: Fixture, who: Parameters<Fixture['cookie']>[0] = 'owner') => ({
  Cookie: await f.cookie(who),
});

const sha256 = (data: Buffer) => createHash('sha256').update(data).digest('hex');

async function upload(
  f: Fixture,
  workId: number,
  files: { data: Buffer; name: string; type?: string }[],
  who: Parameters<Fixture['cookie']>[0] = 'owner',
) {
  let req = request(f.app)
    .post(`/api/works/${workId}/photos`)
    .set(await as(f, who));
  for (const file of files) {
    req = req.attach('photos', file.data, {
      filename: file.name,
      contentType: file.type ?? 'image/jpeg',
    });
  }
  return req;
}

describe('POST /api/works/:id/photos', () => {
  it('stores several photos by content hash, once, with thumbnails, and answers the photos', async () => {
    const f = await studioFixture();
    const work = await insertWork(f.db, f.studioA, 'A-1');
    const other = await insertWork(f.db, f.studioA, 'A-2');
    const red = await picture(800, 600, '#b03a2e');
    const blue = await picture(300, 900, '#1f4e79', 'png');

    const res = await upload(f, work, [
      { data: red, name: 'red.jpg' },
      // The declared type is wrong; the content decides.
      { data: blue, name: 'blue.jpg', type: 'image/jpeg' },
    ]);
    expect(res.status).toBe(201);
    const [first, second] = res.body;
    expect(res.body).toEqual([
      {
        id: expect.any(Number),
        position: 0,
        url: `/api/photos/${first.id}`,
        thumbnailUrl: `/api/photos/${first.id}/thumbnail`,
        widthPx: 800,
        heightPx: 600,
      },
      {
        id: expect.any(Number),
        position: 1,
        url: `/api/photos/${second.id}`,
        thumbnailUrl: `/api/photos/${second.id}/thumbnail`,
        widthPx: 300,
        heightPx: 900,
      },
    ]);

    // The same picture again, on another work: one file row and one original on disk.
    const again = await upload(f, other, [{ data: red, name: 'copy.jpg' }]);
    expect(again.status).toBe(201);
    const files = await f.db
      .selectFrom('files')
      .select(['sha256', 'mime_type', 'byte_size'])
      .orderBy('id')
      .execute();
    expect(files).toEqual([
      { sha256: sha256(red), mime_type: 'image/jpeg', byte_size: red.length },
      { sha256: sha256(blue), mime_type: 'image/png', byte_size: blue.length },
    ]);
    const originals = filesUnder(path.join(f.context.filesDir, 'originals'));
    expect(originals.map((p) => path.basename(p)).sort()).toEqual(
      [sha256(red), sha256(blue)].sort(),
    );
    expect(fs.readFileSync(originals.find((p) => p.endsWith(sha256(red)))!)).toEqual(red);

    // What is served is a rendition, read back with sharp: the picture at its own size.
    const original = await request(f.app)
      .get(first.url)
      .set(await as(f, 'assistant'));
    expect(original.status).toBe(200);
    expect(original.headers['content-type']).toBe('image/webp');
    expect(original.headers['cache-control']).toBe('private, max-age=31536000, immutable');
    const shown = await sharp(original.body as Buffer).metadata();
    expect([shown.format, shown.width, shown.height]).toEqual(['webp', 800, 600]);

    // Checked with sharp, the reference decoder: a 480 px square WebP.
    const thumb = await request(f.app)
      .get(second.thumbnailUrl)
      .set(await as(f));
    expect(thumb.status).toBe(200);
    expect(thumb.headers['content-type']).toBe('image/webp');
    const meta = await sharp(thumb.body as Buffer).metadata();
    expect([meta.format, meta.width, meta.height]).toEqual(['webp', 480, 480]);

    const cached = await request(f.app)
      .get(first.url)
      .set(await as(f))
      .set('If-None-Match', original.headers.etag!);
    expect(cached.status).toBe(304);
  });

  it('refuses a file that is not really an image with 400, storing nothing', async () => {
    const f = await studioFixture();
    const work = await insertWork(f.db, f.studioA, 'A-1');
    const good = await picture(100, 100, '#888888');
    const res = await upload(f, work, [
      { data: good, name: 'good.jpg' },
      { data: Buffer.from('this is a letter, not a photo'), name: 'pot.jpg', type: 'image/jpeg' },
    ]);
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: {
        code: 'invalid_request',
        message:
          '“pot.jpg” is not a photo we can read. Upload JPEG, PNG, WebP, GIF, AVIF or TIFF images.',
      },
    });
    expect(await f.db.selectFrom('work_photos').select('id').execute()).toEqual([]);
    expect(filesUnder(f.context.filesDir)).toEqual([]);
  });

  it('refuses a truncated picture and an SVG, whose content sharp reads but the product does not take', async () => {
    const f = await studioFixture();
    const work = await insertWork(f.db, f.studioA, 'A-1');
    const jpeg = await sharp({
      create: { width: 400, height: 400, channels: 3, background: '#123456' },
    })
      .jpeg()
      .toBuffer();
    const truncated = await upload(f, work, [
      { data: jpeg.subarray(0, jpeg.length / 2), name: 'half.jpg' },
    ]);
    expect(truncated.status).toBe(400);
    const svg = Buffer.from(
      '<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><script>alert(1)</script></svg>',
    );
    const vector = await upload(f, work, [{ data: svg, name: 'logo.svg', type: 'image/svg+xml' }]);
    expect(vector.status).toBe(400);
    expect(vector.body.error.message).toContain('logo.svg');
  });

  it('refuses a file over 15 MB with 413 in the error shape', async () => {
    const f = await studioFixture();
    const work = await insertWork(f.db, f.studioA, 'A-1');
    const res = await upload(f, work, [
      { data: Buffer.alloc(15 * 1024 * 1024 + 1, 1), name: 'huge.jpg' },
    ]);
    expect(res.status).toBe(413);
    expect(res.body).toEqual({
      error: { code: 'payload_too_large', message: 'Each photo must be 15 MB or smaller.' },
    });
  });

  it('answers 400 with no file, 404 for another studio’s work, 403 to the venue', async () => {
    const f = await studioFixture();
    const work = await insertWork(f.db, f.studioA, 'A-1');
    const none = await request(f.app)
      .post(`/api/works/${work}/photos`)
      .set(await as(f))
      .field('note', 'x');
    expect(none.status).toBe(400);
    expect(none.body).toEqual({
      error: { code: 'invalid_request', message: 'Choose at least one photo to upload.' },
    });
    const data = await picture(50, 50, '#ffffff');
    const other = await insertWork(f.db, f.studioB, 'B-1');
    const res = await upload(f, other, [{ data, name: 'a.jpg' }]);
    expect(res.status).toBe(404);
    expect(res.body).toEqual({ error: { code: 'not_found', message: 'That work was not found.' } });
    const venue = await upload(f, work, [{ data, name: 'a.jpg' }], 'gallery');
    expect(venue.status).toBe(403);
    expect(await f.db.selectFrom('files').select('id').execute()).toEqual([]);
  });
});

async function workWithPhotos(f: Fixture, stock = 'A-1') {
  const work = await insertWork(f.db, f.studioA, stock);
  const res = await upload(f, work, [
    { data: await picture(60, 60, '#ff0000'), name: '1.jpg' },
    { data: await picture(60, 60, '#00ff00'), name: '2.jpg' },
    { data: await picture(60, 60, '#0000ff'), name: '3.jpg' },
  ]);
  return { work, ids: (res.body as { id: number }[]).map((p) => p.id) };
}

describe('PUT /api/works/:id/photos/order', () => {
  it('puts the photos in the order given; the first is the cover', async () => {
    const f = await studioFixture();
    const { work, ids } = await workWithPhotos(f);
    const order = [ids[2]!, ids[0]!, ids[1]!];
    const res = await request(f.app)
      .put(`/api/works/${work}/photos/order`)
      .set(await as(f, 'assistant'))
      .send({ photoIds: order });
    expect(res.status).toBe(200);
    expect(res.body.map((p: { id: number; position: number }) => [p.id, p.position])).toEqual([
      [order[0], 0],
      [order[1], 1],
      [order[2], 2],
    ]);
    const detail = await request(f.app)
      .get(`/api/works/${work}`)
      .set(await as(f));
    expect(detail.body.photos.map((p: { id: number }) => p.id)).toEqual(order);
  });

  it('answers 400 unless the list holds exactly the work’s photos', async () => {
    const f = await studioFixture();
    const { work, ids } = await workWithPhotos(f);
    const { ids: others } = await workWithPhotos(f, 'A-2');
    const message = 'List each of this work’s photos once, cover first.';
    for (const photoIds of [
      [ids[0]!, ids[1]!],
      [...ids, others[0]!],
      [ids[0]!, ids[0]!, ids[1]!],
    ]) {
      const res = await request(f.app)
        .put(`/api/works/${work}/photos/order`)
        .set(await as(f))
        .send({ photoIds });
      expect(res.status).toBe(400);
      expect(res.body).toEqual({
        error: { code: 'invalid_request', message, issues: [{ path: ['photoIds'], message }] },
      });
    }
    const empty = await request(f.app)
      .put(`/api/works/${work}/photos/order`)
      .set(await as(f))
      .send({ photoIds: [] });
    expect(empty.body.error.issues).toEqual([
      { path: ['photoIds'], message: 'List at least one photo.' },
    ]);
  });

  it('answers 404 for another studio’s work and 403 to the venue', async () => {
    const f = await studioFixture();
    const other = await insertWork(f.db, f.studioB, 'B-1');
    const res = await request(f.app)
      .put(`/api/works/${other}/photos/order`)
      .set(await as(f))
      .send({ photoIds: [1] });
    expect(res.status).toBe(404);
    const venue = await request(f.app)
      .put(`/api/works/${other}/photos/order`)
      .set(await as(f, 'gallery'))
      .send({ photoIds: [1] });
    expect(venue.status).toBe(403);
  });
});

describe('DELETE /api/works/:id/photos/:photoId', () => {
  it('removes the photo and closes the gap, so the next one becomes the cover', async () => {
    const f = await studioFixture();
    const { work, ids } = await workWithPhotos(f);
    const res = await request(f.app)
      .delete(`/api/works/${work}/photos/${ids[0]}`)
      .set(await as(f));
    expect(res.status).toBe(200);
    expect(res.body.map((p: { id: number; position: number }) => [p.id, p.position])).toEqual([
      [ids[1], 0],
      [ids[2], 1],
    ]);
    const gone = await request(f.app)
      .get(`/api/photos/${ids[0]}`)
      .set(await as(f));
    expect(gone.status).toBe(404);
  });

  it('answers 404 for a photo of another work or studio, 400 for a bad id, 403 to the venue', async () => {
    const f = await studioFixture();
    const { work } = await workWithPhotos(f);
    const { ids: others } = await workWithPhotos(f, 'A-2');
    const res = await request(f.app)
      .delete(`/api/works/${work}/photos/${others[0]}`)
      .set(await as(f));
    expect(res.status).toBe(404);
    expect(res.body).toEqual({
      error: { code: 'not_found', message: 'That photo was not found.' },
    });
    const otherStudio = await request(f.app)
      .delete(`/api/works/${work}/photos/${others[0]}`)
      .set(await as(f, 'otherOwner'));
    expect(otherStudio.status).toBe(404);
    const bad = await request(f.app)
      .delete(`/api/works/${work}/photos/first`)
      .set(await as(f));
    expect(bad.status).toBe(400);
    const venue = await request(f.app)
      .delete(`/api/works/${work}/photos/${others[0]}`)
      .set(await as(f, 'gallery'));
    expect(venue.status).toBe(403);
  });
});

describe('GET /api/photos/:photoId', () => {
  it('never serves the metadata a camera wrote, such as where the picture was taken', async () => {
    const f = await studioFixture();
    const work = await insertWork(f.db, f.studioA, 'A-9');
    // sharp writes the EXIF block and reads it back: the reference for what a file carries.
    const tagged = await sharp({
      create: { width: 640, height: 480, channels: 3, background: '#777' },
    })
      .jpeg()
      .withExif({ IFD0: { Artist: 'Studio camera', ImageDescription: 'Taken at home' } })
      .toBuffer();
    expect((await sharp(tagged).metadata()).exif).toBeDefined();
    const res = await upload(f, work, [{ data: tagged, name: 'tagged.jpg' }]);
    expect(res.status).toBe(201);
    for (const url of [res.body[0].url, res.body[0].thumbnailUrl]) {
      const served = await request(f.app)
        .get(url)
        .set(await as(f));
      expect(served.status).toBe(200);
      const meta = await sharp(served.body as Buffer).metadata();
      expect(meta.exif).toBeUndefined();
      expect(Buffer.from(served.body).includes('Taken at home')).toBe(false);
    }
  });

  it('serves a venue’s staff the photos of works their venue holds, and no others', async () => {
    const f = await studioFixture();
    const { work, ids } = await workWithPhotos(f);
    const { ids: kept } = await workWithPhotos(f, 'A-2');
    await insertLine(f.db, f.studioA, await addConsignment(f.db, f.studioA, f.venueA, 'S-1'), work);
    const cookie = await as(f, 'gallery');
    const shown = await request(f.app).get(`/api/photos/${ids[0]}`).set(cookie);
    expect(shown.status).toBe(200);
    expect(shown.headers['content-type']).toBe('image/webp');
    const hidden = await request(f.app).get(`/api/photos/${kept[0]}`).set(cookie);
    expect(hidden.status).toBe(404);
    expect(hidden.body).toEqual({
      error: { code: 'not_found', message: 'That photo was not found.' },
    });
    expect(hidden.headers['cache-control'] ?? '').not.toContain('immutable');
  });

  it('does not show a venue’s staff the photos of a work the maker has only put on a draft', async () => {
    const f = await studioFixture();
    const { work, ids } = await workWithPhotos(f);
    const draft = await addConsignment(f.db, f.studioA, f.venueA, 'DRAFT', 'draft');
    await insertLine(f.db, f.studioA, draft, work);
    const res = await request(f.app)
      .get(`/api/photos/${ids[0]}`)
      .set(await as(f, 'gallery'));
    expect(res.status).toBe(404);
  });

  it('answers 404 to another studio and 400 for a bad id', async () => {
    const f = await studioFixture();
    const { ids } = await workWithPhotos(f);
    const res = await request(f.app)
      .get(`/api/photos/${ids[0]}`)
      .set(await as(f, 'otherOwner'));
    expect(res.status).toBe(404);
    const bad = await request(f.app)
      .get('/api/photos/x')
      .set(await as(f));
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues).toEqual([
      { path: ['photoId'], message: 'The photo id must be a number.' },
    ]);
  });
});

describe('GET /api/photos/:photoId/thumbnail', () => {
  it('serves the square thumbnail to the venue holding the work, 404 to another studio', async () => {
    const f = await studioFixture();
    const { work, ids } = await workWithPhotos(f);
    await insertLine(f.db, f.studioA, await addConsignment(f.db, f.studioA, f.venueA, 'S-1'), work);
    const res = await request(f.app)
      .get(`/api/photos/${ids[1]}/thumbnail`)
      .set(await as(f, 'gallery'));
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('image/webp');
    const meta = await sharp(res.body as Buffer).metadata();
    expect([meta.width, meta.height]).toEqual([480, 480]);
    const other = await request(f.app)
      .get(`/api/photos/${ids[1]}/thumbnail`)
      .set(await as(f, 'otherOwner'));
    expect(other.status).toBe(404);
  });
});

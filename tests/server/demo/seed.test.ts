import { createHash } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import { checkVAT, countries } from 'jsvat';
import sharp from 'sharp';
import request from 'supertest';

import { demoSignIns, demoWorks } from '@/server/demo/demo-studio';
import { picturePx, renderVesselPicture } from '@/server/demo/pictures/vessel-picture';
import { clearAllData, isEmpty, seedDemoIfEmpty } from '@/server/demo/seed';
import { photoStore } from '@/server/photos/photo-store';
import { termsSchema } from '@/shared/schemas/terms';
import { venueCreateSchema } from '@/shared/schemas/venue';

import { filesUnder } from '../../../scripts/lib/files';
import { createTestApp } from '../helpers/test-app';

type TestApp = Awaited<ReturnType<typeof createTestApp>>;

// Seeding draws and stores about forty photographs: one seeded app serves the read-only checks.
const seedTimeout = 120_000;
let seeded: TestApp;

beforeAll(async () => {
  seeded = await createTestApp();
  await seedDemoIfEmpty(seeded.db, { filesDir: seeded.context.filesDir });
}, seedTimeout);

afterAll(async () => {
  await seeded.db.destroy();
  fs.rmSync(seeded.context.filesDir, { recursive: true, force: true });
});

async function rowCounts(db: TestApp['db']) {
  const tables = [
    'users',
    'studios',
    'venues',
    'works',
    'files',
    'work_photos',
    'consignments',
  ] as const;
  const counts: Record<string, number> = {};
  for (const table of tables) {
    const { n } = await db
      .selectFrom(table)
      .select((e) => e.fn.countAll().as('n'))
      .executeTakeFirstOrThrow();
    counts[table] = Number(n);
  }
  return counts;
}

async function photosByWork(db: TestApp['db']) {
  return db
    .selectFrom('work_photos')
    .innerJoin('works', 'works.id', 'work_photos.work_id')
    .innerJoin('files', 'files.id', 'work_photos.file_id')
    .select([
      'works.title',
      'works.glaze',
      'work_photos.position',
      'files.sha256',
      'files.mime_type',
      'files.width_px',
      'files.height_px',
      'files.byte_size',
    ])
    .orderBy('works.id')
    .orderBy('work_photos.position')
    .execute();
}

async function signInAs(app: TestApp['app'], email: string): Promise<string> {
  const res = await request(app)
    .post('/api/auth/sign-in/email')
    .send({ email, password: demoSignIns.password });
  expect(res.status).toBe(200);
  return ([] as string[])
    .concat(res.headers['set-cookie'] ?? [])
    .map((c) => c.split(';')[0])
    .join('; ');
}

describe('the demo seed', () => {
  it('seeds the scenario into an empty database', async () => {
    const works = await seeded.db.selectFrom('works').select(['weight_g']).execute();
    expect(works).toHaveLength(30);
    // Handling guideline 16 kg, UK HSE INDG143: the demo carries at least one piece above it.
    expect(works.some((w) => (w.weight_g ?? 0) > 16_000)).toBe(true);
  });

  it('does nothing to a database that holds data: no rows, no files', async () => {
    const { db, context } = seeded;
    const rowsBefore = await rowCounts(db);
    const filesBefore = filesUnder(context.filesDir);
    expect(await seedDemoIfEmpty(db, { filesDir: context.filesDir })).toBe(false);
    expect(await rowCounts(db)).toEqual(rowsBefore);
    expect(filesUnder(context.filesDir)).toEqual(filesBefore);
  });

  it('has the three venues with their terms, each valid against the Terms schema', async () => {
    const venues = await seeded.db.selectFrom('venues').select(['kind', 'default_terms']).execute();
    const terms = venues.map((v) => ({
      kind: v.kind,
      ...termsSchema.parse(JSON.parse(v.default_terms)),
    }));
    expect(terms.map((t) => [t.kind, t.commissionRateBp, t.commissionVat])).toEqual([
      ['gallery', 4000, 'added'],
      ['shop', 3500, 'none'],
      ['fair', 3000, 'included'],
    ]);
  });

  it('gives the VAT-registered gallery a VAT number that passes the venue form’s check', async () => {
    const venues = await seeded.db
      .selectFrom('venues')
      .select(['name', 'vat_number', 'default_terms'])
      .execute();
    const registered = venues.filter(
      (v) => termsSchema.parse(JSON.parse(v.default_terms)).commissionVat === 'added',
    );
    expect(registered.map((v) => v.name)).toEqual(['The Lanthorn Gallery']);
    const vatNumber = registered[0]!.vat_number!;
    // Reference: the jsvat package's check of GB check digits (HMRC's modulus 97 and 9755 rules).
    expect(checkVAT(vatNumber, countries).isValid).toBe(true);
    // Stored as the venue form would store it: no spaces, capitals.
    const parsed = venueCreateSchema.parse({
      name: 'The Lanthorn Gallery',
      kind: 'gallery',
      vatNumber: vatNumber.replace(/^(..)(...)(....)/, '$1 $2 $3 ').toLowerCase(),
    });
    expect(parsed.vatNumber).toBe(vatNumber);
  });

  it('has two consignments on show, one with two sales, one past its closing date with pieces out', async () => {
    const { db } = seeded;
    const consignments = await db
      .selectFrom('consignments')
      .select(['id', 'state', 'closing_date'])
      .orderBy('id')
      .execute();
    expect(consignments.map((c) => c.state)).toEqual(['on-show', 'on-show']);
    expect(consignments[1]!.closing_date! < new Date().toISOString().slice(0, 10)).toBe(true);
    const lines = await db
      .selectFrom('consignment_lines')
      .select(['consignment_id', 'state'])
      .execute();
    const onShowSold = lines.filter(
      (l) => l.consignment_id === consignments[0]!.id && l.state === 'sold',
    );
    expect(onShowSold).toHaveLength(2);
    const closedUnresolved = lines.filter(
      (l) => l.consignment_id === consignments[1]!.id && l.state === 'consigned',
    );
    expect(closedUnresolved.length).toBeGreaterThan(0);
  });

  it('holds each work still out, and checked each piece at dispatch and on arrival', async () => {
    const { db } = seeded;
    const lines = await db
      .selectFrom('consignment_lines')
      .select(['id', 'state', 'holds_work'])
      .execute();
    for (const line of lines) expect(line.holds_work).toBe(line.state === 'consigned' ? 1 : null);
    const reports = await db
      .selectFrom('condition_reports')
      .select(['consignment_line_id', 'stage'])
      .execute();
    for (const line of lines) {
      const stages = reports.filter((r) => r.consignment_line_id === line.id).map((r) => r.stage);
      expect(stages.sort()).toEqual(['arrival', 'dispatch']);
    }
  });

  it('lets every demo person sign in with the demo password', async () => {
    for (const person of demoSignIns.people) await signInAs(seeded.app, person.email);
  });
});

describe('the demo photographs', () => {
  it('gives every work one or two photos, numbered from the cover', async () => {
    const photos = await photosByWork(seeded.db);
    for (const work of demoWorks) {
      const own = photos.filter((p) => p.title === work.title);
      expect([1, 2]).toContain(own.length);
      expect(own.map((p) => p.position)).toEqual(own.map((_, i) => i));
    }
    expect(photos.filter((p) => p.position === 1).length).toBeGreaterThan(0);
  });

  it('stores each one as an upload is stored: a real image on disk with its renditions', async () => {
    const store = photoStore(seeded.context.filesDir);
    const photos = await photosByWork(seeded.db);
    for (const photo of photos) {
      const original = fs.readFileSync(store.originalPath(photo.sha256));
      expect(createHash('sha256').update(original).digest('hex')).toBe(photo.sha256);
      expect(original.length).toBe(photo.byte_size);
      // Decoding every pixel (stats) proves a whole picture, not just a header.
      const { width, height, format } = await sharp(original).metadata();
      expect(`${format} ${width}×${height}`).toBe(`jpeg ${picturePx}×${picturePx}`);
      expect([photo.mime_type, photo.width_px, photo.height_px]).toEqual([
        'image/jpeg',
        picturePx,
        picturePx,
      ]);
      const { isOpaque, channels } = await sharp(original).stats();
      expect(isOpaque).toBe(true);
      // A drawn picture, not a blank: its colours vary.
      expect(Math.max(...channels.map((c) => c.stdev))).toBeGreaterThan(10);
      for (const rendition of [
        store.thumbnailPath(photo.sha256),
        store.displayPath(photo.sha256),
      ]) {
        expect((await sharp(rendition).metadata()).format).toBe('webp');
      }
    }
  });

  it('draws different pictures for different works, in the colours of their glazes', async () => {
    const photos = await photosByWork(seeded.db);
    expect(new Set(photos.map((p) => p.sha256)).size).toBe(photos.length);

    const store = photoStore(seeded.context.filesDir);
    // The middle of the picture is the pot itself: compare its average colour.
    const middleOf = async (title: string) => {
      const cover = photos.find((p) => p.title === title && p.position === 0)!;
      const region = { left: 500, top: 560, width: 200, height: 150 };
      const middle = await sharp(store.originalPath(cover.sha256)).extract(region).toBuffer();
      const { channels } = await sharp(middle).stats();
      const [r, g, b] = channels.map((c) => c.mean) as [number, number, number];
      return { r, g, b, light: (r + g + b) / 3 };
    };
    const tenmoku = await middleOf('Tenmoku tea bowl');
    const yingChing = await middleOf('Tea bowl, ying-ching');
    const celadon = await middleOf('Moon jar, pale celadon');
    const copper = await middleOf('Butter dish, copper green');
    expect(tenmoku.light).toBeLessThan(80);
    expect(yingChing.light).toBeGreaterThan(tenmoku.light + 80);
    expect(celadon.g).toBeGreaterThan(celadon.r);
    expect(copper.g).toBeGreaterThan(copper.r + 30);
  });

  it('serves them like uploads: to the studio, and to the gallery for the works it holds', async () => {
    const owner = await signInAs(seeded.app, demoSignIns.people[0].email);
    const list = await request(seeded.app)
      .get('/api/works?pageSize=100')
      .set('Cookie', owner)
      .expect(200);
    expect(list.body.items).toHaveLength(30);
    for (const work of list.body.items) expect([1, 2]).toContain(work.photos.length);

    const moonJar = list.body.items.find(
      (w: { title: string }) => w.title === 'Moon jar, pale celadon',
    );
    expect(moonJar.venue.name).toBe('The Lanthorn Gallery');
    const gallery = await signInAs(seeded.app, demoSignIns.people[2].email);
    const thumbnail = await request(seeded.app)
      .get(moonJar.photos[0].thumbnailUrl)
      .set('Cookie', gallery)
      .expect(200);
    expect(thumbnail.headers['content-type']).toBe('image/webp');
    const meta = await sharp(thumbnail.body as Buffer).metadata();
    expect([meta.width, meta.height]).toEqual([480, 480]);
  });

  it('renders the same bytes for the same work', async () => {
    const work = demoWorks[0]!;
    const first = await renderVesselPicture(work, 'front');
    expect(first.equals(await renderVesselPicture(work, 'front'))).toBe(true);
  });
});

// Runs last: it empties the shared database.
describe('seeding again', () => {
  it(
    'can be cleared and seeded again (npm run seed -- --reset), reusing the stored files',
    async () => {
      const { db, context } = seeded;
      const files = filesUnder(context.filesDir);
      await clearAllData(db);
      expect(await seedDemoIfEmpty(db, { filesDir: context.filesDir })).toBe(true);
      const counts = await rowCounts(db);
      // Three files a photo: the original and its two renditions.
      expect([counts.works, counts.files! * 3]).toEqual([30, files.length]);
      expect(filesUnder(context.filesDir)).toEqual(files);
    },
    seedTimeout,
  );

  it(
    'leaves the database empty when the photos cannot be stored',
    async () => {
      const { db } = await createTestApp();
      // A plain file where the folder should be: nothing can be written under it.
      const notAFolder = path.join(os.tmpdir(), `saggar-not-a-folder-${process.pid}`);
      fs.writeFileSync(notAFolder, '');
      try {
        await expect(seedDemoIfEmpty(db, { filesDir: notAFolder })).rejects.toThrow();
        expect(await isEmpty(db)).toBe(true);
      } finally {
        fs.rmSync(notAFolder);
      }
    },
    seedTimeout,
  );
});

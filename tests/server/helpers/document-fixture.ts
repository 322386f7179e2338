import request from 'supertest';

import { as, consignmentFixture, draftWith, insertWork, soundCheck } from './consignment-fixture';
import { picture } from './pictures';

/** Where the test app says it lives, so links and QR codes can be checked whole. */
export const testAppUrl = 'https://saggar.test';

type FixtureOptions = Parameters<typeof consignmentFixture>[0] & {
  /** The venue's e-mail instead of the consignment fixture's desk@gallery-a.example. */
  venueEmail?: string | null;
};

/** The dispatch finding on the tall bottle, with its photograph. */
export const bottleChip = {
  kind: 'chip',
  grade: 'slight',
  location: 'foot ring',
  sizeMm: 3,
  notes: 'Old chip, smoothed.',
} as const;

/**
 * The consignment fixture's three works made into pieces a document has something to say about,
 * and a fourth over the 16 kg handling guideline (docs/cautions.md):
 * - A-1 Moon jar, £100, porcelain, declared food-safe, with a care note and a photograph;
 * - A-2 Tall bottle, £240, decorative;
 * - A-3 Tea bowl, £480, food use not stated;
 * - A-4 Garden urn, £950, 23.4 kg.
 */
export async function documentFixture(options: FixtureOptions = {}) {
  const { venueEmail, ...appOptions } = options;
  const f = await consignmentFixture({ appUrl: testAppUrl, ...appOptions });
  await f.db
    .updateTable('venues')
    .set({
      contact_name: 'Dora Finch',
      address_line1: '4 Quay Street',
      town: 'Porthleven',
      postcode: 'TR13 9JZ',
      ...(venueEmail === undefined ? {} : { email: venueEmail }),
    })
    .where('id', '=', f.venueA)
    .execute();
  const details = [
    {
      title: 'Moon jar',
      clay_body: 'Porcelain',
      glaze: 'Celadon',
      firing_temp_c: 1280,
      atmosphere: 'Reduction',
      height_mm: 290,
      width_mm: 300,
      depth_mm: 300,
      weight_g: 5_200,
      food_use: 'food-safe',
      care_notes: 'Hand wash only.',
    },
    { title: 'Tall bottle', clay_body: 'Stoneware', weight_g: 1_850, food_use: 'decorative' },
    { title: 'Tea bowl', clay_body: 'Crank', weight_g: 380, food_use: 'not-stated' },
  ] as const;
  for (const [i, values] of details.entries()) {
    await f.db.updateTable('works').set(values).where('id', '=', f.works[i]!).execute();
  }
  const urn = await insertWork(f.db, f.studioA, 'A-4', {
    title: 'Garden urn',
    clay_body: 'Buff stoneware',
    height_mm: 640,
    width_mm: 520,
    depth_mm: 520,
    weight_g: 23_400,
    retail_price: 95_000,
  });
  const works = [...f.works, urn];

  const owner = await f.cookie('owner');
  const photo = await request(f.app)
    .post(`/api/works/${works[0]}/photos`)
    .set('Cookie', owner)
    .attach('photos', await picture(640, 480, '#9db8a5'), {
      filename: 'moon-jar.jpg',
      contentType: 'image/jpeg',
    });
  if (photo.status !== 201) throw new Error(JSON.stringify(photo.body));

  const draft = await draftWith(f, works);
  return { ...f, works, draft };
}
export type DocumentFixture = Awaited<ReturnType<typeof documentFixture>>;

/** Agrees the draft and checks each piece for dispatch; the tall bottle has a photographed chip. */
export async function readyToSend(f: DocumentFixture) {
  const owner = as(f, 'owner');
  const agreed = await owner.post(`/api/consignments/${f.draft.id}/agree`);
  if (agreed.status !== 200) throw new Error(JSON.stringify(agreed.body));
  const upload = await request(f.app)
    .post('/api/condition-photos')
    .set('Cookie', await f.cookie('owner'))
    .attach('photo', await picture(600, 400, '#a05030'), 'chip.jpg');
  if (upload.status !== 201) throw new Error(JSON.stringify(upload.body));
  for (const [i, line] of f.draft.lines.entries()) {
    const checked = await owner.post(`/api/consignment-lines/${line.id}/condition-reports`, {
      stage: 'dispatch',
      ...soundCheck,
      findings: i === 1 ? [{ ...bottleChip, photoFileId: upload.body.fileId }] : [],
    });
    if (checked.status !== 201) throw new Error(JSON.stringify(checked.body));
  }
}

/** The fixture, agreed, checked and sent. */
export async function sentDocumentFixture(options: FixtureOptions = {}) {
  const f = await documentFixture(options);
  await readyToSend(f);
  const sent = await as(f, 'owner').post(`/api/consignments/${f.draft.id}/dispatch`);
  if (sent.status !== 200) throw new Error(JSON.stringify(sent.body));
  return f;
}

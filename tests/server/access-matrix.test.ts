import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import { sql } from 'kysely';
import Stripe from 'stripe';
import request from 'supertest';

import { isoDateInTimeZone } from '@/shared/money';

import {
  as,
  consignmentFixture,
  dispatchedWith,
  draftWith,
  galleryTerms,
  soundCheck,
} from './helpers/consignment-fixture';
import { mountedRoutes } from './helpers/mounted-routes';
import { startTestPayments } from './helpers/payments';
import { picture } from './helpers/pictures';
import { protectedRoutes, publicRoutes } from './helpers/routes';
import { insertWork } from './helpers/studio-fixture';
import { addPerson, addVenue, createTestApp, password, signIn } from './helpers/test-app';
import { copyTestDatabase, releaseTestDatabase, testDatabaseKind } from './helpers/test-database';

/**
 * Every route of the product against every kind of person, each called with the real ids of one
 * fixture and, where the person may act, a body that is valid: a 2xx proves the person got
 * through and the route did its work; 401, 403 and 404 prove they did not.
 *
 * The people, in the order of each row's statuses:
 * - none: no session;
 * - owner, assistant: studio A's own roles;
 * - gallery: the staff of venue A, where the consignment went;
 * - otherVenue: the staff of venue A2, another venue of studio A;
 * - otherStudio: the staff of venue B, a venue of studio B.
 *
 * The fixture is built once into a database file and a files folder; each call that may change
 * something runs against a fresh copy of both, so no row depends on another's order. The
 * sign-in sessions are in the copy, so the cookies are made once.
 */
const people = ['none', 'owner', 'assistant', 'gallery', 'otherVenue', 'otherStudio'] as const;
type Person = (typeof people)[number];
const signedIn = people.filter((p) => p !== 'none') as Exclude<Person, 'none'>[];
type Statuses = [number, number, number, number, number, number];

const emails: Record<Exclude<Person, 'none'>, string> = {
  owner: 'owner-a@example.test',
  assistant: 'assistant-a@example.test',
  gallery: 'gallery-a@example.test',
  otherVenue: 'gallery-a2@example.test',
  otherStudio: 'gallery-b@example.test',
};

type Call = {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  path: string;
  body?: object;
  /** A picture sent as multipart form data under this field. */
  attach?: string;
  /** A payment provider's event, sent as raw JSON signed with the stand-in's secret. */
  webhook?: string;
};

const ignoredEvent = JSON.stringify({
  id: 'evt_test_access_matrix',
  object: 'event',
  api_version: null,
  created: 1_790_000_000,
  data: { object: { id: 'pi_test_other', object: 'payment_intent' } },
  livemode: false,
  pending_webhooks: 1,
  request: { id: null, idempotency_key: null },
  type: 'payment_intent.succeeded',
});
// The SDK's own helper signs as the provider would.
const sdk = new Stripe('sk_test_reference_only');

const gbp = (amount: number) => ({ amount, currency: 'GBP' });

async function buildFixture(dir: string) {
  const f = await consignmentFixture({
    dbFile: path.join(dir, 'saggar.db'),
    filesDir: path.join(dir, 'files'),
  });
  const owner = as(f, 'owner');
  const venueA2 = await addVenue(f.db, f.studioA, 'Second venue of A');
  await addPerson(f.db, emails.otherVenue, [
    { studioId: f.studioA, role: 'gallery', venueId: venueA2 },
  ]);
  await addPerson(f.db, emails.otherStudio, [
    { studioId: f.studioB, role: 'gallery', venueId: f.venueB },
  ]);
  const upload = async (url: string, field: string) => {
    const res = await request(f.app)
      .post(url)
      .set('Cookie', await f.cookie('owner'))
      .attach(field, await picture(320, 240, '#8a6d4f'), 'piece.jpg');
    if (res.status !== 201) throw new Error(`${url}: ${JSON.stringify(res.body)}`);
    return res.body;
  };

  // The consignment sent to venue A: three pieces, the first with its photo and a chip
  // photographed at dispatch; the third sold by the venue.
  const [w1, w2, w3] = f.works as [number, number, number];
  const [cover] = await upload(`/api/works/${w1}/photos`, 'photos');
  const sent = await draftWith(f, [w1, w2, w3]);
  await owner.post(`/api/consignments/${sent.id}/agree`);
  const chip = await upload('/api/condition-photos', 'photo');
  for (const [i, line] of sent.lines.entries()) {
    await owner.post(`/api/consignment-lines/${line.id}/condition-reports`, {
      stage: 'dispatch',
      ...soundCheck,
      findings: i === 0 ? [{ kind: 'chip', grade: 'slight', photoFileId: chip.fileId }] : [],
    });
  }
  const dispatched = await owner.post(`/api/consignments/${sent.id}/dispatch`);
  if (dispatched.status !== 200) throw new Error(JSON.stringify(dispatched.body));
  const today = isoDateInTimeZone(new Date(), 'Europe/London');
  const [lineOut, lineSpare, lineSold] = sent.lines.map((l) => l.id) as [number, number, number];
  const sold = await as(f, 'gallery').post(`/api/consignment-lines/${lineSold}/sale`, {
    soldOn: today,
    salePrice: { amount: 48_000, currency: 'GBP' },
  });
  if (sold.status !== 201) throw new Error(JSON.stringify(sold.body));

  // A draft with one piece, an agreed consignment ready to send, a free work with two photos,
  // an archived work.
  const draft = await draftWith(f, [await insertWork(f.db, f.studioA, 'A-4')], 'Spring show');
  const agreed = await draftWith(f, [await insertWork(f.db, f.studioA, 'A-5')], 'Fair');
  await owner.post(`/api/consignments/${agreed.id}/agree`);
  await owner.post(`/api/consignment-lines/${agreed.lines[0]!.id}/condition-reports`, {
    stage: 'dispatch',
    ...soundCheck,
  });
  const free = await insertWork(f.db, f.studioA, 'A-6');
  await upload(`/api/works/${free}/photos`, 'photos');
  await upload(`/api/works/${free}/photos`, 'photos');
  const freePhotos = (await owner.get(`/api/works/${free}`)).body.photos as { id: number }[];
  const archived = await insertWork(f.db, f.studioA, 'A-7', {
    archived_at: new Date().toISOString(),
  });

  // A show over: A-8 sold, A-9 back with a crack its dispatch check did not have (new damage),
  // closed, its statement issued. Another still open with A-10 sold: every piece accounted for,
  // so it may be closed, and its statement a draft.
  const gallery = as(f, 'gallery');
  const must = (res: { status: number; body: unknown }, what: string) => {
    if (res.status >= 300) throw new Error(`${what}: ${JSON.stringify(res.body)}`);
    return res.body as { id: number; lines: { id: number }[] };
  };
  const over = await dispatchedWith(f, [
    await insertWork(f.db, f.studioA, 'A-8'),
    await insertWork(f.db, f.studioA, 'A-9'),
  ]);
  const [overSold, overBack] = over.lines.map((l) => l.id) as [number, number];
  must(
    await gallery.post(`/api/consignment-lines/${overSold}/sale`, {
      soldOn: today,
      salePrice: gbp(10_000),
    }),
    'sale on the show over',
  );
  must(
    await gallery.post(`/api/consignment-lines/${overBack}/resolve`, {
      state: 'returned',
      on: today,
    }),
    'return',
  );
  must(
    await owner.post(`/api/consignment-lines/${overBack}/condition-reports`, {
      stage: 'return',
      ...soundCheck,
      examinedOn: today,
      findings: [{ kind: 'crack', grade: 'serious', location: 'foot ring' }],
    }),
    'return check',
  );
  must(await owner.post(`/api/consignments/${over.id}/close`), 'close');
  const issued = must(
    await owner.post('/api/statements', { consignmentId: over.id }),
    'statement of the show over',
  );
  must(await owner.post(`/api/statements/${issued.id}/issue`), 'issue');
  const ending = await dispatchedWith(f, [await insertWork(f.db, f.studioA, 'A-10')]);
  must(
    await gallery.post(`/api/consignment-lines/${ending.lines[0]!.id}/sale`, {
      soldOn: today,
      salePrice: gbp(9_000),
    }),
    'sale on the show ending',
  );
  const draftStatement = must(
    await owner.post('/api/statements', { consignmentId: ending.id }),
    'draft statement',
  );

  const dispatchMail = await f.db
    .selectFrom('outbox')
    .select(['id', 'text_body'])
    .where('kind', '=', 'consignment-dispatch')
    .executeTakeFirstOrThrow();
  const invitation = /\/invite\/([A-Za-z0-9_-]+)/.exec(dispatchMail.text_body)![1]!;
  // A link to choose a new password, for someone who is none of the people calling.
  await addPerson(f.db, 'forgetful@example.test', []);
  must(
    await request(f.app)
      .post('/api/auth/request-password-reset')
      .send({ email: 'forgetful@example.test' }),
    'password reset',
  );
  const resetMail = await f.db
    .selectFrom('outbox')
    .select('text_body')
    .where('kind', '=', 'password-reset')
    .executeTakeFirstOrThrow();
  const passwordReset = /\/reset-password\/([A-Za-z0-9_-]+)/.exec(resetMail.text_body)![1]!;

  const cookies: Record<Person, string | null> = {
    none: null,
    owner: await signIn(f.app, emails.owner),
    assistant: await signIn(f.app, emails.assistant),
    gallery: await signIn(f.app, emails.gallery),
    otherVenue: await signIn(f.app, emails.otherVenue),
    otherStudio: await signIn(f.app, emails.otherStudio),
  };
  const memberships = Object.fromEntries(
    await Promise.all(
      signedIn.map(async (p) => {
        const me = await request(f.app).get('/api/me').set('Cookie', cookies[p]!);
        return [p, me.body.activeMembershipId as number] as const;
      }),
    ),
  ) as Record<Exclude<Person, 'none'>, number>;

  // On SQLite, everything in the main file, so a copy of the folder is the whole fixture.
  if (testDatabaseKind === 'sqlite') await sql`pragma wal_checkpoint(truncate)`.execute(f.db);
  await f.db.destroy();
  return {
    cookies,
    memberships,
    today,
    venueA: f.venueA,
    works: { onShow: w1, free, archived },
    photos: { cover: cover.id as number, free: freePhotos.map((p) => p.id) },
    consignments: { sent: sent.id, draft: draft.id, agreed: agreed.id, ending: ending.id },
    lines: {
      out: lineOut,
      spare: lineSpare,
      sold: lineSold,
      draft: draft.lines[0]!.id,
      damaged: overBack,
    },
    statements: { issued: issued.id, draft: draftStatement.id },
    conditionPhoto: chip.fileId as number,
    dispatchMail: dispatchMail.id,
    invitation,
    passwordReset,
  };
}
type Ids = Awaited<ReturnType<typeof buildFixture>>;

const get = (path: string): Call => ({ method: 'get', path });
const post = (path: string, body: object = {}): Call => ({ method: 'post', path, body });

// Statuses for none, owner, assistant, gallery, otherVenue, otherStudio.
const everyone = (s: number): Statuses => [s, s, s, s, s, s];
const signedInOnly = (s: number): Statuses => [401, s, s, s, s, s];
const studioOnly = (s: number): Statuses => [401, s, s, 403, 403, 403];
const ownerOnly = (s: number): Statuses => [401, s, 403, 403, 403, 403];
/** The studio's roles and the staff of the venue that holds it; others are told it is not found. */
const studioAndItsVenue = (s: number): Statuses => [401, s, s, s, 404, 404];
/** The venue side: the studio's roles are refused, another venue's staff find nothing of A's. */
const venueSide = (s: number): Statuses => [401, 403, 403, s, 404, 404];
/** Each venue's staff get their own side; another venue's or studio's holds nothing of A's. */
const anyVenue = (s: number): Statuses => [401, 403, 403, s, s, s];

type Row = {
  route: string;
  label?: string;
  call: (ids: Ids, who: Person) => Call;
  expect: Statuses;
};

const matrix: Row[] = [
  { route: 'GET /api/health', call: () => get('/api/health'), expect: everyone(200) },
  {
    route: 'POST /api/auth/sign-in/email',
    call: () => post('/api/auth/sign-in/email', { email: emails.assistant, password }),
    expect: everyone(200),
  },
  {
    route: 'POST /api/auth/request-password-reset',
    call: () => post('/api/auth/request-password-reset', { email: 'forgetful@example.test' }),
    expect: everyone(202),
  },
  {
    route: 'GET /api/auth/reset-password/lookup',
    call: (x) => get(`/api/auth/reset-password/lookup?token=${x.passwordReset}`),
    expect: everyone(200),
  },
  {
    route: 'POST /api/auth/reset-password',
    call: (x) =>
      post('/api/auth/reset-password', { token: x.passwordReset, password: 'a new long password' }),
    expect: everyone(204),
  },
  {
    route: 'GET /api/invitations/lookup',
    call: (x) => get(`/api/invitations/lookup?token=${x.invitation}`),
    expect: everyone(200),
  },
  {
    route: 'POST /api/invitations/accept',
    call: (x) =>
      post('/api/invitations/accept', {
        token: x.invitation,
        name: 'Dora Finch',
        password: 'a long enough password',
      }),
    expect: everyone(200),
  },
  { route: 'GET /api/me', call: () => get('/api/me'), expect: signedInOnly(200) },
  {
    route: 'PUT /api/me/active-membership',
    call: (x, who) => ({
      method: 'put',
      path: '/api/me/active-membership',
      body: { membershipId: who === 'none' ? 1 : x.memberships[who] },
    }),
    expect: signedInOnly(200),
  },
  {
    route: 'POST /api/auth/sign-out',
    call: () => post('/api/auth/sign-out'),
    expect: signedInOnly(200),
  },
  { route: 'GET /api/overview', call: () => get('/api/overview'), expect: studioOnly(200) },
  {
    route: 'GET /api/venue/consignments',
    call: () => get('/api/venue/consignments'),
    expect: anyVenue(200),
  },
  {
    route: 'GET /api/venue/consignments/:id',
    call: (x) => get(`/api/venue/consignments/${x.consignments.sent}`),
    expect: venueSide(200),
  },
  {
    route: 'GET /api/venue/pieces',
    call: () => get('/api/venue/pieces?q=A'),
    expect: anyVenue(200),
  },
  {
    route: 'GET /api/venue/lines/:lineId',
    call: (x) => get(`/api/venue/lines/${x.lines.out}`),
    expect: venueSide(200),
  },
  {
    route: 'POST /api/quotes/split',
    call: () =>
      post('/api/quotes/split', {
        terms: galleryTerms,
        listPrice: gbp(10_000),
        salePrice: gbp(10_000),
      }),
    expect: studioOnly(200),
  },
  {
    route: 'POST /api/quotes/price-plan',
    call: () =>
      post('/api/quotes/price-plan', {
        terms: galleryTerms,
        wantedNet: gbp(6_000),
        step: gbp(500),
      }),
    expect: studioOnly(200),
  },
  { route: 'GET /api/works', call: () => get('/api/works'), expect: studioOnly(200) },
  { route: 'GET /api/works/facets', call: () => get('/api/works/facets'), expect: studioOnly(200) },
  {
    route: 'GET /api/works/export.csv',
    call: () => get('/api/works/export.csv'),
    expect: studioOnly(200),
  },
  {
    route: 'GET /api/works/import/template.csv',
    call: () => get('/api/works/import/template.csv'),
    expect: studioOnly(200),
  },
  {
    route: 'POST /api/works/import',
    call: () =>
      post('/api/works/import', {
        mode: 'commit',
        csv: 'Stock number,Title,Price\nM-1,Mug,20\n',
      }),
    expect: studioOnly(200),
  },
  {
    route: 'POST /api/works',
    call: () => post('/api/works', { title: 'Lidded jar', retailPrice: gbp(15_000) }),
    expect: studioOnly(201),
  },
  {
    route: 'GET /api/works/:id',
    call: (x) => get(`/api/works/${x.works.onShow}`),
    expect: studioOnly(200),
  },
  {
    route: 'PATCH /api/works/:id',
    call: (x) => ({ method: 'patch', path: `/api/works/${x.works.free}`, body: { title: 'Mug' } }),
    expect: studioOnly(200),
  },
  {
    route: 'DELETE /api/works/:id',
    call: (x) => ({ method: 'delete', path: `/api/works/${x.works.free}` }),
    expect: studioOnly(204),
  },
  {
    route: 'POST /api/works/:id/archive',
    call: (x) => post(`/api/works/${x.works.free}/archive`),
    expect: studioOnly(200),
  },
  {
    route: 'POST /api/works/:id/restore',
    call: (x) => post(`/api/works/${x.works.archived}/restore`),
    expect: studioOnly(200),
  },
  {
    route: 'GET /api/works/:id/history',
    call: (x) => get(`/api/works/${x.works.onShow}/history`),
    expect: studioOnly(200),
  },
  {
    route: 'POST /api/works/:id/photos',
    call: (x) => ({ method: 'post', path: `/api/works/${x.works.free}/photos`, attach: 'photos' }),
    expect: studioOnly(201),
  },
  {
    route: 'PUT /api/works/:id/photos/order',
    call: (x) => ({
      method: 'put',
      path: `/api/works/${x.works.free}/photos/order`,
      body: { photoIds: [...x.photos.free].reverse() },
    }),
    expect: studioOnly(200),
  },
  {
    route: 'DELETE /api/works/:id/photos/:photoId',
    call: (x) => ({
      method: 'delete',
      path: `/api/works/${x.works.free}/photos/${x.photos.free[0]}`,
    }),
    expect: studioOnly(200),
  },
  {
    route: 'GET /api/photos/:photoId',
    call: (x) => get(`/api/photos/${x.photos.cover}`),
    expect: studioAndItsVenue(200),
  },
  {
    route: 'GET /api/photos/:photoId/thumbnail',
    call: (x) => get(`/api/photos/${x.photos.cover}/thumbnail`),
    expect: studioAndItsVenue(200),
  },
  { route: 'GET /api/studio', call: () => get('/api/studio'), expect: studioOnly(200) },
  {
    route: 'PATCH /api/studio',
    call: () => ({
      method: 'patch',
      path: '/api/studio',
      body: { stockNumberPattern: 'SK/{YY}/{NNNN}', priceStep: 250 },
    }),
    expect: ownerOnly(200),
  },
  { route: 'GET /api/venues', call: () => get('/api/venues'), expect: studioOnly(200) },
  {
    route: 'POST /api/venues',
    call: () => post('/api/venues', { name: 'Harbour Shop', kind: 'shop', country: 'GB' }),
    expect: studioOnly(201),
  },
  {
    route: 'GET /api/venues/:id',
    call: (x) => get(`/api/venues/${x.venueA}`),
    expect: studioOnly(200),
  },
  {
    route: 'PATCH /api/venues/:id',
    call: (x) => ({
      method: 'patch',
      path: `/api/venues/${x.venueA}`,
      body: { name: 'Gallery A' },
    }),
    expect: studioOnly(200),
  },
  // Each person's own list: another venue's or studio's staff see theirs (empty), not A's.
  {
    route: 'GET /api/consignments',
    call: () => get('/api/consignments'),
    expect: signedInOnly(200),
  },
  {
    route: 'POST /api/consignments',
    call: (x) => post('/api/consignments', { venueId: x.venueA, title: 'Summer show' }),
    expect: studioOnly(201),
  },
  {
    route: 'GET /api/consignments/:id',
    call: (x) => get(`/api/consignments/${x.consignments.sent}`),
    expect: studioAndItsVenue(200),
  },
  {
    route: 'PATCH /api/consignments/:id',
    call: (x) => ({
      method: 'patch',
      path: `/api/consignments/${x.consignments.draft}`,
      body: { title: 'Spring show, two' },
    }),
    expect: studioOnly(200),
  },
  {
    route: 'POST /api/consignments/:id/lines',
    call: (x) => post(`/api/consignments/${x.consignments.draft}/lines`, { workId: x.works.free }),
    expect: studioOnly(201),
  },
  {
    route: 'PATCH /api/consignments/:id/lines/:lineId',
    call: (x) => ({
      method: 'patch',
      path: `/api/consignments/${x.consignments.draft}/lines/${x.lines.draft}`,
      body: { listPrice: gbp(12_000) },
    }),
    expect: studioOnly(200),
  },
  {
    route: 'DELETE /api/consignments/:id/lines/:lineId',
    call: (x) => ({
      method: 'delete',
      path: `/api/consignments/${x.consignments.draft}/lines/${x.lines.draft}`,
    }),
    expect: studioOnly(200),
  },
  {
    route: 'POST /api/consignments/:id/agree',
    call: (x) => post(`/api/consignments/${x.consignments.draft}/agree`),
    expect: studioOnly(200),
  },
  {
    route: 'POST /api/consignments/:id/dispatch',
    call: (x) => post(`/api/consignments/${x.consignments.agreed}/dispatch`),
    expect: studioOnly(200),
  },
  {
    route: 'POST /api/consignments/:id/cancel',
    call: (x) => post(`/api/consignments/${x.consignments.draft}/cancel`),
    expect: studioOnly(200),
  },
  {
    route: 'POST /api/consignments/:id/acknowledge',
    call: (x) =>
      post(`/api/consignments/${x.consignments.sent}/acknowledge`, {
        reports: [x.lines.out, x.lines.spare].map((lineId) => ({ lineId, ...soundCheck })),
      }),
    expect: venueSide(200),
  },
  {
    route: 'POST /api/consignments/:id/sales',
    call: (x) =>
      post(`/api/consignments/${x.consignments.sent}/sales`, {
        sales: [{ lineId: x.lines.spare, soldOn: x.today, salePrice: gbp(24_000) }],
      }),
    expect: studioAndItsVenue(201),
  },
  {
    route: 'POST /api/consignment-lines/:lineId/sale',
    call: (x) =>
      post(`/api/consignment-lines/${x.lines.spare}/sale`, {
        soldOn: x.today,
        salePrice: gbp(24_000),
      }),
    expect: studioAndItsVenue(201),
  },
  {
    // The venue's staff entered this sale, so they may undo it too.
    route: 'DELETE /api/consignment-lines/:lineId/sale',
    call: (x) => ({ method: 'delete', path: `/api/consignment-lines/${x.lines.sold}/sale` }),
    expect: studioAndItsVenue(200),
  },
  {
    route: 'POST /api/consignment-lines/:lineId/resolve',
    label: 'returned',
    call: (x) =>
      post(`/api/consignment-lines/${x.lines.spare}/resolve`, { state: 'returned', on: x.today }),
    expect: studioAndItsVenue(200),
  },
  {
    // Withdrawing is the studio's alone: any venue's staff of the studio are refused before the
    // piece is looked up; another studio's find nothing.
    route: 'POST /api/consignment-lines/:lineId/resolve',
    label: 'withdrawn',
    call: (x) =>
      post(`/api/consignment-lines/${x.lines.spare}/resolve`, { state: 'withdrawn', on: x.today }),
    expect: [401, 200, 200, 403, 403, 404],
  },
  {
    route: 'GET /api/consignments/:id/sheet.pdf',
    call: (x) => get(`/api/consignments/${x.consignments.sent}/sheet.pdf`),
    expect: studioAndItsVenue(200),
  },
  {
    route: 'GET /api/consignments/:id/condition-report.pdf',
    call: (x) => get(`/api/consignments/${x.consignments.sent}/condition-report.pdf`),
    expect: studioAndItsVenue(200),
  },
  {
    route: 'GET /api/consignments/:id/labels.pdf',
    call: (x) => get(`/api/consignments/${x.consignments.sent}/labels.pdf`),
    expect: studioAndItsVenue(200),
  },
  {
    // Naming the piece files the photo under the piece's studio. Another venue's staff of the
    // same studio may still upload there, as they may without naming a piece: the photo is
    // theirs alone until a report they can make names it.
    route: 'POST /api/condition-photos',
    call: (x) => ({
      method: 'post',
      path: `/api/condition-photos?lineId=${x.lines.out}`,
      attach: 'photo',
    }),
    expect: [401, 201, 201, 201, 201, 404],
  },
  {
    route: 'GET /api/condition-photos/:fileId',
    call: (x) => get(`/api/condition-photos/${x.conditionPhoto}`),
    expect: studioAndItsVenue(200),
  },
  {
    route: 'GET /api/condition-photos/:fileId/thumbnail',
    call: (x) => get(`/api/condition-photos/${x.conditionPhoto}/thumbnail`),
    expect: studioAndItsVenue(200),
  },
  {
    // Arrival checks are the venue's and the studio's (docs/condition.md).
    route: 'POST /api/consignment-lines/:lineId/condition-reports',
    call: (x) =>
      post(`/api/consignment-lines/${x.lines.out}/condition-reports`, {
        stage: 'arrival',
        ...soundCheck,
      }),
    expect: studioAndItsVenue(201),
  },
  {
    route: 'POST /api/consignments/:id/close',
    call: (x) => post(`/api/consignments/${x.consignments.ending}/close`),
    expect: studioOnly(200),
  },
  {
    route: 'GET /api/consignment-lines/:lineId/claim.pdf',
    call: (x) => get(`/api/consignment-lines/${x.lines.damaged}/claim.pdf`),
    expect: studioOnly(200),
  },
  // Each person's own list: the venue's staff see its issued statements, others theirs.
  { route: 'GET /api/statements', call: () => get('/api/statements'), expect: signedInOnly(200) },
  {
    route: 'POST /api/statements',
    call: (x) =>
      post('/api/statements', { venueId: x.venueA, periodStart: x.today, periodEnd: x.today }),
    expect: ownerOnly(201),
  },
  {
    route: 'GET /api/statements/:id',
    call: (x) => get(`/api/statements/${x.statements.issued}`),
    expect: studioAndItsVenue(200),
  },
  {
    route: 'GET /api/statements/:id.pdf',
    call: (x) => get(`/api/statements/${x.statements.issued}.pdf`),
    expect: studioAndItsVenue(200),
  },
  {
    route: 'POST /api/statements/:id/issue',
    call: (x) => post(`/api/statements/${x.statements.draft}/issue`),
    expect: ownerOnly(200),
  },
  {
    route: 'POST /api/statements/:id/payments',
    call: (x) =>
      post(`/api/statements/${x.statements.issued}/payments`, {
        amount: gbp(5_000),
        receivedOn: x.today,
        method: 'bank-transfer',
        reference: 'REMIT 1',
      }),
    expect: ownerOnly(201),
  },
  {
    route: 'POST /api/statements/:id/adjustments',
    call: (x) =>
      post(`/api/statements/${x.statements.issued}/adjustments`, {
        kind: 'fee-deducted',
        amount: gbp(500),
        note: 'Card fee',
      }),
    expect: ownerOnly(201),
  },
  {
    // The venue that owes it and the owner; another venue's staff of A find nothing of it.
    route: 'POST /api/statements/:id/checkout',
    call: (x) => post(`/api/statements/${x.statements.issued}/checkout`),
    expect: [401, 200, 403, 200, 404, 404],
  },
  {
    // No session but the provider's signature: an event it has no use for is acknowledged.
    route: 'POST /api/payments/webhook',
    call: () => ({ method: 'post', path: '/api/payments/webhook', webhook: ignoredEvent }),
    expect: everyone(200),
  },
  { route: 'GET /api/year', call: () => get('/api/year?year=2026'), expect: ownerOnly(200) },
  {
    route: 'GET /api/year/sales.csv',
    call: () => get('/api/year/sales.csv?year=2026'),
    expect: ownerOnly(200),
  },
  {
    route: 'GET /api/year/payments.csv',
    call: () => get('/api/year/payments.csv?year=2026'),
    expect: ownerOnly(200),
  },
  {
    route: 'GET /api/year/statements.csv',
    call: () => get('/api/year/statements.csv?year=2026'),
    expect: ownerOnly(200),
  },
  {
    route: 'GET /api/calendar-feed',
    call: () => get('/api/calendar-feed'),
    expect: ownerOnly(200),
  },
  {
    route: 'POST /api/calendar-feed',
    call: () => post('/api/calendar-feed'),
    expect: ownerOnly(201),
  },
  {
    route: 'DELETE /api/calendar-feed',
    call: () => ({ method: 'delete', path: '/api/calendar-feed' }),
    expect: ownerOnly(200),
  },
  {
    // Public (a calendar program signs in to nothing): an address nobody made is not found.
    route: 'GET /api/calendar/:token.ics',
    call: () => get(`/api/calendar/${'a'.repeat(43)}.ics`),
    expect: everyone(404),
  },
  {
    route: 'POST /api/bank-imports/matches',
    call: () =>
      post('/api/bank-imports/matches', {
        csv: 'Date,Amount,Reference\r\n2026-12-01,10.00,REMIT\r\n',
      }),
    expect: ownerOnly(200),
  },
  { route: 'GET /api/outbox', call: () => get('/api/outbox'), expect: ownerOnly(200) },
  {
    route: 'GET /api/outbox/:id',
    call: (x) => get(`/api/outbox/${x.dispatchMail}`),
    expect: ownerOnly(200),
  },
  {
    route: 'GET /api/outbox/:id/attachments/:index',
    call: (x) => get(`/api/outbox/${x.dispatchMail}/attachments/0`),
    expect: ownerOnly(200),
  },
  {
    route: 'POST /api/outbox/:id/retry',
    call: (x) => post(`/api/outbox/${x.dispatchMail}/retry`),
    expect: ownerOnly(200),
  },
];

/** What a refusal must say: who is refused and why, and a 404 about a resource, not a route. */
const refusals: Record<number, object> = {
  401: { code: 'unauthenticated', message: 'Sign in to continue.' },
  403: { code: 'forbidden', message: expect.any(String) },
  404: { code: 'not_found', message: expect.stringMatching(/^That .+ was not found\.$/) },
};

let root: string;
let base: string;
let ids: Ids;
let payments: Awaited<ReturnType<typeof startTestPayments>>;

/** A copy of the fixture with an app over it. */
async function freshApp() {
  const dir = path.join(root, randomUUID());
  fs.cpSync(base, dir, { recursive: true });
  await copyTestDatabase(path.join(base, 'saggar.db'), path.join(dir, 'saggar.db'));
  const ctx = await createTestApp({
    dbFile: path.join(dir, 'saggar.db'),
    filesDir: path.join(dir, 'files'),
    payments: payments.provider,
  });
  return {
    app: ctx.app,
    close: async () => {
      await ctx.db.destroy();
      releaseTestDatabase(path.join(dir, 'saggar.db'));
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}

async function send(app: Parameters<typeof request>[0], call: Call, who: Person) {
  let req = request(app)[call.method](call.path);
  // A change comes from the app's own page, as a browser sends it: with its Origin.
  if (call.method !== 'get')
    req = req.set('Host', 'saggar.example').set('Origin', 'http://saggar.example');
  const cookie = ids.cookies[who];
  if (cookie) req = req.set('Cookie', cookie);
  if (call.webhook) {
    const signature = sdk.webhooks.generateTestHeaderString({
      payload: call.webhook,
      secret: payments.standIn.webhookSecret,
    });
    return req
      .set('Content-Type', 'application/json; charset=utf-8')
      .set('Stripe-Signature', signature)
      .send(call.webhook);
  }
  if (call.attach) return req.attach(call.attach, await picture(200, 150, '#5d7a8c'), 'piece.jpg');
  return call.body === undefined ? req : req.send(call.body);
}

beforeAll(async () => {
  payments = await startTestPayments();
  root = fs.mkdtempSync(path.join(os.tmpdir(), 'saggar-access-matrix-'));
  base = path.join(root, 'base');
  fs.mkdirSync(base);
  ids = await buildFixture(base);
}, 60_000);

afterAll(async () => {
  fs.rmSync(root, { recursive: true, force: true });
  await payments?.standIn.stop();
});

describe('the access matrix', () => {
  it('has a row for every route Express has mounted, and none for a route it has not', async () => {
    const { app } = await createTestApp();
    const rows = [...new Set(matrix.map((r) => r.route))].sort();
    expect(rows).toEqual(mountedRoutes(app));
    expect(rows).toEqual([...publicRoutes, ...protectedRoutes.map((r) => r.route)].sort());
  });

  it('refuses, in every row, the roles tests/server/helpers/routes.ts says may not use the route', () => {
    const column = { owner: 1, assistant: 2, gallery: 3, otherVenue: 4, otherStudio: 5 } as const;
    for (const { route, roles } of protectedRoutes) {
      for (const row of matrix.filter((r) => r.route === route)) {
        for (const [person, i] of Object.entries(column)) {
          const role = person === 'owner' || person === 'assistant' ? person : 'gallery';
          if (!roles.includes(role))
            expect([route, person, row.expect[i]]).toEqual([route, person, 403]);
        }
        expect([route, row.expect[0]]).toEqual([route, 401]);
      }
    }
  });
});

const isPublic = (route: string) => (publicRoutes as readonly string[]).includes(route);

// Reads change nothing, so they share one copy; every other call gets a copy of its own.
describe.each(
  matrix.map((row) => ({ ...row, name: row.label ? `${row.route} (${row.label})` : row.route })),
)('$name', (row) => {
  it.each(people.map((who, i) => ({ who, status: row.expect[i]! })))(
    'answers $status to $who',
    async ({ who, status }) => {
      const call = row.call(ids, who);
      const { app, close } = call.method === 'get' ? await shared() : await freshApp();
      try {
        const res = await send(app, call, who);
        expect([res.status, res.body?.error]).toEqual([
          status,
          status >= 400 ? refusals[status] : undefined,
        ]);
        const body = JSON.stringify(res.body ?? null);
        // What the venue side lets through never carries the studio's cost prices.
        if (who !== 'owner' && who !== 'assistant') expect(body).not.toMatch(/cost_?price/i);
        // Nor, to another venue's or studio's staff, anything of the consignment sent to A.
        if ((who === 'otherVenue' || who === 'otherStudio') && !isPublic(row.route)) {
          expect(body).not.toMatch(/Winter show|Gallery of A|"A-[1-3]"/);
        }
      } finally {
        if (call.method !== 'get') await close();
      }
    },
  );
});

let readApp: Awaited<ReturnType<typeof freshApp>> | undefined;
async function shared() {
  readApp ??= await freshApp();
  return readApp;
}
afterAll(async () => {
  await readApp?.close();
});

import request from 'supertest';

import { isoDateInTimeZone } from '@/shared/money';
import { type Money } from '@/shared/schemas/money';

import {
  as,
  type ConsignmentFixture,
  consignmentFixture,
  dispatchedWith,
} from './consignment-fixture';
import { picture } from './pictures';
import { addConsignment, insertLine, insertWork } from './studio-fixture';
import { addPerson, addVenue, signIn } from './test-app';

export const gbp = (amount: number): Money => ({ amount, currency: 'GBP' });

/** Today in the fixture studios' time zone (the default, Europe/London): the latest day a sale takes. */
export const londonToday = () => isoDateInTimeZone(new Date(), 'Europe/London');

/** The day before or after an ISO date. */
export function dayAfter(isoDate: string, days = 1) {
  const date = new Date(`${isoDate}T12:00:00Z`);
  date.setUTCDate(date.getUTCDate() + days);
  return date.toISOString().slice(0, 10);
}

/** Whitespace folded, so a sentence the mail's text part wrapped reads as one line. */
export const oneLine = (text: string) => text.replace(/\s+/g, ' ').trim();

/** The words that would betray the studio's cost prices in a body meant for a venue. */
export const costWords = /cost_?price/i;

/** Sends a request with the cookie of someone who is not one of the fixture's people. */
export function withCookie(f: ConsignmentFixture, cookie: string) {
  const send = (method: 'get' | 'post' | 'delete', path: string, body?: object) => {
    const req = request(f.app)[method](path).set('Cookie', cookie);
    return body === undefined ? req : req.send(body);
  };
  return {
    get: (path: string) => send('get', path),
    post: (path: string, body: object = {}) => send('post', path, body),
    delete: (path: string) => send('delete', path),
  };
}

/**
 * The consignment fixture's three works (A-1 Moon jar £100, A-2 Tall bottle £240, A-3 Tea bowl
 * £480, on venue A's 40% + VAT terms) with cost prices the venue must never see, sent to venue A
 * today: every piece out and ready to sell.
 */
export async function salesFixture(options: Parameters<typeof consignmentFixture>[0] = {}) {
  const f = await consignmentFixture(options);
  const details = [
    { title: 'Moon jar', cost_price: 3_100 },
    { title: 'Tall bottle', cost_price: 7_300 },
    { title: 'Tea bowl', cost_price: 12_900 },
  ];
  for (const [i, values] of details.entries()) {
    await f.db.updateTable('works').set(values).where('id', '=', f.works[i]!).execute();
  }
  const sent = await dispatchedWith(f, f.works);
  const [moonJar, tallBottle, teaBowl] = sent.lines.map((l) => l.id) as [number, number, number];
  return { ...f, sent, lines: { moonJar, tallBottle, teaBowl }, today: londonToday() };
}
export type SalesFixture = Awaited<ReturnType<typeof salesFixture>>;

type Who = Parameters<SalesFixture['cookie']>[0];

/** One sale as the body of POST /api/consignment-lines/:lineId/sale, sold today. */
export const saleOf = (f: SalesFixture, amount: number, extra: object = {}) => ({
  soldOn: f.today,
  salePrice: gbp(amount),
  ...extra,
});

export const sell = (f: SalesFixture, who: Who, lineId: number, amount: number, extra = {}) =>
  as(f, who).post(`/api/consignment-lines/${lineId}/sale`, saleOf(f, amount, extra));

export const undo = (f: SalesFixture, who: Who, lineId: number) =>
  as(f, who).delete(`/api/consignment-lines/${lineId}/sale`);

export const resolve = (f: SalesFixture, who: Who, lineId: number, body: object) =>
  as(f, who).post(`/api/consignment-lines/${lineId}/resolve`, body);

/** The audit entries about one line, oldest first, their JSON read. */
export async function auditOf(f: ConsignmentFixture, lineId: number) {
  const rows = await f.db
    .selectFrom('audit_log')
    .selectAll()
    .where('entity', '=', 'consignment_line')
    .where('entity_id', '=', String(lineId))
    .orderBy('id')
    .execute();
  return rows.map((r) => ({
    ...r,
    before: JSON.parse(r.before ?? 'null') as unknown,
    after: JSON.parse(r.after ?? 'null') as unknown,
  }));
}

export const lineRow = (f: ConsignmentFixture, lineId: number) =>
  f.db
    .selectFrom('consignment_lines')
    .selectAll()
    .where('id', '=', lineId)
    .executeTakeFirstOrThrow();

export const userId = async (f: ConsignmentFixture, email: string) =>
  (await f.db.selectFrom('users').select('id').where('email', '=', email).executeTakeFirstOrThrow())
    .id;

/**
 * The sale e-mails in the outbox as they will go: one still waiting is written again by its
 * composer, as the worker does before sending it, and one left with nothing to say is left out.
 */
export async function saleMails(f: ConsignmentFixture) {
  const rows = await f.db
    .selectFrom('outbox')
    .selectAll()
    .where('kind', '=', 'sale')
    .orderBy('id')
    .execute();
  const compose = f.context.composeMail.sale!;
  const mails = [];
  for (const row of rows) {
    if (row.state !== 'queued') {
      mails.push(row);
      continue;
    }
    const mail = await compose(f.db, { id: row.id, studioId: row.studio_id, to: row.to_address });
    if (mail) {
      mails.push({
        ...row,
        subject: mail.subject,
        text_body: mail.text,
        html_body: mail.html ?? null,
        attachments: JSON.stringify(mail.attachments ?? []),
      });
    }
  }
  return mails;
}

/** When a sale was recorded, as a refusal says it: the time of day in the studio's zone. */
export const recordedTime = (recordedAt: string) =>
  new Intl.DateTimeFormat('en-GB', {
    hour: '2-digit',
    minute: '2-digit',
    timeZone: 'Europe/London',
  }).format(new Date(recordedAt));

/** A second venue of studio A and a member of its staff, signed in. */
export async function secondVenueStaff(f: ConsignmentFixture) {
  const venueId = await addVenue(f.db, f.studioA, 'Second venue of A');
  await addPerson(f.db, 'second-venue@example.test', [
    { studioId: f.studioA, role: 'gallery', venueId },
  ]);
  return { venueId, cookie: await signIn(f.app, 'second-venue@example.test') };
}

/**
 * Studio B's own show at its venue, on the default terms (40% commission, no VAT on it), out
 * since 1 Oct 2026 with two pieces: the other maker a venue's staff may also work for.
 */
export async function studioBShow(f: ConsignmentFixture) {
  const consignmentId = await addConsignment(f.db, f.studioB, f.venueB, 'B-2026-001');
  const bowl = await insertWork(f.db, f.studioB, 'B-7', { title: 'Salt-glazed bowl' });
  const jug = await insertWork(f.db, f.studioB, 'B-8', { title: 'Cider jug', cost_price: 2_000 });
  return {
    consignmentId,
    bowl: await insertLine(f.db, f.studioB, consignmentId, bowl),
    jug: await insertLine(f.db, f.studioB, consignmentId, jug),
  };
}

/** A photo for a work, uploaded as the owner: it becomes the work's cover. */
export async function uploadWorkPhoto(f: ConsignmentFixture, workId: number, colour: string) {
  const res = await request(f.app)
    .post(`/api/works/${workId}/photos`)
    .set('Cookie', await f.cookie('owner'))
    .attach('photos', await picture(640, 480, colour), {
      filename: 'piece.jpg',
      contentType: 'image/jpeg',
    });
  if (res.status !== 201) throw new Error(JSON.stringify(res.body));
  return res.body[0] as { id: number };
}

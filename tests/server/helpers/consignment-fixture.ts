import request from 'supertest';

import { type Terms } from '@/shared/schemas/terms';

import { type Fixture, insertWork, studioFixture } from './studio-fixture';

type Who = Parameters<Fixture['cookie']>[0];

/** Sends a request as one of the fixture's people, JSON in and out. */
export function as(f: Fixture, who: Who) {
  const send = async (method: 'get' | 'post' | 'patch' | 'delete', path: string, body?: object) => {
    const req = request(f.app)
      [method](path)
      .set('Cookie', await f.cookie(who));
    return body === undefined ? req : req.send(body);
  };
  return {
    get: (path: string) => send('get', path),
    post: (path: string, body: object = {}) => send('post', path, body),
    patch: (path: string, body: object) => send('patch', path, body),
    delete: (path: string) => send('delete', path),
  };
}

/** Venue A's terms: 40% commission with VAT added, the usual UK gallery case (docs/money-rules.md). */
export const galleryTerms: Terms = {
  currency: 'GBP',
  commissionRateBp: 4000,
  vatRateBp: 2000,
  venueRole: 'agent',
  commissionVat: 'added',
  makerVatRegistered: false,
  discountRule: 'shared',
  insuranceBasis: 'maker-net',
  insuredBy: 'venue',
  insuredInTransitBy: 'maker',
  paymentTerms: { days: 30, from: 'month-end' },
};

/** The studio fixture, with venue A on the gallery terms above and an e-mail to write to. */
export async function consignmentFixture(options: Parameters<typeof studioFixture>[0] = {}) {
  const f = await studioFixture(options);
  await f.db
    .updateTable('venues')
    .set({ default_terms: JSON.stringify(galleryTerms), email: 'desk@gallery-a.example' })
    .where('id', '=', f.venueA)
    .execute();
  const works = [];
  for (const [i, price] of [10_000, 24_000, 48_000].entries()) {
    works.push(await insertWork(f.db, f.studioA, `A-${i + 1}`, { retail_price: price }));
  }
  return { ...f, works };
}
export type ConsignmentFixture = Awaited<ReturnType<typeof consignmentFixture>>;

/** A draft for venue A holding the given works. */
export async function draftWith(
  f: ConsignmentFixture,
  workIds: readonly number[],
  title = 'Winter show',
) {
  const owner = as(f, 'owner');
  const created = await owner.post('/api/consignments', { venueId: f.venueA, title });
  if (created.status !== 201) throw new Error(JSON.stringify(created.body));
  for (const workId of workIds) {
    const added = await owner.post(`/api/consignments/${created.body.id}/lines`, { workId });
    if (added.status !== 201) throw new Error(JSON.stringify(added.body));
  }
  return (await owner.get(`/api/consignments/${created.body.id}`)).body as {
    id: number;
    reference: string;
    lines: { id: number; workId: number; stockNumber: string }[];
  };
}

export const soundCheck = { examinerName: 'Ines', examinedOn: '2026-11-20', findings: [] };

/** A draft agreed and sent, each piece checked sound at dispatch. */
export async function dispatchedWith(f: ConsignmentFixture, workIds: readonly number[]) {
  const draft = await draftWith(f, workIds);
  const owner = as(f, 'owner');
  await owner.post(`/api/consignments/${draft.id}/agree`);
  for (const line of draft.lines) {
    await owner.post(`/api/consignment-lines/${line.id}/condition-reports`, {
      stage: 'dispatch',
      ...soundCheck,
    });
  }
  const sent = await owner.post(`/api/consignments/${draft.id}/dispatch`);
  if (sent.status !== 200) throw new Error(JSON.stringify(sent.body));
  return draft;
}

export { insertWork };

import { type NewWorkRow } from '@/server/db/schema/works';

import { addConsignment, addPerson, addStudio, addVenue, createTestApp, signIn } from './test-app';

type Who = 'owner' | 'assistant' | 'gallery' | 'otherOwner';

const emails: Record<Who, string> = {
  owner: 'owner-a@example.test',
  assistant: 'assistant-a@example.test',
  gallery: 'gallery-a@example.test',
  otherOwner: 'owner-b@example.test',
};

/**
 * Studio A with an owner, an assistant and a member of its venue's staff; studio B with its own
 * owner and venue, whose ids the tests use as "another studio's".
 */
export async function studioFixture(options: Parameters<typeof createTestApp>[0] = {}) {
  const ctx = await createTestApp(options);
  const { db, app } = ctx;
  const studioA = await addStudio(db, 'Studio A');
  const studioB = await addStudio(db, 'Studio B');
  const venueA = await addVenue(db, studioA, 'Gallery of A');
  const venueB = await addVenue(db, studioB, 'Gallery of B');
  await addPerson(db, emails.owner, [{ studioId: studioA, role: 'owner' }]);
  await addPerson(db, emails.assistant, [{ studioId: studioA, role: 'assistant' }]);
  await addPerson(db, emails.gallery, [{ studioId: studioA, role: 'gallery', venueId: venueA }]);
  await addPerson(db, emails.otherOwner, [{ studioId: studioB, role: 'owner' }]);
  const cookies = new Map<Who, string>();
  const cookie = async (who: Who) => {
    if (!cookies.has(who)) cookies.set(who, await signIn(app, emails[who]));
    return cookies.get(who)!;
  };
  return { ...ctx, studioA, studioB, venueA, venueB, cookie };
}

export type Fixture = Awaited<ReturnType<typeof studioFixture>>;

/** A work straight into the database, for tests about reading. */
export async function insertWork(
  db: Fixture['db'],
  studioId: number,
  stockNumber: string,
  values: Partial<NewWorkRow> = {},
): Promise<number> {
  const row = await db
    .insertInto('works')
    .values({
      studio_id: studioId,
      stock_number: stockNumber,
      title: `Work ${stockNumber}`,
      retail_price: 10_000,
      currency: 'GBP',
      ...values,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

export async function insertLine(
  db: Fixture['db'],
  studioId: number,
  consignmentId: number,
  workId: number,
  state: 'consigned' | 'sold' | 'returned' | 'withdrawn' = 'consigned',
): Promise<number> {
  const row = await db
    .insertInto('consignment_lines')
    .values({
      studio_id: studioId,
      consignment_id: consignmentId,
      work_id: workId,
      currency: 'GBP',
      list_price: 10_000,
      insurance_value: 6_000,
      state,
      ...(state === 'sold' ? { sold_on: '2026-11-02', sale_price: 9_000 } : {}),
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

export { addConsignment };

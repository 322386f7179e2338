import { workStatuses } from '@/shared/schemas/work';

import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { workStatus } from '../works/work-status';

export async function findStudioHeading(db: Db, scope: Scope) {
  return scoped
    .studios(db, scope)
    .select(['studios.id', 'studios.name', 'studios.currency'])
    .executeTakeFirst();
}

/** The studio's works in use (not archived), counted by where they are. */
export async function countWorksByStatus(db: Db, scope: Scope) {
  const rows = await scoped
    .works(db, scope)
    .where('works.archived_at', 'is', null)
    .select((eb) => [workStatus(eb).as('status'), eb.fn.countAll<number>().as('n')])
    .groupBy('status')
    .execute();
  const byStatus = Object.fromEntries(workStatuses.map((s) => [s, 0])) as Record<
    (typeof workStatuses)[number],
    number
  >;
  for (const row of rows) byStatus[row.status] = Number(row.n);
  return byStatus;
}

export async function countVenues(db: Db, scope: Scope): Promise<number> {
  const row = await scoped
    .venues(db, scope)
    .where('venues.archived_at', 'is', null)
    .select((eb) => eb.fn.countAll<number>().as('n'))
    .executeTakeFirstOrThrow();
  return Number(row.n);
}

import { consignmentOutStates } from '@/shared/schemas/consignment';
import { type Overview } from '@/shared/schemas/overview';
import { workStatuses } from '@/shared/schemas/work';

import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { listConsignmentSummaries } from '../consignments/consignments.repository';
import { type Db } from '../db/database';
import { notFound } from '../http/http-error';
import { workStatus } from '../works/work-status';

/** The studio's figures at a glance: works by status, venues, and what is out now. */
export async function getOverview(db: Db, scope: Scope): Promise<Overview> {
  const studio = await scoped
    .studios(db, scope)
    .select(['studios.id', 'studios.name', 'studios.currency'])
    .executeTakeFirst();
  if (!studio) throw notFound('The studio');

  const statusRows = await scoped
    .works(db, scope)
    .where('works.archived_at', 'is', null)
    .select((eb) => [workStatus(eb).as('status'), eb.fn.countAll<number>().as('n')])
    .groupBy('status')
    .execute();
  const byStatus = Object.fromEntries(
    workStatuses.map((s) => [s, 0]),
  ) as Overview['works']['byStatus'];
  for (const row of statusRows) byStatus[row.status] = Number(row.n);

  const venues = await scoped
    .venues(db, scope)
    .where('venues.archived_at', 'is', null)
    .select((eb) => eb.fn.countAll<number>().as('n'))
    .executeTakeFirstOrThrow();

  const out = await listConsignmentSummaries(db, scope, { states: consignmentOutStates });

  return {
    studio,
    works: { total: Object.values(byStatus).reduce((a, b) => a + b, 0), byStatus },
    venues: { total: Number(venues.n) },
    consignments: { outCount: out.length, out },
  };
}

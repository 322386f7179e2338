import { consignmentOutStates } from '@/shared/schemas/consignment';
import { type Overview } from '@/shared/schemas/overview';

import { type Scope } from '../access/viewer';
import { listConsignmentSummaries } from '../consignments/consignments.repository';
import { exposureByCurrency, today } from '../consignments/consignments.service';
import { type Db } from '../db/database';
import { notFound } from '../http/http-error';
import { recentSales } from '../sales/recent-sales';
import { countVenues, countWorksByStatus, findStudioHeading } from './overview.repository';

/** The studio's figures at a glance: works by status, venues, and what is out now. */
export async function getOverview(db: Db, scope: Scope): Promise<Overview> {
  const studio = await findStudioHeading(db, scope);
  if (!studio) throw notFound('The studio');
  const byStatus = await countWorksByStatus(db, scope);
  const out = await listConsignmentSummaries(db, scope, { states: consignmentOutStates });
  const exposure = await exposureByCurrency(db, scope, await today(db, scope));
  return {
    studio,
    works: { total: Object.values(byStatus).reduce((a, b) => a + b, 0), byStatus },
    venues: { total: await countVenues(db, scope) },
    consignments: { outCount: out.length, out },
    recentSales: await recentSales(db, scope),
    exposure: exposure.map(({ currency, venueNames, exposure: e }) => ({
      currency,
      total: e.studio.value,
      lineCount: e.studio.lineCount,
      byVenue: e.byVenue
        .map((v) => ({
          venueId: v.venueId,
          venueName: venueNames.get(v.venueId) ?? '',
          value: v.value,
          lineCount: v.lineCount,
        }))
        .sort((a, b) => b.value.amount - a.value.amount),
    })),
  };
}

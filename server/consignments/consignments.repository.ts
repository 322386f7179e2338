import { type ConsignmentState, type ConsignmentSummary } from '@/shared/schemas/consignment';

import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';

/** Consignments as lists show them, with counts of their pieces, newest first. */
export async function listConsignmentSummaries(
  db: Db,
  scope: Scope,
  filter: { states?: readonly ConsignmentState[]; venueId?: number } = {},
): Promise<ConsignmentSummary[]> {
  let query = scoped
    .consignments(db, scope)
    .innerJoin('venues', 'venues.id', 'consignments.venue_id')
    .select((eb) => {
      const lines = (state?: 'consigned' | 'sold') => {
        let q = eb
          .selectFrom('consignment_lines')
          .select((e) => e.fn.countAll<number>().as('n'))
          .whereRef('consignment_lines.consignment_id', '=', 'consignments.id')
          .where('consignment_lines.state', '!=', 'withdrawn');
        if (state) q = q.where('consignment_lines.state', '=', state);
        return q;
      };
      return [
        'consignments.id',
        'consignments.reference',
        'consignments.title',
        'consignments.state',
        'consignments.venue_id',
        'venues.name as venue_name',
        'consignments.dispatch_date',
        'consignments.opening_date',
        'consignments.closing_date',
        'consignments.return_due_date',
        lines().as('line_count'),
        lines('consigned').as('lines_out'),
        lines('sold').as('lines_sold'),
      ];
    })
    .orderBy('consignments.dispatch_date', 'desc')
    .orderBy('consignments.id', 'desc');
  if (filter.states) query = query.where('consignments.state', 'in', filter.states);
  if (filter.venueId) query = query.where('consignments.venue_id', '=', filter.venueId);
  const rows = await query.execute();
  return rows.map((r) => ({
    id: r.id,
    reference: r.reference,
    title: r.title,
    state: r.state,
    venueId: r.venue_id,
    venueName: r.venue_name,
    dispatchDate: r.dispatch_date,
    openingDate: r.opening_date,
    closingDate: r.closing_date,
    returnDueDate: r.return_due_date,
    lineCount: Number(r.line_count ?? 0),
    linesOut: Number(r.lines_out ?? 0),
    linesSold: Number(r.lines_sold ?? 0),
  }));
}

import {
  consignmentOutStates,
  type ConsignmentState,
  type ConsignmentSummary,
} from '@/shared/schemas/consignment';

import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { type ConsignmentUpdate, type NewConsignmentRow } from '../db/schema/consignments';
import { matchesLike } from '../db/text-search';

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
    .orderBy('consignments.created_at', 'desc')
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

/**
 * Lines still out: consigned on a consignment that has been sent and not settled, with what
 * the money engine's exposure needs. All of the scope's, or one consignment's.
 */
export async function listOutLines(db: Db, scope: Scope, consignmentId?: number) {
  let q = scoped
    .consignmentLines(db, scope)
    .innerJoin('venues', 'venues.id', 'consignments.venue_id')
    .select([
      'consignment_lines.id',
      'consignment_lines.consignment_id',
      'consignments.venue_id',
      'venues.name as venue_name',
      'consignment_lines.insurance_value',
      'consignment_lines.currency',
      'consignments.dispatch_date',
    ])
    .where('consignment_lines.state', '=', 'consigned')
    .where('consignments.state', 'in', consignmentOutStates);
  if (consignmentId !== undefined) q = q.where('consignments.id', '=', consignmentId);
  return q.execute();
}

const consignmentColumns = [
  'consignments.id',
  'consignments.reference',
  'consignments.title',
  'consignments.state',
  'consignments.venue_id',
  'consignments.dispatch_date',
  'consignments.opening_date',
  'consignments.closing_date',
  'consignments.return_due_date',
  'consignments.terms',
  'consignments.notes',
  'consignments.agreed_at',
  'consignments.dispatched_at',
  'consignments.acknowledged_at',
  'consignments.created_at',
  'consignments.updated_at',
  'venues.name as venue_name',
  'venues.email as venue_email',
  'venues.contact_name as venue_contact_name',
  'acknowledger.name as acknowledged_by_name',
] as const;

/** One consignment the scope may see, with its venue and who acknowledged it. */
export async function findConsignmentRow(db: Db, scope: Scope, id: number) {
  return scoped
    .consignments(db, scope)
    .innerJoin('venues', 'venues.id', 'consignments.venue_id')
    .leftJoin('users as acknowledger', 'acknowledger.id', 'consignments.acknowledged_by')
    .select(consignmentColumns)
    .where('consignments.id', '=', id)
    .executeTakeFirst();
}
export type ConsignmentDetailRow = NonNullable<Awaited<ReturnType<typeof findConsignmentRow>>>;

/**
 * The lines of a consignment, first added first, each with its work and cover photo; only the
 * one asked for when `lineId` is given.
 */
export async function listLineRows(db: Db, scope: Scope, consignmentId: number, lineId?: number) {
  let q = scoped
    .consignmentLines(db, scope)
    .innerJoin('works', 'works.id', 'consignment_lines.work_id')
    .leftJoin('work_photos as cover', (join) =>
      join.onRef('cover.work_id', '=', 'works.id').on('cover.position', '=', 0),
    )
    .leftJoin('users as seller', 'seller.id', 'consignment_lines.sale_recorded_by')
    .leftJoin('users as resolver', 'resolver.id', 'consignment_lines.resolved_by')
    .select([
      'consignment_lines.id',
      'consignment_lines.work_id',
      'consignment_lines.currency',
      'consignment_lines.list_price',
      'consignment_lines.insurance_value',
      'consignment_lines.state',
      'consignment_lines.sold_on',
      'consignment_lines.sale_price',
      'consignment_lines.discount_reason',
      'consignment_lines.sale_entered_by',
      'consignment_lines.sale_recorded_at',
      'consignment_lines.resolved_on',
      'consignment_lines.resolution_note',
      'consignment_lines.resolution_photo_id',
      'consignment_lines.resolution_entered_by',
      'seller.name as seller_name',
      'resolver.name as resolver_name',
      'works.stock_number',
      'works.title',
      'works.weight_g',
      'cover.id as cover_photo_id',
    ])
    .where('consignment_lines.consignment_id', '=', consignmentId)
    .orderBy('consignment_lines.id');
  if (lineId !== undefined) q = q.where('consignment_lines.id', '=', lineId);
  return q.execute();
}
export type LineRow = Awaited<ReturnType<typeof listLineRows>>[number];

/** The highest reference number used this year, e.g. 7 for `C-2026-007`. */
export async function listReferencesLike(db: Db, scope: Scope, prefix: string) {
  const rows = await scoped
    .consignments(db, scope)
    .select('consignments.reference')
    .where(matchesLike(db, 'consignments.reference', `${prefix}%`))
    .execute();
  return rows.map((r) => r.reference);
}

/** Inserts a consignment unless its reference is taken (then undefined: try the next). */
export async function insertConsignment(
  db: Db,
  row: NewConsignmentRow,
): Promise<number | undefined> {
  const inserted = await db
    .insertInto('consignments')
    .values(row)
    .onConflict((oc) => oc.columns(['studio_id', 'reference']).doNothing())
    .returning('id')
    .executeTakeFirst();
  return inserted?.id;
}

/**
 * Changes a consignment only while it is in one of `from`: answers whether it did, so two
 * requests racing to change its state cannot both succeed.
 */
export async function updateConsignmentIn(
  db: Db,
  scope: Scope,
  id: number,
  from: readonly ConsignmentState[],
  columns: ConsignmentUpdate,
): Promise<boolean> {
  const result = await db
    .updateTable('consignments')
    .set({ ...columns, updated_at: new Date().toISOString() })
    .where('consignments.studio_id', '=', scope.studioId)
    .where('consignments.id', '=', id)
    .where('consignments.state', 'in', from)
    .executeTakeFirst();
  return Number(result.numUpdatedRows) === 1;
}

/** The line of an open consignment that holds a work, if any, with its consignment. */
export async function findHolder(db: Db, scope: Scope, workId: number) {
  return scoped
    .consignmentLines(db, scope)
    .select([
      'consignment_lines.id as line_id',
      'consignments.id',
      'consignments.reference',
      'consignments.title',
      'consignments.state',
    ])
    .where('consignment_lines.work_id', '=', workId)
    .where('consignment_lines.holds_work', '=', 1)
    .executeTakeFirst();
}

/**
 * Adds a line that holds its work. Answers its id, or undefined when another open consignment
 * (or this one) holds the work already: the database's unique hold decides a race.
 */
export async function insertHoldingLine(
  db: Db,
  scope: Scope,
  line: {
    consignmentId: number;
    workId: number;
    currency: string;
    listPrice: number;
    insuranceValue: number;
  },
): Promise<number | undefined> {
  const inserted = await db
    .insertInto('consignment_lines')
    .values({
      studio_id: scope.studioId,
      consignment_id: line.consignmentId,
      work_id: line.workId,
      currency: line.currency,
      list_price: line.listPrice,
      insurance_value: line.insuranceValue,
      holds_work: 1,
    })
    // Any clash (another line holding the work, or this consignment's earlier line of it) is an
    // answer, not an error: on PostgreSQL an error would end the transaction it is in.
    .onConflict((oc) => oc.doNothing())
    .returning('id')
    .executeTakeFirst();
  return inserted?.id;
}

export async function updateLine(
  db: Db,
  scope: Scope,
  lineId: number,
  columns: { list_price?: number; insurance_value?: number },
): Promise<void> {
  await db
    .updateTable('consignment_lines')
    .set({ ...columns, updated_at: new Date().toISOString() })
    .where('consignment_lines.studio_id', '=', scope.studioId)
    .where('consignment_lines.id', '=', lineId)
    .execute();
}

export async function deleteLine(db: Db, scope: Scope, lineId: number): Promise<void> {
  await db
    .deleteFrom('consignment_lines')
    .where('consignment_lines.studio_id', '=', scope.studioId)
    .where('consignment_lines.id', '=', lineId)
    .execute();
}

/** Every unresolved line of a consignment called off: withdrawn, its work free again. */
export async function withdrawOpenLines(db: Db, scope: Scope, consignmentId: number) {
  await db
    .updateTable('consignment_lines')
    .set({ state: 'withdrawn', holds_work: null, updated_at: new Date().toISOString() })
    .where('consignment_lines.studio_id', '=', scope.studioId)
    .where('consignment_lines.consignment_id', '=', consignmentId)
    .where('consignment_lines.state', '=', 'consigned')
    .execute();
}

/** One line of one consignment, if the scope may see it. */
export async function findLineOf(db: Db, scope: Scope, consignmentId: number, lineId: number) {
  return scoped
    .consignmentLines(db, scope)
    .innerJoin('works', 'works.id', 'consignment_lines.work_id')
    .select([
      'consignment_lines.id',
      'consignment_lines.currency',
      'consignment_lines.list_price',
      'consignment_lines.state',
      'works.stock_number',
    ])
    .where('consignments.id', '=', consignmentId)
    .where('consignment_lines.id', '=', lineId)
    .executeTakeFirst();
}

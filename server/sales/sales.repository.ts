import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { type EnteredBy } from '../db/schema/consignments';

/** A line as a sale or a return needs it: its consignment, work, and who last recorded it. */
export async function findLineForSale(db: Db, scope: Scope, lineId: number) {
  return scoped
    .consignmentLines(db, scope)
    .innerJoin('works', 'works.id', 'consignment_lines.work_id')
    .innerJoin('venues', 'venues.id', 'consignments.venue_id')
    .leftJoin('users as seller', 'seller.id', 'consignment_lines.sale_recorded_by')
    .leftJoin('users as resolver', 'resolver.id', 'consignment_lines.resolved_by')
    .select([
      'consignment_lines.id',
      'consignment_lines.consignment_id',
      'consignment_lines.work_id',
      'consignment_lines.currency',
      'consignment_lines.list_price',
      'consignment_lines.state',
      'consignment_lines.sold_on',
      'consignment_lines.sale_price',
      'consignment_lines.sale_recorded_at',
      'consignment_lines.sale_entered_by',
      'consignment_lines.sale_mail_id',
      'consignment_lines.resolved_on',
      'consignment_lines.resolution_entered_by',
      'seller.name as sold_by_name',
      'resolver.name as resolved_by_name',
      'consignments.reference',
      'consignments.state as consignment_state',
      'consignments.dispatch_date',
      'consignments.terms',
      'consignments.venue_id',
      'venues.name as venue_name',
      'works.stock_number',
      'works.title',
    ])
    .where('consignment_lines.id', '=', lineId)
    .executeTakeFirst();
}
export type SaleLineRow = NonNullable<Awaited<ReturnType<typeof findLineForSale>>>;

/**
 * Marks a line sold only while it is out: answers whether it did, so of two requests racing for
 * one piece exactly one wins. The line stops holding its work.
 */
export async function markLineSold(
  db: Db,
  scope: Scope,
  lineId: number,
  sale: {
    soldOn: string;
    salePrice: number;
    discount: number | null;
    discountReason: string | null;
    enteredBy: EnteredBy;
    at: string;
  },
): Promise<boolean> {
  const result = await db
    .updateTable('consignment_lines')
    .set({
      state: 'sold',
      sold_on: sale.soldOn,
      sale_price: sale.salePrice,
      discount: sale.discount,
      discount_reason: sale.discountReason,
      sale_recorded_by: scope.userId,
      sale_recorded_at: sale.at,
      sale_entered_by: sale.enteredBy,
      holds_work: null,
      updated_at: sale.at,
    })
    .where('consignment_lines.studio_id', '=', scope.studioId)
    .where('consignment_lines.id', '=', lineId)
    .where('consignment_lines.state', '=', 'consigned')
    .executeTakeFirst();
  return Number(result.numUpdatedRows) === 1;
}

/** Puts a sold line back out (its sale undone): answers whether it was still sold. */
export async function unmarkLineSold(
  db: Db,
  scope: Scope,
  lineId: number,
  at: string,
): Promise<boolean> {
  const result = await db
    .updateTable('consignment_lines')
    .set({
      state: 'consigned',
      sold_on: null,
      sale_price: null,
      discount: null,
      discount_reason: null,
      sale_recorded_by: null,
      sale_recorded_at: null,
      sale_entered_by: null,
      sale_mail_id: null,
      holds_work: 1,
      updated_at: at,
    })
    .where('consignment_lines.studio_id', '=', scope.studioId)
    .where('consignment_lines.id', '=', lineId)
    .where('consignment_lines.state', '=', 'sold')
    .executeTakeFirst();
  return Number(result.numUpdatedRows) === 1;
}

/** Resolves a line still out as returned, damaged, lost or withdrawn; answers whether it was out. */
export async function markLineResolved(
  db: Db,
  scope: Scope,
  lineId: number,
  resolution: {
    state: 'returned' | 'damaged' | 'lost' | 'withdrawn';
    on: string;
    note: string | null;
    photoFileId: number | null;
    enteredBy: EnteredBy;
    at: string;
  },
): Promise<boolean> {
  const result = await db
    .updateTable('consignment_lines')
    .set({
      state: resolution.state,
      resolved_on: resolution.on,
      resolution_note: resolution.note,
      resolution_photo_id: resolution.photoFileId,
      resolved_by: scope.userId,
      resolved_at: resolution.at,
      resolution_entered_by: resolution.enteredBy,
      holds_work: null,
      updated_at: resolution.at,
    })
    .where('consignment_lines.studio_id', '=', scope.studioId)
    .where('consignment_lines.id', '=', lineId)
    .where('consignment_lines.state', '=', 'consigned')
    .executeTakeFirst();
  return Number(result.numUpdatedRows) === 1;
}

/** The issued statement that covers a sold line, if any: its sale is locked from then on. */
export async function findIssuedStatementOf(db: Db, scope: Scope, lineId: number) {
  return db
    .selectFrom('statement_lines')
    .innerJoin('statements', 'statements.id', 'statement_lines.statement_id')
    .select(['statements.reference', 'statements.issued_at'])
    .where('statements.studio_id', '=', scope.studioId)
    .where('statement_lines.consignment_line_id', '=', lineId)
    .where('statements.state', 'in', ['issued', 'settled'])
    .executeTakeFirst();
}

/** The references of the issued statements covering each of `lineIds`. */
export async function listStatementLocks(db: Db, scope: Scope, lineIds: readonly number[]) {
  if (lineIds.length === 0) return new Map<number, string>();
  const rows = await db
    .selectFrom('statement_lines')
    .innerJoin('statements', 'statements.id', 'statement_lines.statement_id')
    .select(['statement_lines.consignment_line_id', 'statements.reference'])
    .where('statements.studio_id', '=', scope.studioId)
    .where('statement_lines.consignment_line_id', 'in', lineIds)
    .where('statements.state', 'in', ['issued', 'settled'])
    .execute();
  return new Map(rows.map((r) => [r.consignment_line_id, r.reference]));
}

/** The sales of the studio, newest first, for the overview. */
export async function listRecentSales(db: Db, scope: Scope, limit: number) {
  return scoped
    .consignmentLines(db, scope)
    .innerJoin('works', 'works.id', 'consignment_lines.work_id')
    .innerJoin('venues', 'venues.id', 'consignments.venue_id')
    .select([
      'consignment_lines.id',
      'consignment_lines.consignment_id',
      'consignment_lines.currency',
      'consignment_lines.list_price',
      'consignment_lines.sale_price',
      'consignment_lines.sold_on',
      'consignment_lines.sale_entered_by',
      'consignments.reference',
      'consignments.terms',
      'venues.name as venue_name',
      'works.stock_number',
      'works.title',
    ])
    .where('consignment_lines.state', '=', 'sold')
    .orderBy('consignment_lines.sold_on', 'desc')
    .orderBy('consignment_lines.sale_recorded_at', 'desc')
    .orderBy('consignment_lines.id', 'desc')
    .limit(limit)
    .execute();
}

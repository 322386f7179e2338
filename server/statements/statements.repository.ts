import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { lockedForUpdate } from '../db/dialect';
import {
  type NewStatementRow,
  type StatementState,
  type StatementUpdate,
} from '../db/schema/statements';
import { matchesLike } from '../db/text-search';

/** One statement the scope may see, with its venue and consignment. */
export async function findStatementRow(db: Db, scope: Scope, id: number) {
  return scoped
    .statements(db, scope)
    .innerJoin('venues', 'venues.id', 'statements.venue_id')
    .leftJoin('consignments', 'consignments.id', 'statements.consignment_id')
    .selectAll('statements')
    .select([
      'venues.name as venue_name',
      'consignments.reference as consignment_reference',
      'consignments.title as consignment_title',
      'consignments.terms as consignment_terms',
      'consignments.closing_date',
    ])
    .where('statements.id', '=', id)
    .executeTakeFirst();
}
export type StatementRow = NonNullable<Awaited<ReturnType<typeof findStatementRow>>>;

/** The scope's statements, newest first. */
export async function listStatementRows(db: Db, scope: Scope) {
  return scoped
    .statements(db, scope)
    .innerJoin('venues', 'venues.id', 'statements.venue_id')
    .leftJoin('consignments', 'consignments.id', 'statements.consignment_id')
    .selectAll('statements')
    .select([
      'venues.name as venue_name',
      'consignments.reference as consignment_reference',
      'consignments.title as consignment_title',
    ])
    .orderBy('statements.created_at', 'desc')
    .orderBy('statements.id', 'desc')
    .execute();
}

export async function listStatementReferencesLike(db: Db, scope: Scope, prefix: string) {
  const rows = await scoped
    .statements(db, scope)
    .select('statements.reference')
    .where(matchesLike(db, 'statements.reference', `${prefix}%`))
    .execute();
  return rows.map((r) => r.reference);
}

/** Inserts a statement unless its reference is taken (then undefined: try the next). */
export async function insertStatement(db: Db, row: NewStatementRow) {
  const inserted = await db
    .insertInto('statements')
    .values(row)
    .onConflict((oc) => oc.columns(['studio_id', 'reference']).doNothing())
    .returning('id')
    .executeTakeFirst();
  return inserted?.id;
}

/** A draft statement already open for the consignment, if any. */
export async function findDraftFor(db: Db, scope: Scope, consignmentId: number) {
  return scoped
    .statements(db, scope)
    .select(['statements.id', 'statements.reference'])
    .where('statements.consignment_id', '=', consignmentId)
    .where('statements.state', '=', 'draft')
    .executeTakeFirst();
}

const saleColumns = [
  'consignment_lines.id',
  'consignment_lines.currency',
  'consignment_lines.list_price',
  'consignment_lines.sale_price',
  'consignment_lines.sold_on',
  'consignments.id as consignment_id',
  'consignments.reference as consignment_reference',
  'consignments.terms',
  'consignments.closing_date',
  'works.stock_number',
  'works.title',
] as const;

/**
 * The sales a new statement covers: sold lines of the consignment, or of the venue's consignments
 * sold within the period, that no issued statement covers yet.
 */
export async function listUnstatedSales(
  db: Db,
  scope: Scope,
  of: { consignmentId: number } | { venueId: number; from: string; to: string },
) {
  let q = scoped
    .consignmentLines(db, scope)
    .innerJoin('works', 'works.id', 'consignment_lines.work_id')
    .select(saleColumns)
    .where('consignment_lines.state', '=', 'sold')
    .where(({ not, exists, selectFrom }) =>
      not(
        exists(
          selectFrom('statement_lines')
            .innerJoin('statements', 'statements.id', 'statement_lines.statement_id')
            .select('statement_lines.consignment_line_id')
            .whereRef('statement_lines.consignment_line_id', '=', 'consignment_lines.id')
            .where('statements.state', 'in', ['issued', 'settled']),
        ),
      ),
    );
  if ('consignmentId' in of) q = q.where('consignments.id', '=', of.consignmentId);
  else {
    q = q
      .where('consignments.venue_id', '=', of.venueId)
      .where('consignment_lines.sold_on', '>=', of.from)
      .where('consignment_lines.sold_on', '<=', of.to);
  }
  return q.orderBy('consignment_lines.sold_on').orderBy('consignment_lines.id').execute();
}
export type SaleRow = Awaited<ReturnType<typeof listUnstatedSales>>[number];

/** The sales an issued statement covers, with their split as issued. */
export async function listFrozenLines(db: Db, scope: Scope, statementId: number) {
  return scoped
    .consignmentLines(db, { ...scope, venueId: null })
    .innerJoin('statement_lines', 'statement_lines.consignment_line_id', 'consignment_lines.id')
    .innerJoin('works', 'works.id', 'consignment_lines.work_id')
    .select([
      ...saleColumns,
      'statement_lines.sale_price as frozen_price',
      'statement_lines.commission',
      'statement_lines.vat_on_commission',
      'statement_lines.maker_share',
    ])
    .where('statement_lines.statement_id', '=', statementId)
    .orderBy('consignment_lines.sold_on')
    .orderBy('consignment_lines.id')
    .execute();
}

/** Changes a statement only while it is in one of `from`: answers whether it did. */
export async function updateStatementIn(
  db: Db,
  scope: Scope,
  id: number,
  from: readonly StatementState[],
  columns: StatementUpdate,
): Promise<boolean> {
  const result = await db
    .updateTable('statements')
    .set({ ...columns, updated_at: new Date().toISOString() })
    .where('statements.studio_id', '=', scope.studioId)
    .where('statements.id', '=', id)
    .where('statements.state', 'in', from)
    .executeTakeFirst();
  return Number(result.numUpdatedRows) === 1;
}

export async function insertStatementLines(
  db: Db,
  rows: {
    statement_id: number;
    consignment_line_id: number;
    sale_price: number;
    commission: number;
    vat_on_commission: number;
    maker_share: number;
  }[],
) {
  if (rows.length > 0) await db.insertInto('statement_lines').values(rows).execute();
}

export async function listPayments(db: Db, scope: Scope, statementId: number) {
  return db
    .selectFrom('payments')
    .selectAll()
    .where('studio_id', '=', scope.studioId)
    .where('statement_id', '=', statementId)
    .where('state', '=', 'received')
    .orderBy('received_on')
    .orderBy('id')
    .execute();
}

/**
 * Records a payment received. One the provider reports carries its payment's id, which is
 * unique: the same payment reported again inserts nothing and answers undefined.
 */
export async function insertPayment(
  db: Db,
  scope: Scope,
  payment: {
    venueId: number;
    statementId: number;
    amount: number;
    currency: string;
    method: 'bank-transfer' | 'cheque' | 'cash' | 'online';
    receivedOn: string;
    reference: string | null;
    providerPaymentId?: string | null;
  },
): Promise<number | undefined> {
  const inserted = await db
    .insertInto('payments')
    .values({
      studio_id: scope.studioId,
      venue_id: payment.venueId,
      statement_id: payment.statementId,
      amount: payment.amount,
      currency: payment.currency,
      method: payment.method,
      state: 'received',
      received_on: payment.receivedOn,
      reference: payment.reference,
      provider_payment_id: payment.providerPaymentId ?? null,
      recorded_by: scope.userId,
    })
    .onConflict((oc) => oc.column('provider_payment_id').doNothing())
    .returning('id')
    .executeTakeFirst();
  return inserted?.id;
}

export async function listAdjustments(db: Db, scope: Scope, statementId: number) {
  return db
    .selectFrom('statement_adjustments')
    .selectAll()
    .where('studio_id', '=', scope.studioId)
    .where('statement_id', '=', statementId)
    .orderBy('id')
    .execute();
}

export async function insertAdjustment(
  db: Db,
  scope: Scope,
  adjustment: {
    statementId: number;
    kind: 'unreported-sale' | 'discount-not-agreed' | 'fee-deducted' | 'rounding' | 'other';
    amount: number;
    currency: string;
    note: string | null;
  },
) {
  const { id } = await db
    .insertInto('statement_adjustments')
    .values({
      studio_id: scope.studioId,
      statement_id: adjustment.statementId,
      kind: adjustment.kind,
      amount: adjustment.amount,
      currency: adjustment.currency,
      note: adjustment.note,
      created_by: scope.userId,
      created_at: new Date().toISOString(),
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return id;
}

/** The states of a consignment's statements other than void ones. */
export async function listStatementStatesOf(db: Db, scope: Scope, consignmentId: number) {
  const rows = await scoped
    .statements(db, scope)
    .select('statements.state')
    .where('statements.consignment_id', '=', consignmentId)
    .where('statements.state', '!=', 'void')
    .execute();
  return rows.map((r) => r.state);
}

/**
 * Locks the statement's row until the transaction ends (on PostgreSQL): issuing it, and payments
 * and explanations that may settle it, each work out its balance from what the one before left.
 */
export async function lockStatement(db: Db, scope: Scope, id: number): Promise<void> {
  await db
    .selectFrom('statements')
    .select('statements.id')
    .where('statements.studio_id', '=', scope.studioId)
    .where('statements.id', '=', id)
    .$call(lockedForUpdate(db))
    .execute();
}

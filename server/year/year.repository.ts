import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';

/** Every sale of the studio from `from` to `to`, with its terms, venue and series. */
export async function listSalesBetween(db: Db, scope: Scope, from: string, to: string) {
  return scoped
    .consignmentLines(db, scope)
    .innerJoin('works', 'works.id', 'consignment_lines.work_id')
    .innerJoin('venues', 'venues.id', 'consignments.venue_id')
    .select([
      'consignment_lines.id',
      'consignment_lines.currency',
      'consignment_lines.list_price',
      'consignment_lines.sale_price',
      'consignment_lines.sold_on',
      'consignments.terms',
      'consignments.venue_id',
      'venues.name as venue_name',
      'works.series',
    ])
    .where('consignment_lines.state', '=', 'sold')
    .where('consignment_lines.sold_on', '>=', from)
    .where('consignment_lines.sold_on', '<=', to)
    .execute();
}

/** Payments received from `from` to `to`, by venue and currency. */
export async function listPaymentsBetween(db: Db, scope: Scope, from: string, to: string) {
  return db
    .selectFrom('payments')
    .select(['venue_id', 'currency', 'amount', 'received_on'])
    .where('studio_id', '=', scope.studioId)
    .where('state', '=', 'received')
    .where('received_on', '>=', from)
    .where('received_on', '<=', to)
    .execute();
}

/**
 * Every line that has been sent, with the day it stopped being out (sold, returned, resolved),
 * for exposure over time and the sale-or-return age check.
 */
export async function listSentLines(db: Db, scope: Scope) {
  return scoped
    .consignmentLines(db, scope)
    .innerJoin('works', 'works.id', 'consignment_lines.work_id')
    .innerJoin('venues', 'venues.id', 'consignments.venue_id')
    .select([
      'consignment_lines.id',
      'consignment_lines.currency',
      'consignment_lines.insurance_value',
      'consignment_lines.state',
      'consignment_lines.sold_on',
      'consignment_lines.resolved_on',
      'consignments.id as consignment_id',
      'consignments.reference',
      'consignments.dispatch_date',
      'consignments.terms',
      'consignments.venue_id',
      'venues.name as venue_name',
      'works.stock_number',
      'works.title',
    ])
    .where('consignments.state', 'in', ['dispatched', 'on-show', 'closed', 'settled'])
    .where('consignment_lines.state', '!=', 'withdrawn')
    .execute();
}

/** Sales for the accountant's file, with the statement that covers each. */
export async function listAccountSales(db: Db, scope: Scope, from: string, to: string) {
  return scoped
    .consignmentLines(db, scope)
    .innerJoin('works', 'works.id', 'consignment_lines.work_id')
    .innerJoin('venues', 'venues.id', 'consignments.venue_id')
    .leftJoin('statement_lines', 'statement_lines.consignment_line_id', 'consignment_lines.id')
    .leftJoin('statements', (join) =>
      join
        .onRef('statements.id', '=', 'statement_lines.statement_id')
        .on('statements.state', 'in', ['issued', 'settled']),
    )
    .select([
      'consignment_lines.id',
      'consignment_lines.currency',
      'consignment_lines.list_price',
      'consignment_lines.sale_price',
      'consignment_lines.sold_on',
      'consignment_lines.discount_reason',
      'consignments.reference',
      'consignments.terms',
      'venues.name as venue_name',
      'works.stock_number',
      'works.title',
      'statements.reference as statement_reference',
    ])
    .where('consignment_lines.state', '=', 'sold')
    .where('consignment_lines.sold_on', '>=', from)
    .where('consignment_lines.sold_on', '<=', to)
    .orderBy('consignment_lines.sold_on')
    .orderBy('consignment_lines.id')
    .execute();
}

/** Payments received for the accountant's file. */
export async function listAccountPayments(db: Db, scope: Scope, from: string, to: string) {
  return db
    .selectFrom('payments')
    .innerJoin('venues', 'venues.id', 'payments.venue_id')
    .leftJoin('statements', 'statements.id', 'payments.statement_id')
    .select([
      'payments.received_on',
      'payments.method',
      'payments.reference',
      'payments.currency',
      'payments.amount',
      'venues.name as venue_name',
      'statements.reference as statement_reference',
    ])
    .where('payments.studio_id', '=', scope.studioId)
    .where('payments.state', '=', 'received')
    .where('payments.received_on', '>=', from)
    .where('payments.received_on', '<=', to)
    .orderBy('payments.received_on')
    .orderBy('payments.id')
    .execute();
}

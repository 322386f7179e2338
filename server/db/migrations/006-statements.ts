import { type Kysely, sql } from 'kysely';

import { autoId } from '../dialect';

// Frozen: this migration takes Kysely<any> and imports no app code, only the dialect's helpers.

/**
 * What closing a show and accounting for it needs beyond the first schema: a statement's frozen VAT
 * totals and the terms it was issued under, who closed a consignment and when, and the maker's
 * explanations of a difference between what was owed and what was paid.
 */
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('statements').addColumn('output_vat_total', 'integer').execute();
  await db.schema.alterTable('statements').addColumn('reclaimable_vat_total', 'integer').execute();
  await db.schema.alterTable('statements').addColumn('terms', 'text').execute();
  await db.schema.alterTable('statements').addColumn('settled_at', 'text').execute();
  await db.schema.alterTable('consignments').addColumn('closed_at', 'text').execute();
  await db.schema.alterTable('consignments').addColumn('settled_at', 'text').execute();

  await db.schema
    .createTable('statement_adjustments')
    .addColumn('id', 'integer', autoId(db))
    .addColumn('studio_id', 'integer', (c) => c.notNull().references('studios.id'))
    .addColumn('statement_id', 'integer', (c) =>
      c.notNull().references('statements.id').onDelete('cascade'),
    )
    .addColumn('kind', 'text', (c) =>
      c
        .notNull()
        .check(
          sql`kind in ('unreported-sale', 'discount-not-agreed', 'fee-deducted', 'rounding', 'other')`,
        ),
    )
    // Minor units, signed: what it takes off the balance owed (negative adds to it).
    .addColumn('amount', 'integer', (c) => c.notNull().check(sql`amount <> 0`))
    .addColumn('currency', 'text', (c) => c.notNull())
    .addColumn('note', 'text')
    .addColumn('created_by', 'text', (c) => c.references('users.id').onDelete('set null'))
    .addColumn('created_at', 'text', (c) => c.notNull())
    .execute();
  await db.schema
    .createIndex('statement_adjustments_statement')
    .on('statement_adjustments')
    .column('statement_id')
    .execute();
  await db.schema.createIndex('payments_statement').on('payments').column('statement_id').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropIndex('payments_statement').execute();
  await db.schema.dropTable('statement_adjustments').execute();
  await db.schema.alterTable('consignments').dropColumn('settled_at').execute();
  await db.schema.alterTable('consignments').dropColumn('closed_at').execute();
  for (const column of ['settled_at', 'terms', 'reclaimable_vat_total', 'output_vat_total']) {
    await db.schema.alterTable('statements').dropColumn(column).execute();
  }
}

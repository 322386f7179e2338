import { type Kysely, sql } from 'kysely';

// Frozen: this migration takes Kysely<any> and imports no app code.

/**
 * What recording sales and returns needs: why a price was discounted, which side entered a sale
 * or a return, the note and photo of a return or damage and who recorded it, and the sale e-mail
 * a sale is waiting in (so several sales within minutes go to the maker as one message).
 */
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('consignment_lines').addColumn('discount_reason', 'text').execute();
  await db.schema
    .alterTable('consignment_lines')
    .addColumn('sale_entered_by', 'text', (c) =>
      c.check(sql`sale_entered_by in ('venue', 'studio')`),
    )
    .execute();
  await db.schema
    .alterTable('consignment_lines')
    .addColumn('sale_mail_id', 'integer', (c) => c.references('outbox.id').onDelete('set null'))
    .execute();
  await db.schema.alterTable('consignment_lines').addColumn('resolution_note', 'text').execute();
  await db.schema
    .alterTable('consignment_lines')
    .addColumn('resolution_photo_id', 'integer', (c) => c.references('files.id'))
    .execute();
  await db.schema
    .alterTable('consignment_lines')
    .addColumn('resolved_by', 'text', (c) => c.references('users.id').onDelete('set null'))
    .execute();
  await db.schema.alterTable('consignment_lines').addColumn('resolved_at', 'text').execute();
  await db.schema
    .alterTable('consignment_lines')
    .addColumn('resolution_entered_by', 'text', (c) =>
      c.check(sql`resolution_entered_by in ('venue', 'studio')`),
    )
    .execute();
  await db.schema
    .createIndex('consignment_lines_sold_on')
    .on('consignment_lines')
    .columns(['studio_id', 'sold_on'])
    .execute();
  await db.schema
    .createIndex('consignment_lines_sale_mail')
    .on('consignment_lines')
    .column('sale_mail_id')
    .execute();
  await db.schema
    .createIndex('statement_lines_line')
    .on('statement_lines')
    .column('consignment_line_id')
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropIndex('statement_lines_line').execute();
  await db.schema.dropIndex('consignment_lines_sale_mail').execute();
  await db.schema.dropIndex('consignment_lines_sold_on').execute();
  for (const column of [
    'resolution_entered_by',
    'resolved_at',
    'resolved_by',
    'resolution_photo_id',
    'resolution_note',
    'sale_mail_id',
    'sale_entered_by',
    'discount_reason',
  ]) {
    await db.schema.alterTable('consignment_lines').dropColumn(column).execute();
  }
}

import { type Kysely } from 'kysely';

// Frozen: this migration takes Kysely<any> and imports no app code.

/**
 * What sending a batch needs beyond the first schema: when a consignment was sent and
 * acknowledged (and by whom), and which line holds each work while it is on an open consignment.
 */
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('consignments').addColumn('dispatched_at', 'text').execute();
  await db.schema.alterTable('consignments').addColumn('acknowledged_at', 'text').execute();
  await db.schema
    .alterTable('consignments')
    .addColumn('acknowledged_by', 'text', (c) => c.references('users.id').onDelete('set null'))
    .execute();
  await db.schema.alterTable('consignments').addColumn('cancelled_at', 'text').execute();

  // 1 while the line holds its work (an open consignment, the piece not yet resolved), null
  // otherwise. Unique with the work: nulls never clash, so one line at most holds a work, and
  // the database refuses a second however two requests race.
  await db.schema.alterTable('consignment_lines').addColumn('holds_work', 'integer').execute();
  await db.schema
    .createIndex('consignment_lines_one_hold_per_work')
    .unique()
    .on('consignment_lines')
    .columns(['work_id', 'holds_work'])
    .execute();
  await db
    .updateTable('consignment_lines')
    .set({ holds_work: 1 })
    .where('state', '=', 'consigned')
    .where(
      'consignment_id',
      'in',
      db
        .selectFrom('consignments')
        .select('id')
        .where('state', 'in', ['draft', 'agreed', 'dispatched', 'on-show']),
    )
    .execute();

  await db.schema
    .createIndex('condition_reports_line')
    .on('condition_reports')
    .columns(['consignment_line_id', 'stage'])
    .execute();
  await db.schema
    .createIndex('condition_findings_report')
    .on('condition_findings')
    .column('report_id')
    .execute();
  await db.schema
    .createIndex('invitations_email')
    .on('invitations')
    .columns(['studio_id', 'email'])
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropIndex('invitations_email').execute();
  await db.schema.dropIndex('condition_findings_report').execute();
  await db.schema.dropIndex('condition_reports_line').execute();
  await db.schema.dropIndex('consignment_lines_one_hold_per_work').execute();
  await db.schema.alterTable('consignment_lines').dropColumn('holds_work').execute();
  for (const column of ['cancelled_at', 'acknowledged_by', 'acknowledged_at', 'dispatched_at']) {
    await db.schema.alterTable('consignments').dropColumn(column).execute();
  }
}

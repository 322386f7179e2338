import { type Kysely, sql } from 'kysely';

import { autoId, nowDefault } from '../dialect';

// Frozen: this migration takes Kysely<any> and imports no app code, only the dialect's helpers.
// Change the schema with a new numbered migration, never by editing this one. (It was written for
// SQLite alone; the helpers give PostgreSQL the same tables and leave SQLite's as they were.)

function oneOf(column: string, values: readonly string[]) {
  return sql.raw(`${column} in (${values.map((v) => `'${v}'`).join(', ')})`);
}

export async function up(db: Kysely<any>): Promise<void> {
  const now = nowDefault(db);
  // Identity tables, in the shape better-auth expects (its fields mapped to snake_case).
  await db.schema
    .createTable('users')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('email', 'text', (c) => c.notNull().unique())
    .addColumn('email_verified', 'integer', (c) => c.notNull().defaultTo(0))
    .addColumn('image', 'text')
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .addColumn('updated_at', 'text', (c) => c.notNull().defaultTo(now))
    .execute();

  await db.schema
    .createTable('accounts')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('user_id', 'text', (c) => c.notNull().references('users.id').onDelete('cascade'))
    .addColumn('account_id', 'text', (c) => c.notNull())
    .addColumn('provider_id', 'text', (c) => c.notNull())
    .addColumn('access_token', 'text')
    .addColumn('refresh_token', 'text')
    .addColumn('id_token', 'text')
    .addColumn('access_token_expires_at', 'text')
    .addColumn('refresh_token_expires_at', 'text')
    .addColumn('scope', 'text')
    .addColumn('password', 'text')
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .addColumn('updated_at', 'text', (c) => c.notNull().defaultTo(now))
    .execute();
  await db.schema.createIndex('accounts_user_id').on('accounts').column('user_id').execute();

  await db.schema
    .createTable('verifications')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('identifier', 'text', (c) => c.notNull())
    .addColumn('value', 'text', (c) => c.notNull())
    .addColumn('expires_at', 'text', (c) => c.notNull())
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .addColumn('updated_at', 'text', (c) => c.notNull().defaultTo(now))
    .execute();

  await db.schema
    .createTable('studios')
    .addColumn('id', 'integer', autoId(db))
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('country', 'text', (c) => c.notNull().defaultTo('GB'))
    .addColumn('currency', 'text', (c) => c.notNull().defaultTo('GBP'))
    .addColumn('locale', 'text', (c) => c.notNull().defaultTo('en-GB'))
    .addColumn('time_zone', 'text', (c) => c.notNull().defaultTo('Europe/London'))
    .addColumn('vat_number', 'text')
    .addColumn('stock_number_pattern', 'text', (c) => c.notNull().defaultTo('{YYYY}-{NNN}'))
    .addColumn('price_step', 'integer', (c) => c.notNull().defaultTo(500))
    .addColumn('default_terms', 'text')
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .addColumn('updated_at', 'text', (c) => c.notNull().defaultTo(now))
    .execute();

  await db.schema
    .createTable('venues')
    .addColumn('id', 'integer', autoId(db))
    .addColumn('studio_id', 'integer', (c) => c.notNull().references('studios.id'))
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('kind', 'text', (c) =>
      c.notNull().check(oneOf('kind', ['gallery', 'shop', 'fair', 'exhibition', 'open-studio'])),
    )
    .addColumn('address_line1', 'text')
    .addColumn('address_line2', 'text')
    .addColumn('town', 'text')
    .addColumn('postcode', 'text')
    .addColumn('country', 'text')
    .addColumn('contact_name', 'text')
    .addColumn('email', 'text')
    .addColumn('phone', 'text')
    .addColumn('vat_number', 'text')
    .addColumn('default_terms', 'text', (c) => c.notNull())
    .addColumn('notes', 'text')
    .addColumn('archived_at', 'text')
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .addColumn('updated_at', 'text', (c) => c.notNull().defaultTo(now))
    .execute();
  await db.schema.createIndex('venues_studio_id').on('venues').column('studio_id').execute();

  await db.schema
    .createTable('memberships')
    .addColumn('id', 'integer', autoId(db))
    .addColumn('user_id', 'text', (c) => c.notNull().references('users.id').onDelete('cascade'))
    .addColumn('studio_id', 'integer', (c) => c.notNull().references('studios.id'))
    .addColumn('role', 'text', (c) =>
      c.notNull().check(oneOf('role', ['owner', 'assistant', 'gallery'])),
    )
    .addColumn('venue_id', 'integer', (c) => c.references('venues.id'))
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .addUniqueConstraint('memberships_user_studio', ['user_id', 'studio_id'])
    // The gallery role is bound to exactly one venue; the studio roles to none.
    .addCheckConstraint(
      'memberships_venue_for_gallery',
      sql`(role = 'gallery') = (venue_id is not null)`,
    )
    .execute();

  // After memberships, which a session's active membership refers to (PostgreSQL checks that a
  // referenced table exists).
  await db.schema
    .createTable('sessions')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('user_id', 'text', (c) => c.notNull().references('users.id').onDelete('cascade'))
    .addColumn('token', 'text', (c) => c.notNull().unique())
    .addColumn('expires_at', 'text', (c) => c.notNull())
    .addColumn('ip_address', 'text')
    .addColumn('user_agent', 'text')
    .addColumn('active_membership_id', 'integer', (c) =>
      c.references('memberships.id').onDelete('set null'),
    )
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .addColumn('updated_at', 'text', (c) => c.notNull().defaultTo(now))
    .execute();
  await db.schema.createIndex('sessions_user_id').on('sessions').column('user_id').execute();

  await db.schema
    .createTable('invitations')
    .addColumn('id', 'integer', autoId(db))
    .addColumn('studio_id', 'integer', (c) => c.notNull().references('studios.id'))
    .addColumn('email', 'text', (c) => c.notNull())
    .addColumn('role', 'text', (c) =>
      c.notNull().check(oneOf('role', ['owner', 'assistant', 'gallery'])),
    )
    .addColumn('venue_id', 'integer', (c) => c.references('venues.id'))
    .addColumn('token_hash', 'text', (c) => c.notNull().unique())
    .addColumn('invited_by', 'text', (c) => c.references('users.id').onDelete('set null'))
    .addColumn('expires_at', 'text', (c) => c.notNull())
    .addColumn('accepted_at', 'text')
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .addCheckConstraint(
      'invitations_venue_for_gallery',
      sql`(role = 'gallery') = (venue_id is not null)`,
    )
    .execute();

  await db.schema
    .createTable('files')
    .addColumn('id', 'integer', autoId(db))
    .addColumn('studio_id', 'integer', (c) => c.notNull().references('studios.id'))
    .addColumn('sha256', 'text', (c) => c.notNull())
    .addColumn('mime_type', 'text', (c) => c.notNull())
    .addColumn('byte_size', 'integer', (c) => c.notNull())
    .addColumn('original_name', 'text')
    .addColumn('width_px', 'integer')
    .addColumn('height_px', 'integer')
    .addColumn('created_by', 'text', (c) => c.references('users.id').onDelete('set null'))
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .addUniqueConstraint('files_studio_sha256', ['studio_id', 'sha256'])
    .execute();

  await db.schema
    .createTable('works')
    .addColumn('id', 'integer', autoId(db))
    .addColumn('studio_id', 'integer', (c) => c.notNull().references('studios.id'))
    .addColumn('stock_number', 'text', (c) => c.notNull())
    .addColumn('title', 'text', (c) => c.notNull())
    .addColumn('year', 'integer')
    .addColumn('series', 'text')
    .addColumn('category', 'text')
    .addColumn('clay_body', 'text')
    .addColumn('glaze', 'text')
    .addColumn('firing_temp_c', 'integer')
    .addColumn('atmosphere', 'text')
    .addColumn('kiln', 'text')
    .addColumn('height_mm', 'integer')
    .addColumn('width_mm', 'integer')
    .addColumn('depth_mm', 'integer')
    .addColumn('weight_g', 'integer')
    .addColumn('retail_price', 'integer', (c) => c.notNull().check(sql`retail_price >= 0`))
    .addColumn('currency', 'text', (c) => c.notNull())
    .addColumn('cost_price', 'integer', (c) => c.check(sql`cost_price >= 0`))
    .addColumn('food_use', 'text', (c) =>
      c
        .notNull()
        .defaultTo('not-stated')
        .check(oneOf('food_use', ['food-safe', 'decorative', 'not-stated'])),
    )
    .addColumn('care_notes', 'text')
    .addColumn('notes', 'text')
    .addColumn('archived_at', 'text')
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .addColumn('updated_at', 'text', (c) => c.notNull().defaultTo(now))
    .addUniqueConstraint('works_studio_stock_number', ['studio_id', 'stock_number'])
    .execute();

  await db.schema
    .createTable('work_photos')
    .addColumn('id', 'integer', autoId(db))
    .addColumn('work_id', 'integer', (c) => c.notNull().references('works.id').onDelete('cascade'))
    .addColumn('file_id', 'integer', (c) => c.notNull().references('files.id'))
    .addColumn('position', 'integer', (c) => c.notNull())
    .addColumn('caption', 'text')
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .addUniqueConstraint('work_photos_work_position', ['work_id', 'position'])
    .execute();

  await db.schema
    .createTable('consignments')
    .addColumn('id', 'integer', autoId(db))
    .addColumn('studio_id', 'integer', (c) => c.notNull().references('studios.id'))
    .addColumn('venue_id', 'integer', (c) => c.notNull().references('venues.id'))
    .addColumn('reference', 'text', (c) => c.notNull())
    .addColumn('title', 'text', (c) => c.notNull())
    .addColumn('state', 'text', (c) =>
      c
        .notNull()
        .defaultTo('draft')
        .check(
          oneOf('state', [
            'draft',
            'agreed',
            'dispatched',
            'on-show',
            'closed',
            'settled',
            'cancelled',
          ]),
        ),
    )
    .addColumn('dispatch_date', 'text')
    .addColumn('opening_date', 'text')
    .addColumn('closing_date', 'text')
    .addColumn('return_due_date', 'text')
    // The terms as agreed, copied from the venue; later changes to the venue leave them alone.
    .addColumn('terms', 'text')
    .addColumn('agreed_at', 'text')
    .addColumn('notes', 'text')
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .addColumn('updated_at', 'text', (c) => c.notNull().defaultTo(now))
    .addUniqueConstraint('consignments_studio_reference', ['studio_id', 'reference'])
    .addCheckConstraint(
      'consignments_terms_when_agreed',
      sql`state in ('draft', 'cancelled') or terms is not null`,
    )
    .execute();
  await db.schema
    .createIndex('consignments_studio_venue')
    .on('consignments')
    .columns(['studio_id', 'venue_id'])
    .execute();

  await db.schema
    .createTable('consignment_lines')
    .addColumn('id', 'integer', autoId(db))
    .addColumn('studio_id', 'integer', (c) => c.notNull().references('studios.id'))
    .addColumn('consignment_id', 'integer', (c) =>
      c.notNull().references('consignments.id').onDelete('cascade'),
    )
    .addColumn('work_id', 'integer', (c) => c.notNull().references('works.id'))
    .addColumn('currency', 'text', (c) => c.notNull())
    .addColumn('list_price', 'integer', (c) => c.notNull().check(sql`list_price >= 0`))
    .addColumn('insurance_value', 'integer', (c) => c.notNull().check(sql`insurance_value >= 0`))
    .addColumn('state', 'text', (c) =>
      c
        .notNull()
        .defaultTo('consigned')
        .check(oneOf('state', ['consigned', 'sold', 'returned', 'damaged', 'lost', 'withdrawn'])),
    )
    .addColumn('sold_on', 'text')
    .addColumn('sale_price', 'integer', (c) => c.check(sql`sale_price >= 0`))
    .addColumn('discount', 'integer', (c) => c.check(sql`discount >= 0`))
    .addColumn('sale_recorded_by', 'text', (c) => c.references('users.id').onDelete('set null'))
    .addColumn('sale_recorded_at', 'text')
    .addColumn('resolved_on', 'text')
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .addColumn('updated_at', 'text', (c) => c.notNull().defaultTo(now))
    .addUniqueConstraint('consignment_lines_consignment_work', ['consignment_id', 'work_id'])
    .addCheckConstraint(
      'consignment_lines_sale_when_sold',
      sql`(state = 'sold') = (sale_price is not null and sold_on is not null)`,
    )
    .execute();
  await db.schema
    .createIndex('consignment_lines_work')
    .on('consignment_lines')
    .columns(['work_id', 'id'])
    .execute();

  await db.schema
    .createTable('condition_reports')
    .addColumn('id', 'integer', autoId(db))
    .addColumn('studio_id', 'integer', (c) => c.notNull().references('studios.id'))
    .addColumn('work_id', 'integer', (c) => c.notNull().references('works.id'))
    .addColumn('consignment_line_id', 'integer', (c) =>
      c.references('consignment_lines.id').onDelete('set null'),
    )
    .addColumn('stage', 'text', (c) =>
      c.notNull().check(oneOf('stage', ['dispatch', 'arrival', 'return', 'claim'])),
    )
    .addColumn('examiner_name', 'text', (c) => c.notNull())
    .addColumn('examined_by', 'text', (c) => c.references('users.id').onDelete('set null'))
    .addColumn('examined_on', 'text', (c) => c.notNull())
    .addColumn('notes', 'text')
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .execute();
  await db.schema
    .createIndex('condition_reports_work')
    .on('condition_reports')
    .columns(['work_id', 'examined_on'])
    .execute();

  await db.schema
    .createTable('condition_findings')
    .addColumn('id', 'integer', autoId(db))
    .addColumn('report_id', 'integer', (c) =>
      c.notNull().references('condition_reports.id').onDelete('cascade'),
    )
    .addColumn('kind', 'text', (c) =>
      c
        .notNull()
        .check(
          oneOf('kind', [
            'chip',
            'crack',
            'hairline-crack',
            'crazing',
            'glaze-fault',
            'loss',
            'abrasion',
            'stain',
            'previous-repair',
          ]),
        ),
    )
    .addColumn('grade', 'text', (c) =>
      c.notNull().check(oneOf('grade', ['slight', 'marked', 'serious'])),
    )
    .addColumn('location', 'text')
    .addColumn('size_mm', 'integer')
    .addColumn('photo_file_id', 'integer', (c) => c.references('files.id'))
    .addColumn('notes', 'text')
    .execute();

  await db.schema
    .createTable('statements')
    .addColumn('id', 'integer', autoId(db))
    .addColumn('studio_id', 'integer', (c) => c.notNull().references('studios.id'))
    .addColumn('venue_id', 'integer', (c) => c.notNull().references('venues.id'))
    .addColumn('consignment_id', 'integer', (c) => c.references('consignments.id'))
    .addColumn('reference', 'text', (c) => c.notNull())
    .addColumn('period_start', 'text', (c) => c.notNull())
    .addColumn('period_end', 'text', (c) => c.notNull())
    .addColumn('state', 'text', (c) =>
      c
        .notNull()
        .defaultTo('draft')
        .check(oneOf('state', ['draft', 'issued', 'settled', 'void'])),
    )
    .addColumn('currency', 'text', (c) => c.notNull())
    // Totals are frozen at issue, so an issued statement never changes under the venue's feet.
    .addColumn('sales_total', 'integer')
    .addColumn('commission_total', 'integer')
    .addColumn('vat_on_commission_total', 'integer')
    .addColumn('maker_net_total', 'integer')
    .addColumn('issued_at', 'text')
    .addColumn('due_date', 'text')
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .addColumn('updated_at', 'text', (c) => c.notNull().defaultTo(now))
    .addUniqueConstraint('statements_studio_reference', ['studio_id', 'reference'])
    .execute();

  await db.schema
    .createTable('statement_lines')
    .addColumn('statement_id', 'integer', (c) =>
      c.notNull().references('statements.id').onDelete('cascade'),
    )
    .addColumn('consignment_line_id', 'integer', (c) =>
      c.notNull().references('consignment_lines.id'),
    )
    .addColumn('sale_price', 'integer', (c) => c.notNull())
    .addColumn('commission', 'integer', (c) => c.notNull())
    .addColumn('vat_on_commission', 'integer', (c) => c.notNull())
    .addColumn('maker_share', 'integer', (c) => c.notNull())
    .addPrimaryKeyConstraint('statement_lines_pk', ['statement_id', 'consignment_line_id'])
    .execute();

  await db.schema
    .createTable('payments')
    .addColumn('id', 'integer', autoId(db))
    .addColumn('studio_id', 'integer', (c) => c.notNull().references('studios.id'))
    .addColumn('venue_id', 'integer', (c) => c.notNull().references('venues.id'))
    .addColumn('statement_id', 'integer', (c) => c.references('statements.id'))
    .addColumn('amount', 'integer', (c) => c.notNull().check(sql`amount > 0`))
    .addColumn('currency', 'text', (c) => c.notNull())
    .addColumn('method', 'text', (c) =>
      c.notNull().check(oneOf('method', ['bank-transfer', 'cheque', 'cash', 'online'])),
    )
    .addColumn('state', 'text', (c) =>
      c
        .notNull()
        .defaultTo('received')
        .check(oneOf('state', ['pending', 'received', 'failed', 'refunded'])),
    )
    .addColumn('received_on', 'text')
    .addColumn('reference', 'text')
    .addColumn('provider_payment_id', 'text', (c) => c.unique())
    .addColumn('recorded_by', 'text', (c) => c.references('users.id').onDelete('set null'))
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .addColumn('updated_at', 'text', (c) => c.notNull().defaultTo(now))
    .execute();

  await db.schema
    .createTable('outbox')
    .addColumn('id', 'integer', autoId(db))
    .addColumn('studio_id', 'integer', (c) => c.references('studios.id'))
    .addColumn('to_address', 'text', (c) => c.notNull())
    .addColumn('subject', 'text', (c) => c.notNull())
    .addColumn('text_body', 'text', (c) => c.notNull())
    .addColumn('html_body', 'text')
    .addColumn('attachments', 'text', (c) => c.notNull().defaultTo('[]'))
    .addColumn('state', 'text', (c) =>
      c
        .notNull()
        .defaultTo('queued')
        .check(oneOf('state', ['queued', 'sent', 'failed'])),
    )
    .addColumn('attempts', 'integer', (c) => c.notNull().defaultTo(0))
    .addColumn('last_error', 'text')
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .addColumn('sent_at', 'text')
    .execute();
  await db.schema.createIndex('outbox_state').on('outbox').columns(['state', 'id']).execute();

  await db.schema
    .createTable('audit_log')
    .addColumn('id', 'integer', autoId(db))
    .addColumn('studio_id', 'integer', (c) => c.notNull().references('studios.id'))
    .addColumn('user_id', 'text', (c) => c.references('users.id').onDelete('set null'))
    .addColumn('action', 'text', (c) => c.notNull())
    .addColumn('entity', 'text', (c) => c.notNull())
    .addColumn('entity_id', 'text', (c) => c.notNull())
    .addColumn('before', 'text')
    .addColumn('after', 'text')
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .execute();
  await db.schema
    .createIndex('audit_log_entity')
    .on('audit_log')
    .columns(['studio_id', 'entity', 'entity_id'])
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  for (const table of [
    'audit_log',
    'outbox',
    'payments',
    'statement_lines',
    'statements',
    'condition_findings',
    'condition_reports',
    'consignment_lines',
    'consignments',
    'work_photos',
    'works',
    'files',
    'invitations',
    'memberships',
    'venues',
    'studios',
    'verifications',
    'accounts',
    'sessions',
    'users',
  ]) {
    await db.schema.dropTable(table).execute();
  }
}

import { type Kysely, sql } from 'kysely';

// Frozen: this migration takes Kysely<any> and imports no app code.

/**
 * What delivering the outbox needs, so that any number of server processes sharing the database
 * send each message once: when it is next due, who holds it and until when, what the mail server
 * called it, and what kind of message it is. Every column has a default or is nullable, so rows
 * written before stay valid; those are due at once.
 */
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .alterTable('outbox')
    .addColumn('kind', 'text', (c) => c.notNull().defaultTo('other'))
    .execute();
  // A constant default (SQLite adds no column with a computed one): rows already queued are due.
  await db.schema
    .alterTable('outbox')
    .addColumn('next_attempt_at', 'text', (c) => c.notNull().defaultTo('1970-01-01T00:00:00.000Z'))
    .execute();
  await db.schema.alterTable('outbox').addColumn('claimed_until', 'text').execute();
  await db.schema.alterTable('outbox').addColumn('claim_token', 'text').execute();
  await db.schema.alterTable('outbox').addColumn('message_id', 'text').execute();
  await db.schema.alterTable('outbox').addColumn('from_address', 'text').execute();
  await db
    .updateTable('outbox')
    .set({ next_attempt_at: sql.ref('created_at') })
    .where('state', '=', 'queued')
    .execute();
  await db.schema
    .createIndex('outbox_due')
    .on('outbox')
    .columns(['state', 'next_attempt_at'])
    .execute();
  await db.schema.createIndex('outbox_studio').on('outbox').columns(['studio_id', 'id']).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropIndex('outbox_studio').execute();
  await db.schema.dropIndex('outbox_due').execute();
  for (const column of [
    'from_address',
    'message_id',
    'claim_token',
    'claimed_until',
    'next_attempt_at',
    'kind',
  ]) {
    await db.schema.alterTable('outbox').dropColumn(column).execute();
  }
}

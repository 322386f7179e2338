import { type Kysely } from 'kysely';

import { autoId } from '../dialect';

// Frozen: this migration takes Kysely<any> and imports no app code, only the dialect's helpers.

/**
 * A studio's private calendar address: only a hash of its token is kept, so the database alone
 * cannot be used to read the feed; revoking it stops the old address at once.
 */
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('calendar_feeds')
    .addColumn('id', 'integer', autoId(db))
    .addColumn('studio_id', 'integer', (c) => c.notNull().references('studios.id'))
    .addColumn('token_hash', 'text', (c) => c.notNull().unique())
    .addColumn('created_by', 'text', (c) => c.references('users.id').onDelete('set null'))
    .addColumn('created_at', 'text', (c) => c.notNull())
    .addColumn('revoked_at', 'text')
    .execute();
  await db.schema
    .createIndex('calendar_feeds_studio')
    .on('calendar_feeds')
    .column('studio_id')
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('calendar_feeds').execute();
}

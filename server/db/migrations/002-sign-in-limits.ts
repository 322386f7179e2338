import { type Kysely } from 'kysely';

// Frozen: this migration takes Kysely<any> and imports no app code.

/**
 * Failed sign-ins counted in the database, per account and per address, so the limit holds however
 * many server processes share it.
 */
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('sign_in_limits')
    .addColumn('key', 'text', (c) => c.primaryKey())
    .addColumn('hits', 'integer', (c) => c.notNull())
    .addColumn('window_ends_at', 'text', (c) => c.notNull())
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('sign_in_limits').execute();
}

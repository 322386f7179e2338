import { type Kysely } from 'kysely';

// Frozen: this migration takes Kysely<any> and imports no app code.

/** The columns of the studio's bank statement CSV, mapped once and remembered. */
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('studios').addColumn('bank_csv_columns', 'text').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('studios').dropColumn('bank_csv_columns').execute();
}

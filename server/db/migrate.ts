import { type Kysely, type MigrationProvider, Migrator } from 'kysely';

import { checkTextRules } from './dialect';
import { migrations } from './migrations';

const provider: MigrationProvider = { getMigrations: async () => migrations };

/**
 * Brings the database to the latest migration, or throws with the one that failed (or, on
 * PostgreSQL, at once if the database's locale would sort text unlike SQLite).
 */
export async function migrateToLatest(db: Kysely<any>): Promise<void> {
  await checkTextRules(db);
  const { error, results } = await new Migrator({ db, provider }).migrateToLatest();
  const failed = results?.find((r) => r.status === 'Error');
  if (error || failed) {
    throw new Error(`Migration ${failed?.migrationName ?? ''} failed`, { cause: error });
  }
}

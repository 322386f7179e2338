import { sql } from 'kysely';

// Relative imports: jest loads its global setup without the `@/` alias.
import { startPostgresCluster } from '../../../scripts/lib/postgres-cluster';
import { openDatabase } from '../../../server/db/database';
import { migrateToLatest } from '../../../server/db/migrate';
import { databaseUrl, templateDatabase, testDatabaseKind } from './test-database';

/**
 * Jest's global setup for the PostgreSQL run: a throwaway cluster (unless
 * SAGGAR_TEST_DATABASE_URL names one already), and the migrations run once into a template that
 * each test copies in a moment. The URL reaches the test workers through the environment.
 */
export default async function setup(): Promise<void> {
  if (testDatabaseKind !== 'postgres') return;
  if (!process.env.SAGGAR_TEST_DATABASE_URL) {
    const cluster = await startPostgresCluster();
    process.env.SAGGAR_TEST_DATABASE_URL = cluster.url;
    (globalThis as { stopPostgres?: () => void }).stopPostgres = cluster.stop;
  }
  const admin = openDatabase(databaseUrl('postgres'));
  try {
    await sql`drop database if exists ${sql.id(templateDatabase)} with (force)`.execute(admin);
    await sql`create database ${sql.id(templateDatabase)}`.execute(admin);
  } finally {
    await admin.destroy();
  }
  const template = openDatabase(databaseUrl(templateDatabase));
  try {
    await migrateToLatest(template);
  } finally {
    await template.destroy();
  }
}

import { isPostgresUrl } from '../db/database';

/**
 * On PostgreSQL the database is backed up with its own tools; these commands only know SQLite.
 * Says which to use instead of copying a SQLite file nobody is using.
 */
export function refuseOnPostgres(database: string, command: 'backup' | 'restore'): void {
  if (!isPostgresUrl(database)) return;
  const tool =
    command === 'backup'
      ? 'pg_dump --format=custom --file=saggar.dump "$SAGGAR_DATABASE_URL"'
      : 'pg_restore --clean --if-exists --no-owner --dbname="$SAGGAR_DATABASE_URL" saggar.dump';
  console.error(
    `SAGGAR_DATABASE_URL is set, so the database is PostgreSQL: use\n  ${tool}\n` +
      'and copy the shared files folder with your storage’s own tools (docs/deploying.md).',
  );
  process.exit(2);
}

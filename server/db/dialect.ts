import {
  type ColumnDefinitionBuilder,
  type Expression,
  type Kysely,
  PostgresAdapter,
  type RawBuilder,
  sql,
} from 'kysely';

// The one place where SQLite and PostgreSQL are told apart (docs/databases.md). Everything here
// takes the database (or a transaction) it will run on, and imports nothing but Kysely, so that
// migrations may use it too.

type AnyDb = Pick<Kysely<any>, 'getExecutor'>;

export function isPostgres(db: AnyDb): boolean {
  return db.getExecutor().adapter instanceof PostgresAdapter;
}

/**
 * The current time as ISO-8601 text in UTC with milliseconds (`2026-05-01T09:30:00.000Z`), as a
 * column default: the same text on both, so times compare and sort as strings.
 */
export function nowDefault(db: AnyDb): RawBuilder<string> {
  return isPostgres(db)
    ? sql`(to_char(statement_timestamp() at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"'))`
    : sql`(strftime('%Y-%m-%dT%H:%M:%fZ', 'now'))`;
}

/** An integer primary key the database numbers itself: AUTOINCREMENT, or an identity column. */
export function autoId(db: AnyDb) {
  const postgres = isPostgres(db);
  return (c: ColumnDefinitionBuilder) =>
    postgres ? c.primaryKey().generatedByDefaultAsIdentity() : c.primaryKey().autoIncrement();
}

/**
 * Text to sort by without regard to case. SQLite's NOCASE folds ASCII letters only; PostgreSQL's
 * lower() does the same in the C locale the database is required to use (see `migrate.ts`).
 */
export function ignoringCase(db: AnyDb, text: Expression<string | null>): RawBuilder<unknown> {
  return isPostgres(db) ? sql`lower(${text})` : sql`${text} collate nocase`;
}

/** LIKE without regard to case: SQLite's LIKE already ignores the case of ASCII letters. */
export function likeIgnoringCase(db: AnyDb): 'like' | 'ilike' {
  return isPostgres(db) ? 'ilike' : 'like';
}

/**
 * For `query.$call(lockedForUpdate(trx))`: on PostgreSQL the rows read stay locked against other
 * writers until the transaction ends, so a read-then-write cannot interleave with another one
 * (FOR NO KEY UPDATE: rows referring to them may still be written, so that writing, say, an
 * audit entry of the studio never waits on the studio's lock). SQLite needs none: a process runs
 * one transaction at a time, and a second process's write makes the first one's fail (busy)
 * instead of passing unseen.
 */
export function lockedForUpdate(db: AnyDb) {
  const postgres = isPostgres(db);
  return <Q extends { forNoKeyUpdate: () => Q }>(query: Q): Q =>
    postgres ? query.forNoKeyUpdate() : query;
}

/**
 * For `query.$call(lockedForShare(trx))`: on PostgreSQL the rows read cannot be changed by
 * another transaction until this one ends, while any number of others may hold the same lock
 * (several sales joining one held e-mail at once, which the mail worker's claim then waits for).
 */
export function lockedForShare(db: AnyDb) {
  const postgres = isPostgres(db);
  return <Q extends { forShare: () => Q }>(query: Q): Q => (postgres ? query.forShare() : query);
}

/**
 * Refuses a PostgreSQL database whose text rules are not the C locale's: under another, ORDER BY
 * would sort stock numbers and names differently from SQLite, and lower() and ILIKE would fold
 * more than ASCII.
 */
export async function checkTextRules(db: Kysely<any>): Promise<void> {
  if (!isPostgres(db)) return;
  const { rows } = await sql<{ collate: string; ctype: string; name: string }>`
    select datcollate as collate, datctype as ctype, datname as name
    from pg_database where datname = current_database()`.execute(db);
  const row = rows[0]!;
  if (!['C', 'POSIX'].includes(row.collate) || !['C', 'POSIX'].includes(row.ctype)) {
    throw new Error(
      `The PostgreSQL database ${row.name} uses the locale ${row.collate}; Saggar needs C. ` +
        `Create it with: CREATE DATABASE ${row.name} TEMPLATE template0 ENCODING 'UTF8' ` +
        `LC_COLLATE 'C' LC_CTYPE 'C';`,
    );
  }
}

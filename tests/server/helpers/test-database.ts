import { randomUUID } from 'node:crypto';

import { type Kysely, sql } from 'kysely';

// Relative imports: jest's global setup (postgres-setup.ts) loads this module too, without the
// `@/` alias.
import { type Db, openDatabase } from '../../../server/db/database';
import { migrateToLatest } from '../../../server/db/migrate';

/**
 * Which database the server tests run on: SQLite by default, PostgreSQL under `npm run test:pg`
 * (SAGGAR_TEST_DB=postgres), where `tests/server/helpers/postgres-setup.ts` has started a cluster
 * and migrated a template database once.
 */
export const testDatabaseKind: 'sqlite' | 'postgres' =
  process.env.SAGGAR_TEST_DB === 'postgres' ? 'postgres' : 'sqlite';

export const templateDatabase = 'saggar_template';

/** The cluster's URL with another database name in it. */
export function databaseUrl(name: string): string {
  const url = new URL(process.env.SAGGAR_TEST_DATABASE_URL!);
  url.pathname = `/${name}`;
  return url.toString();
}

let admin: Db | undefined;
const opened: Db[] = [];
/** Databases made for one test only (the migrations' own tests), dropped after the file. */
const throwaway: string[] = [];
/** How many of this worker's databases the test file has taken so far, and those given back. */
let taken = 0;
const given: string[] = [];
/** Databases shared by several apps in one test file, by the file name the test gave them. */
const shared = new Map<string, string>();
/** What a database shared under a name is to start as: a copy of another's rows. */
const copies = new Map<string, Snapshot>();

// Every database a test file opened is closed after it; on PostgreSQL the worker's databases are
// kept for the next file, which empties them first.
if (typeof afterAll === 'function') {
  afterAll(async () => {
    await Promise.all(opened.splice(0).map((db) => db.destroy()));
    for (const name of throwaway.splice(0)) {
      await sql`drop database if exists ${sql.id(name)} with (force)`.execute(admin!);
    }
    await admin?.destroy();
    admin = undefined;
    taken = 0;
    given.length = 0;
    shared.clear();
    copies.clear();
  });
}

function adminDb(): Db {
  admin ??= openDatabase(databaseUrl('postgres'));
  return admin;
}

/**
 * The next of this worker's databases, made from the migrated template the first time. Making
 * one takes most of a second, emptying one a few milliseconds, so each is made once per run and
 * emptied by every test file that takes it.
 */
async function takePostgresDatabase(): Promise<{ name: string; fresh: boolean }> {
  const again = given.pop();
  if (again) return { name: again, fresh: false };
  const name = `saggar_test_w${process.env.JEST_WORKER_ID ?? '1'}_${taken++}`;
  const { rows } = await sql`select 1 from pg_database where datname = ${name}`.execute(adminDb());
  if (rows.length > 0) {
    if ((await schemaOf(name)) === (await schemaOf(templateDatabase))) {
      return { name, fresh: false };
    }
    // A test changed its tables (a trigger, a table renamed): made again, from the template.
    await sql`drop database ${sql.id(name)} with (force)`.execute(adminDb());
  }
  await sql`create database ${sql.id(name)} template ${sql.id(templateDatabase)}`.execute(
    adminDb(),
  );
  return { name, fresh: true };
}

const schemas = new Map<string, string>();

/** What a database's tables, columns, triggers and functions are, as one string to compare. */
async function schemaOf(name: string): Promise<string> {
  const known = name === templateDatabase ? schemas.get(name) : undefined;
  if (known) return known;
  const db = openDatabase(databaseUrl(name));
  try {
    const { rows } = await sql<{ schema: string }>`select concat_ws(' | ',
      (select string_agg(table_name || '.' || column_name || ' ' || data_type, ',' order by
        table_name, column_name) from information_schema.columns where table_schema = 'public'),
      (select string_agg(tgname, ',' order by tgname) from pg_trigger where not tgisinternal),
      (select string_agg(proname, ',' order by proname) from pg_proc
        where pronamespace = 'public'::regnamespace)) as schema`.execute(db);
    schemas.set(name, rows[0]!.schema);
    return rows[0]!.schema;
  } finally {
    await db.destroy();
  }
}

/** The tables whose rows a test writes: all but Kysely's record of the migrations. */
async function tablesOf(db: Db): Promise<string[]> {
  const { rows } = await sql<{ name: string }>`select tablename as name from pg_tables
    where schemaname = 'public' and tablename not like 'kysely_%' order by tablename`.execute(db);
  return rows.map((r) => r.name);
}

type Snapshot = { table: string; rows: Record<string, unknown>[] }[];

async function snapshotOf(db: Db): Promise<Snapshot> {
  const snapshot: Snapshot = [];
  for (const table of await tablesOf(db)) {
    const { rows } = await sql<Record<string, unknown>>`select * from ${sql.table(table)}`.execute(
      db,
    );
    snapshot.push({ table, rows });
  }
  return snapshot;
}

/**
 * Empties the database, numbering from 1 again as a new one would, then writes the snapshot's
 * rows (foreign keys unchecked meanwhile, so in any order) and moves each id past them.
 */
async function resetTo(db: Db, snapshot: Snapshot): Promise<void> {
  const tables = await tablesOf(db);
  await db.transaction().execute(async (trx) => {
    await sql`truncate table ${sql.join(tables.map((t) => sql.table(t)))} restart identity cascade`.execute(
      trx,
    );
    if (snapshot.length === 0) return;
    await sql`set local session_replication_role = replica`.execute(trx);
    for (const { table, rows } of snapshot) {
      for (let i = 0; i < rows.length; i += 500) {
        await (trx as Kysely<any>)
          .insertInto(table)
          .values(rows.slice(i, i + 500))
          .execute();
      }
      if (rows.length > 0 && 'id' in rows[0]! && typeof rows[0]!.id === 'number') {
        await sql`select setval(pg_get_serial_sequence(${table}, 'id'), max(id)) from ${sql.table(
          table,
        )}`.execute(trx);
      }
    }
  });
}

/**
 * A fresh database migrated to latest: in-memory SQLite, or one of the worker's PostgreSQL
 * databases, emptied. With `sharedAs` (a SQLite file name), every call with the same name in the
 * test file opens the same database, as several server processes would.
 */
export async function openTestDatabase(sharedAs?: string): Promise<Db> {
  if (testDatabaseKind === 'sqlite') {
    const db = openDatabase(sharedAs ?? ':memory:');
    opened.push(db);
    await migrateToLatest(db);
    return db;
  }
  const known = sharedAs === undefined ? undefined : shared.get(sharedAs);
  const { name, fresh } = known ? { name: known, fresh: false } : await takePostgresDatabase();
  const db = openDatabase(databaseUrl(name));
  opened.push(db);
  if (sharedAs !== undefined && !known) shared.set(sharedAs, name);
  if (!known) {
    const copy = sharedAs === undefined ? undefined : copies.get(sharedAs);
    if (copy || !fresh) await resetTo(db, copy ?? []);
  }
  return db;
}

/** A database with no tables at all, for tests of the migrations themselves. */
export async function openEmptyTestDatabase(): Promise<Kysely<any>> {
  if (testDatabaseKind === 'sqlite') {
    const db = openDatabase(':memory:');
    opened.push(db);
    return db;
  }
  const name = `saggar_test_empty_${randomUUID().replace(/-/g, '')}`;
  await sql`create database ${sql.id(name)} template template0`.execute(adminDb());
  throwaway.push(name);
  const db = openDatabase(databaseUrl(name));
  opened.push(db);
  return db;
}

/**
 * The location `startServerProcess` is given for the database shared as `sqliteFile`: the file
 * itself, or that PostgreSQL database's URL (an emptied one if no test has opened it yet).
 */
export async function testDatabaseLocation(sqliteFile: string): Promise<string> {
  if (testDatabaseKind === 'sqlite') return sqliteFile;
  if (!shared.has(sqliteFile)) await openTestDatabase(sqliteFile);
  return databaseUrl(shared.get(sqliteFile)!);
}

/**
 * Makes the database shared as `to` start as a copy of the one shared as `from`: on SQLite the
 * test copies the file itself; on PostgreSQL the rows are read once and written into it.
 */
export async function copyTestDatabase(from: string, to: string): Promise<void> {
  if (testDatabaseKind === 'sqlite') return;
  const source = shared.get(from);
  if (source === undefined) throw new Error(`No test database is shared as ${from}.`);
  let snapshot = copies.get(from);
  if (!snapshot) {
    const db = openDatabase(databaseUrl(source));
    snapshot = await snapshotOf(db);
    await db.destroy();
    copies.set(from, snapshot);
  }
  copies.set(to, snapshot);
}

/**
 * Gives back the database shared as `sharedAs`, closed by the test, for the file's next one:
 * for a test file that makes a great many in turn.
 */
export function releaseTestDatabase(sharedAs: string): void {
  const name = shared.get(sharedAs);
  if (name === undefined) return;
  shared.delete(sharedAs);
  copies.delete(sharedAs);
  given.push(name);
}

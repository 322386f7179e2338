import fs from 'node:fs';
import path from 'node:path';

import SQLite from 'better-sqlite3';
import { Kysely, PostgresDialect, type SqliteDatabase, SqliteDialect } from 'kysely';
import pg from 'pg';

import { type Database } from './schema';

export type Db = Kysely<Database>;

/**
 * better-sqlite3 with its prepared statements kept, by SQL text, for the next time: Kysely asks
 * for a fresh statement on every query, and preparing costs more than running most of ours. A
 * statement still being iterated is never handed out twice.
 */
function withStatementCache(sqlite: SQLite.Database, size = 500): SqliteDatabase {
  const cache = new Map<string, SQLite.Statement>();
  return {
    close: () => sqlite.close(),
    prepare: (sql) => {
      const cached = cache.get(sql);
      if (cached && !cached.busy) {
        cache.delete(sql);
        cache.set(sql, cached);
        return cached;
      }
      const statement = sqlite.prepare(sql);
      if (!cached) {
        cache.set(sql, statement);
        if (cache.size > size) cache.delete(cache.keys().next().value!);
      }
      return statement;
    },
  };
}

/** Whether `location` names a PostgreSQL database (a URL) rather than a SQLite file. */
export function isPostgresUrl(location: string): boolean {
  return /^postgres(ql)?:\/\//.test(location);
}

/**
 * Opens the database at `location`: a `postgres://` URL (SAGGAR_DATABASE_URL), or else a SQLite
 * file (or `:memory:`).
 */
export function openDatabase(location: string): Db {
  return isPostgresUrl(location) ? openPostgres(location) : openSqlite(location);
}

/**
 * A pool of PostgreSQL connections. Counts and sums come back as int8, which pg hands over as
 * strings (to be safe past 2^53); ours are counts and minor units far below that, so they are
 * numbers, as SQLite gives them.
 */
function openPostgres(url: string): Db {
  const types = {
    getTypeParser: ((oid: number, format?: 'text' | 'binary') =>
      oid === pg.types.builtins.INT8 || oid === pg.types.builtins.NUMERIC
        ? Number
        : pg.types.getTypeParser(oid, format)) as typeof pg.types.getTypeParser,
  };
  const pool = new pg.Pool({ connectionString: url, max: 10, types });
  // A connection lost while idle leaves the pool by itself, and the next query opens another;
  // unheard, the pool's error would end the process.
  pool.on('error', () => {});
  return new Kysely<Database>({ dialect: new PostgresDialect({ pool }) });
}

/**
 * Opens the SQLite file (or `:memory:`) with WAL, foreign keys and a busy timeout, so that a
 * second process (the seed command, a backup) waits instead of failing.
 */
function openSqlite(file: string): Db {
  if (file !== ':memory:') fs.mkdirSync(path.dirname(path.resolve(file)), { recursive: true });
  const sqlite = new SQLite(file);
  sqlite.pragma('journal_mode = WAL');
  sqlite.pragma('foreign_keys = ON');
  sqlite.pragma('busy_timeout = 5000');
  return new Kysely<Database>({
    dialect: new SqliteDialect({ database: withStatementCache(sqlite) }),
  });
}

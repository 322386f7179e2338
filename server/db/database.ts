import fs from 'node:fs';
import path from 'node:path';

import SQLite from 'better-sqlite3';
import { Kysely, type SqliteDatabase, SqliteDialect } from 'kysely';

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

/**
 * Opens the SQLite file (or `:memory:`) with WAL, foreign keys and a busy timeout, so that a
 * second process (the seed command, a backup) waits instead of failing.
 */
export function openDatabase(file: string): Db {
  if (file !== ':memory:') fs.mkdirSync(path.dirname(path.resolve(file)), { recursive: true });
  const sqlite = new SQLite(file);
  sqlite.pragma('journal_mode = WAL');
  sqlite.pragma('foreign_keys = ON');
  sqlite.pragma('busy_timeout = 5000');
  return new Kysely<Database>({
    dialect: new SqliteDialect({ database: withStatementCache(sqlite) }),
  });
}

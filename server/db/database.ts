import fs from 'node:fs';
import path from 'node:path';

import SQLite from 'better-sqlite3';
import { Kysely, SqliteDialect } from 'kysely';

import { type Database } from './schema';

export type Db = Kysely<Database>;

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
  return new Kysely<Database>({ dialect: new SqliteDialect({ database: sqlite }) });
}

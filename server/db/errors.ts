/**
 * Whether the database refused a write because a unique index already holds the value: SQLite's
 * extended code through better-sqlite3, or PostgreSQL's SQLSTATE 23505 (unique_violation).
 */
export function isUniqueViolation(err: unknown): boolean {
  const code = (err as { code?: unknown } | null)?.code;
  return code === 'SQLITE_CONSTRAINT_UNIQUE' || code === '23505';
}

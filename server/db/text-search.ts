import { sql, type SqlBool } from 'kysely';

/** `word` as a LIKE pattern matching it anywhere, its wildcards escaped. */
const likeTerm = (word: string) => `%${word.replace(/[\\%_]/g, '\\$&')}%`;

/**
 * Whether a text column contains `word`, ignoring case (SQLite's LIKE ignores the case of ASCII
 * letters): the one place the dialect's text search is written.
 */
export function containsWord(column: string, word: string) {
  return sql<SqlBool>`${sql.ref(column)} like ${likeTerm(word)} escape '\\'`;
}

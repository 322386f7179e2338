import { type Kysely, sql, type SqlBool } from 'kysely';

import { likeIgnoringCase } from './dialect';

/** `word` as a LIKE pattern matching it anywhere, its wildcards escaped. */
const likeTerm = (word: string) => `%${word.replace(/[\\%_]/g, '\\$&')}%`;

/**
 * Whether a text column contains `word`, ignoring case (the ASCII letters', on both databases):
 * the one place the text search is written.
 */
export function containsWord(db: Pick<Kysely<any>, 'getExecutor'>, column: string, word: string) {
  return matchesLike(db, column, likeTerm(word));
}

/** Whether a text column matches a LIKE pattern whose escape character is `\`, ignoring case. */
export function matchesLike(db: Pick<Kysely<any>, 'getExecutor'>, column: string, pattern: string) {
  return sql<SqlBool>`${sql.ref(column)} ${sql.raw(likeIgnoringCase(db))} ${pattern} escape '\\'`;
}

import { type Kysely, sql } from 'kysely';

import { isPostgres } from '@/server/db/dialect';

type Trigger = {
  name: string;
  table: string;
  /** What fires it, before the row is written: `insert`, or `update of <column>`. */
  event: string;
  /** A condition on `new`, the row about to be written. */
  when: string;
  /** Refuse the write with this message, or run this statement first (it may use `new`). */
  then: { refuse: string } | { run: string };
};

/**
 * A trigger that makes the database misbehave on cue, as a full disk or a racing request would,
 * written for whichever database the tests run on.
 */
export async function addTestTrigger(db: Kysely<any>, t: Trigger): Promise<void> {
  const refusal = 'refuse' in t.then ? t.then.refuse.replace(/'/g, "''") : '';
  if (isPostgres(db)) {
    const action = 'refuse' in t.then ? `raise exception '${refusal}'` : t.then.run;
    await sql
      .raw(
        `create function ${t.name}() returns trigger language plpgsql as $$ ` +
          `begin ${action}; return new; end $$`,
      )
      .execute(db);
    await sql
      .raw(
        `create trigger ${t.name} before ${t.event} on ${t.table} for each row ` +
          `when (${t.when}) execute function ${t.name}()`,
      )
      .execute(db);
    return;
  }
  const action = 'refuse' in t.then ? `select raise(abort, '${refusal}')` : t.then.run;
  await sql
    .raw(
      `create trigger ${t.name} before ${t.event} on ${t.table} when ${t.when} begin ${action}; end`,
    )
    .execute(db);
}

export async function dropTestTrigger(db: Kysely<any>, name: string, table: string): Promise<void> {
  await sql.raw(`drop trigger ${name}${isPostgres(db) ? ` on ${table}` : ''}`).execute(db);
}

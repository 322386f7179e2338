import { type Kysely, Migrator } from 'kysely';

import { migrations } from '@/server/db/migrations';

import { openEmptyTestDatabase } from '../helpers/test-database';

const migrator = (db: Kysely<any>) =>
  new Migrator({ db, provider: { getMigrations: async () => migrations } });

describe('migration 004-outbox-delivery', () => {
  it('keeps messages written before it valid, queued ones due when they were written', async () => {
    const db = await openEmptyTestDatabase();
    await migrator(db).migrateTo('002-sign-in-limits');
    await db
      .insertInto('outbox')
      .values({ to_address: 'a@example.test', subject: 'Waiting', text_body: 'x' })
      .execute();
    await db
      .insertInto('outbox')
      .values({
        to_address: 'b@example.test',
        subject: 'Gone',
        text_body: 'y',
        state: 'sent',
        sent_at: '2026-01-02T03:04:05.000Z',
      })
      .execute();

    const { error } = await migrator(db).migrateToLatest();
    expect(error).toBeUndefined();
    const rows = await db
      .selectFrom('outbox')
      .select([
        'subject',
        'kind',
        'created_at',
        'next_attempt_at',
        'claimed_until',
        'claim_token',
        'message_id',
        'from_address',
      ])
      .orderBy('id')
      .execute();
    expect(rows).toEqual([
      {
        subject: 'Waiting',
        kind: 'other',
        created_at: rows[0]!.created_at,
        next_attempt_at: rows[0]!.created_at,
        claimed_until: null,
        claim_token: null,
        message_id: null,
        from_address: null,
      },
      {
        subject: 'Gone',
        kind: 'other',
        created_at: rows[1]!.created_at,
        next_attempt_at: '1970-01-01T00:00:00.000Z',
        claimed_until: null,
        claim_token: null,
        message_id: null,
        from_address: null,
      },
    ]);
    expect(rows[0]!.created_at).toMatch(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\.\d{3}Z$/);
  });

  it('can be undone and done again', async () => {
    const db = await openEmptyTestDatabase();
    await migrator(db).migrateToLatest();
    expect((await migrator(db).migrateTo('002-sign-in-limits')).error).toBeUndefined();
    expect((await migrator(db).migrateToLatest()).error).toBeUndefined();
  });
});

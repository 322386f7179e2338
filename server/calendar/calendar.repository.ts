import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';

export async function findActiveFeed(db: Db, scope: Scope) {
  return db
    .selectFrom('calendar_feeds')
    .select(['id', 'created_at'])
    .where('studio_id', '=', scope.studioId)
    .where('revoked_at', 'is', null)
    .executeTakeFirst();
}

export async function revokeFeeds(db: Db, scope: Scope, at: string) {
  await db
    .updateTable('calendar_feeds')
    .set({ revoked_at: at })
    .where('studio_id', '=', scope.studioId)
    .where('revoked_at', 'is', null)
    .execute();
}

export async function insertFeed(db: Db, scope: Scope, tokenHash: string, at: string) {
  await db
    .insertInto('calendar_feeds')
    .values({
      studio_id: scope.studioId,
      token_hash: tokenHash,
      created_by: scope.userId,
      created_at: at,
    })
    .execute();
}

/** The studio whose live calendar address has this token's hash: the feed's only way in. */
export async function findStudioOfFeed(db: Db, tokenHash: string) {
  const row = await db
    .selectFrom('calendar_feeds')
    .innerJoin('studios', 'studios.id', 'calendar_feeds.studio_id')
    .select(['studios.id', 'studios.name'])
    .where('calendar_feeds.token_hash', '=', tokenHash)
    .where('calendar_feeds.revoked_at', 'is', null)
    .executeTakeFirst();
  return row;
}

/** The dates of every consignment not cancelled nor a draft, with its venue. */
export async function listConsignmentDates(db: Db, scope: Scope) {
  return scoped
    .consignments(db, scope)
    .innerJoin('venues', 'venues.id', 'consignments.venue_id')
    .select([
      'consignments.id',
      'consignments.reference',
      'consignments.title',
      'consignments.dispatch_date',
      'consignments.opening_date',
      'consignments.closing_date',
      'consignments.return_due_date',
      'venues.name as venue_name',
    ])
    .where('consignments.state', 'not in', ['draft', 'cancelled'])
    .execute();
}

/** Statements issued and not yet paid, with when payment is due. */
export async function listPaymentDueDates(db: Db, scope: Scope) {
  return scoped
    .statements(db, scope)
    .innerJoin('venues', 'venues.id', 'statements.venue_id')
    .select([
      'statements.id',
      'statements.reference',
      'statements.due_date',
      'venues.name as venue_name',
    ])
    .where('statements.state', '=', 'issued')
    .where('statements.due_date', 'is not', null)
    .execute();
}

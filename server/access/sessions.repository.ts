import { type Db } from '../db/database';

export async function getActiveMembershipId(db: Db, sessionId: string): Promise<number | null> {
  const row = await db
    .selectFrom('sessions')
    .select('active_membership_id')
    .where('id', '=', sessionId)
    .executeTakeFirst();
  return row?.active_membership_id ?? null;
}

export async function setActiveMembershipId(
  db: Db,
  sessionId: string,
  membershipId: number,
): Promise<void> {
  await db
    .updateTable('sessions')
    .set({ active_membership_id: membershipId })
    .where('id', '=', sessionId)
    .execute();
}

import { hashPassword, verifyPassword } from 'better-auth/crypto';

import { type Db } from '../db/database';

export type NewPerson = { name: string; email: string; password: string };

/**
 * Writes a person who can sign in with e-mail and password into better-auth's tables. Accounts
 * are made by the studio (demo seed, invitations, tests) because public sign-up is off.
 */
export async function createUserWithPassword(db: Db, person: NewPerson): Promise<string> {
  const id = crypto.randomUUID();
  const password = await hashPassword(person.password);
  await db
    .insertInto('users')
    .values({ id, name: person.name, email: person.email.toLowerCase(), email_verified: 1 })
    .execute();
  await db
    .insertInto('accounts')
    .values({
      id: crypto.randomUUID(),
      user_id: id,
      account_id: id,
      provider_id: 'credential',
      password,
    })
    .execute();
  return id;
}

/** Whether the password is the one the person's e-mail-and-password account holds. */
export async function passwordMatches(db: Db, userId: string, password: string): Promise<boolean> {
  const account = await db
    .selectFrom('accounts')
    .select('password')
    .where('user_id', '=', userId)
    .where('provider_id', '=', 'credential')
    .executeTakeFirst();
  return account?.password ? verifyPassword({ hash: account.password, password }) : false;
}

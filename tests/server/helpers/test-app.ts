import { randomUUID } from 'node:crypto';
import os from 'node:os';
import path from 'node:path';

import pino from 'pino';
import request from 'supertest';

import { createApp } from '@/server/app';
import { createUserWithPassword } from '@/server/auth/passwords';
import { type AppContext, createContext } from '@/server/context';
import { addMembership } from '@/server/memberships/memberships.repository';
import { type Role } from '@/shared/schemas/membership';
import { defaultTerms } from '@/shared/schemas/terms';

import { openTestDatabase } from './test-database';

type App = Parameters<typeof request>[0];

export const password = 'correct horse battery staple';

/**
 * The real app over a fresh database migrated to latest (in-memory SQLite, or PostgreSQL under
 * `npm run test:pg`), or over the one every app given the same `dbFile` shares, as several
 * processes would.
 */
export async function createTestApp(
  options: Partial<
    Pick<
      AppContext,
      | 'signInLimit'
      | 'trustProxy'
      | 'mailFrom'
      | 'renderAttachment'
      | 'appUrl'
      | 'payments'
      | 'logger'
      | 'filesDir'
    >
  > & { publicUrl?: string; dbFile?: string } = {},
) {
  const { dbFile, ...contextOptions } = options;
  const db = await openTestDatabase(dbFile);
  const context = createContext({
    db,
    logger: pino({ level: 'silent' }),
    secret: 'test-secret-that-is-long-enough-for-better-auth',
    web: null,
    trustedOrigins: [],
    // Created on the first upload; each app has its own unless given one (a copy of another's).
    filesDir: path.join(os.tmpdir(), 'saggar-test-files', randomUUID()),
    ...contextOptions,
  });
  return { app: createApp(context), db, context };
}

type TestDb = Awaited<ReturnType<typeof createTestApp>>['db'];

const terms = JSON.stringify(defaultTerms);

export async function addStudio(db: TestDb, name: string): Promise<number> {
  const row = await db
    .insertInto('studios')
    .values({ name })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

export async function addVenue(db: TestDb, studioId: number, name: string): Promise<number> {
  const row = await db
    .insertInto('venues')
    .values({ studio_id: studioId, name, kind: 'gallery', default_terms: terms })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

export async function addConsignment(
  db: TestDb,
  studioId: number,
  venueId: number,
  reference: string,
  state: 'draft' | 'on-show' = 'on-show',
): Promise<number> {
  const row = await db
    .insertInto('consignments')
    .values({
      studio_id: studioId,
      venue_id: venueId,
      reference,
      title: `Show ${reference}`,
      state,
      terms: state === 'draft' ? null : terms,
      dispatch_date: '2026-10-01',
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

/** A person with one membership per entry; returns the user id. */
export async function addPerson(
  db: TestDb,
  email: string,
  memberships: { studioId: number; role: Role; venueId?: number }[],
): Promise<string> {
  const userId = await createUserWithPassword(db, { name: email.split('@')[0]!, email, password });
  for (const m of memberships) {
    await addMembership(db, {
      userId,
      studioId: m.studioId,
      role: m.role,
      venueId: m.venueId ?? null,
    });
  }
  return userId;
}

/** Signs in through the real endpoint and returns the session cookie to send back. */
export async function signIn(app: App, email: string): Promise<string> {
  const res = await request(app).post('/api/auth/sign-in/email').send({ email, password });
  if (res.status !== 200)
    throw new Error(`sign-in failed: ${res.status} ${JSON.stringify(res.body)}`);
  const cookies = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
  return cookies.map((c) => c.split(';')[0]).join('; ');
}

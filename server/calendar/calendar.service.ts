import { createHash, randomBytes } from 'node:crypto';

import icalGenerator, { ICalCalendarMethod } from 'ical-generator';

import { addDays } from '@/shared/money';
import { type CalendarFeed } from '@/shared/schemas/calendar';

import { type Scope } from '../access/viewer';
import { writeAudit } from '../audit/audit-log.repository';
import { type Db } from '../db/database';
import { notFound } from '../http/http-error';
import {
  findActiveFeed,
  findStudioOfFeed,
  insertFeed,
  listConsignmentDates,
  listPaymentDueDates,
  revokeFeeds,
} from './calendar.repository';

const hashOf = (token: string) => createHash('sha256').update(token).digest('hex');
const feedUrl = (appUrl: string, token: string) => `${appUrl}/api/calendar/${token}.ics`;

export async function getCalendarFeed(db: Db, scope: Scope): Promise<CalendarFeed> {
  const feed = await findActiveFeed(db, scope);
  return { active: feed !== undefined, createdAt: feed?.created_at ?? null, url: null };
}

/**
 * A new private calendar address for the studio; any earlier one stops working. The address is
 * answered once: only its hash is kept.
 */
export async function createCalendarFeed(
  db: Db,
  scope: Scope,
  { appUrl }: { appUrl: string },
): Promise<CalendarFeed> {
  const token = randomBytes(32).toString('base64url');
  const at = new Date().toISOString();
  await db.transaction().execute(async (trx) => {
    await revokeFeeds(trx, scope, at);
    await insertFeed(trx, scope, hashOf(token), at);
    await writeAudit(trx, scope, {
      action: 'calendar-feed.created',
      entity: 'studio',
      entityId: scope.studioId,
      before: null,
      after: { createdAt: at },
    });
  });
  return { active: true, createdAt: at, url: feedUrl(appUrl, token) };
}

export async function revokeCalendarFeed(db: Db, scope: Scope): Promise<CalendarFeed> {
  const at = new Date().toISOString();
  await db.transaction().execute(async (trx) => {
    await revokeFeeds(trx, scope, at);
    await writeAudit(trx, scope, {
      action: 'calendar-feed.revoked',
      entity: 'studio',
      entityId: scope.studioId,
      before: null,
      after: { revokedAt: at },
    });
  });
  return { active: false, createdAt: null, url: null };
}

type Day = { id: string; date: string; summary: string; description: string };

/**
 * The studio's dates as an iCalendar feed (RFC 5545): each consignment's dispatch, opening,
 * closing and return due, and each unpaid statement's payment due, as all-day events whose UIDs
 * stay the same from one fetch to the next, so calendar programs update them in place.
 */
export async function calendarFeedIcs(db: Db, token: string, appUrl: string): Promise<string> {
  const studio = await findStudioOfFeed(db, hashOf(token));
  if (!studio) throw notFound('That calendar');
  const scope: Scope = { studioId: studio.id, venueId: null, userId: '', role: 'owner' };
  const days: Day[] = [];
  for (const c of await listConsignmentDates(db, scope)) {
    const about = `${c.reference} ${c.title}, ${c.venue_name}`;
    const page = `${appUrl}/consignments/${c.id}`;
    const add = (kind: string, date: string | null, words: string) => {
      if (date)
        days.push({
          id: `consignment-${c.id}-${kind}`,
          date,
          summary: `${words}: ${about}`,
          description: page,
        });
    };
    add('dispatch', c.dispatch_date, 'Send');
    add('opening', c.opening_date, 'Opens');
    add('closing', c.closing_date, 'Closes');
    add('return', c.return_due_date, 'Pieces due back');
  }
  for (const s of await listPaymentDueDates(db, scope)) {
    days.push({
      id: `statement-${s.id}-due`,
      date: s.due_date!,
      summary: `Payment due: ${s.reference}, ${s.venue_name}`,
      description: `${appUrl}/statements/${s.id}`,
    });
  }
  const host = new URL(appUrl).hostname;
  const calendar = icalGenerator({
    name: `${studio.name} (Saggar)`,
    prodId: { company: 'Saggar', product: 'Saggar', language: 'EN' },
    method: ICalCalendarMethod.PUBLISH,
  });
  for (const day of days) {
    calendar.createEvent({
      id: `${day.id}@${host}`,
      // An all-day event: DTSTART;VALUE=DATE, ending the day after (RFC 5545 §3.6.1).
      start: new Date(`${day.date}T00:00:00Z`),
      end: new Date(`${addDays(day.date, 1)}T00:00:00Z`),
      allDay: true,
      summary: day.summary,
      description: day.description,
      stamp: new Date(`${day.date}T00:00:00Z`),
    });
  }
  return calendar.toString();
}

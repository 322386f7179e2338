import express from 'express';

import { calendarTokenParamsSchema } from '@/shared/schemas/calendar';

import { requireRole, scopeOf } from '../access/authenticate';
import { type AppContext } from '../context';
import { validate } from '../http/validate';
import {
  calendarFeedIcs,
  createCalendarFeed,
  getCalendarFeed,
  revokeCalendarFeed,
} from './calendar.service';

const byToken = validate({ params: calendarTokenParamsSchema });

/** `/api/calendar-feed`: the owner makes, replaces or revokes the studio's private address. */
export function calendarFeedRouter({ db, appUrl }: AppContext) {
  return express
    .Router()
    .use(requireRole('owner'))
    .get('/', async (_req, res) => {
      res.json(await getCalendarFeed(db, scopeOf(res)));
    })
    .post('/', async (_req, res) => {
      res.status(201).json(await createCalendarFeed(db, scopeOf(res), { appUrl }));
    })
    .delete('/', async (_req, res) => {
      res.json(await revokeCalendarFeed(db, scopeOf(res)));
    });
}

/** `/api/calendar/:token.ics`: the feed itself, for calendar programs, which sign in to nothing. */
export function calendarRouter({ db, appUrl }: AppContext) {
  return express.Router().get('/:token.ics', byToken, async (_req, res) => {
    const ics = await calendarFeedIcs(db, byToken.input(res).params.token, appUrl);
    res.type('text/calendar; charset=utf-8').set('Cache-Control', 'private, no-cache').send(ics);
  });
}

import express from 'express';
import { z } from 'zod';

import { studioSettingsUpdateSchema } from '@/shared/schemas/studio';

import { requireRole, scopeOf } from '../access/authenticate';
import { type AppContext } from '../context';
import { validate } from '../http/validate';
import { getStudioSettings, updateStudioSettings } from './studio.service';

const read = validate({ query: z.strictObject({}) });
const update = validate({ body: studioSettingsUpdateSchema });

/** `/api/studio`: the settings a work form needs; only the owner changes them. */
export function studioRouter({ db }: AppContext) {
  return express
    .Router()
    .get('/', requireRole('owner', 'assistant'), read, async (_req, res) => {
      res.json(await getStudioSettings(db, scopeOf(res)));
    })
    .patch('/', requireRole('owner'), update, async (_req, res) => {
      res.json(await updateStudioSettings(db, scopeOf(res), update.input(res).body));
    });
}

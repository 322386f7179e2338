import express from 'express';
import { z } from 'zod';

import { studioSettingsUpdateSchema } from '@/shared/schemas/studio';

import { requireRole, scopeOf } from '../access/authenticate';
import { type Scope } from '../access/viewer';
import { type AppContext } from '../context';
import { type Db } from '../db/database';
import { validate } from '../http/validate';
import { stockNumberAllocator } from '../works/stock-numbers';
import { getStudio, toStudioSettings, updateStudio } from './studio.repository';

const read = validate({ query: z.strictObject({}) });
const update = validate({ body: studioSettingsUpdateSchema });

async function settings(db: Db, scope: Scope) {
  const studio = await getStudio(db, scope);
  const next = (await stockNumberAllocator(db, scope, studio)).peek();
  return toStudioSettings(studio, next);
}

/** `/api/studio`: the settings a work form needs; only the owner changes them. */
export function studioRouter({ db }: AppContext) {
  return express
    .Router()
    .get('/', requireRole('owner', 'assistant'), read, async (_req, res) => {
      res.json(await settings(db, scopeOf(res)));
    })
    .patch('/', requireRole('owner'), update, async (_req, res) => {
      const scope = scopeOf(res);
      const { stockNumberPattern, priceStep } = update.input(res).body;
      await updateStudio(db, scope, {
        ...(stockNumberPattern !== undefined ? { stock_number_pattern: stockNumberPattern } : {}),
        ...(priceStep !== undefined ? { price_step: priceStep } : {}),
      });
      res.json(await settings(db, scope));
    });
}

import { type StudioSettings, type StudioSettingsUpdate } from '@/shared/schemas/studio';

import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { notFound } from '../http/http-error';
import { stockNumberAllocator } from '../works/stock-numbers';
import { toStudioSettings } from './studio.mapper';
import { findStudio, type Studio, updateStudio } from './studio.repository';

/** The active studio; a membership whose studio is gone answers 404. */
export async function getStudio(db: Db, scope: Scope): Promise<Studio> {
  const studio = await findStudio(db, scope);
  if (!studio) throw notFound('The studio');
  return studio;
}

/** The settings a work form needs, with the stock number a new work would get. */
export async function getStudioSettings(db: Db, scope: Scope): Promise<StudioSettings> {
  const studio = await getStudio(db, scope);
  const next = (await stockNumberAllocator(db, scope, studio)).peek();
  return toStudioSettings(studio, next);
}

export async function updateStudioSettings(
  db: Db,
  scope: Scope,
  { stockNumberPattern, priceStep }: StudioSettingsUpdate,
): Promise<StudioSettings> {
  await updateStudio(db, scope, {
    ...(stockNumberPattern !== undefined ? { stock_number_pattern: stockNumberPattern } : {}),
    ...(priceStep !== undefined ? { price_step: priceStep } : {}),
  });
  return getStudioSettings(db, scope);
}

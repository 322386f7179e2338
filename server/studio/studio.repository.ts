import { type StudioSettings } from '@/shared/schemas/studio';
import { defaultTerms, type Terms, termsSchema } from '@/shared/schemas/terms';

import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { type StudioRow } from '../db/schema/studios';
import { notFound } from '../http/http-error';

export type Studio = Pick<
  StudioRow,
  | 'id'
  | 'name'
  | 'currency'
  | 'locale'
  | 'time_zone'
  | 'vat_number'
  | 'stock_number_pattern'
  | 'price_step'
  | 'default_terms'
>;

export async function getStudio(db: Db, scope: Scope): Promise<Studio> {
  const studio = await scoped
    .studios(db, scope)
    .select([
      'studios.id',
      'studios.name',
      'studios.currency',
      'studios.locale',
      'studios.time_zone',
      'studios.vat_number',
      'studios.stock_number_pattern',
      'studios.price_step',
      'studios.default_terms',
    ])
    .executeTakeFirst();
  if (!studio) throw notFound('The studio');
  return studio;
}

export async function updateStudio(
  db: Db,
  scope: Scope,
  columns: Partial<Pick<StudioRow, 'stock_number_pattern' | 'price_step'>>,
): Promise<void> {
  if (Object.keys(columns).length === 0) return;
  await db
    .updateTable('studios')
    .set({ ...columns, updated_at: new Date().toISOString() })
    .where('studios.id', '=', scope.studioId)
    .execute();
}

/** The terms a new venue starts from: the studio's own, or the product's in its currency. */
export function studioDefaultTerms(studio: Studio): Terms {
  if (studio.default_terms) return termsSchema.parse(JSON.parse(studio.default_terms));
  return {
    ...defaultTerms,
    paymentTerms: { ...defaultTerms.paymentTerms },
    currency: studio.currency,
  };
}

export function toStudioSettings(studio: Studio, nextStockNumber: string): StudioSettings {
  return {
    id: studio.id,
    name: studio.name,
    currency: studio.currency,
    locale: studio.locale,
    timeZone: studio.time_zone,
    vatNumber: studio.vat_number,
    stockNumberPattern: studio.stock_number_pattern,
    priceStep: studio.price_step,
    nextStockNumber,
  };
}

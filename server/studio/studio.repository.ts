import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { type StudioRow } from '../db/schema/studios';

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

export async function findStudio(db: Db, scope: Scope): Promise<Studio | undefined> {
  return scoped
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

import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { lockedForUpdate } from '../db/dialect';
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

/**
 * Locks the studio's row until the transaction ends (on PostgreSQL; SQLite runs one writer at a
 * time anyway), for what the studio hands out one at a time: the next stock number, and the sale
 * e-mail held for the maker, which racing sales would otherwise each start anew.
 */
export async function lockStudio(db: Db, scope: Scope): Promise<void> {
  await db
    .selectFrom('studios')
    .select('studios.id')
    .where('studios.id', '=', scope.studioId)
    .$call(lockedForUpdate(db))
    .execute();
}

import { isoDateInTimeZone } from '@/shared/money';
import { stockNumberLike, stockNumberSequence } from '@/shared/works/stock-number';

import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { lockStudio, type Studio } from '../studio/studio.repository';
import { listStockNumbersLike } from './works.repository';

/**
 * Hands out stock numbers from the studio's pattern for this year (in the studio's time zone),
 * after those already used, including `alsoTaken` (numbers about to be inserted). Called in the
 * transaction that inserts them: the studio stays locked until it ends, so a request numbering
 * works at the same time reads them as used.
 */
export async function stockNumberAllocator(
  db: Db,
  scope: Scope,
  studio: Pick<Studio, 'stock_number_pattern' | 'time_zone'>,
  alsoTaken: Iterable<string> = [],
  now = new Date(),
) {
  await lockStudio(db, scope);
  const pattern = studio.stock_number_pattern;
  const year = Number(isoDateInTimeZone(now, studio.time_zone).slice(0, 4));
  const existing = await listStockNumbersLike(db, scope, stockNumberLike(pattern, year));
  return stockNumberSequence(pattern, year, [...existing, ...alsoTaken]);
}

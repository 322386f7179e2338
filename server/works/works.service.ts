import {
  type Work,
  type WorkCreateParsed,
  type WorkList,
  type WorkSort,
  type WorkUpdateParsed,
} from '@/shared/schemas/work';

import { type Scope } from '../access/viewer';
import { writeAudit } from '../audit/audit-log.repository';
import { type Db } from '../db/database';
import { isUniqueViolation } from '../db/errors';
import { HttpError, notFound } from '../http/http-error';
import { type PhotoStore } from '../photos/photo-store';
import { deleteUnusedFiles, fileIdsOfWork } from '../photos/photos.repository';
import { removeStoredContent } from '../photos/photos.service';
import { yieldToEventLoop } from '../runtime/slices';
import { getStudio } from '../studio/studio.service';
import { worksCsvHeader, worksCsvLines } from './export/works-csv';
import { stockNumberAllocator } from './stock-numbers';
import { toNewWorkRow, toWork, toWorkColumns } from './works.mapper';
import {
  countWorks,
  deleteWorkRow,
  findWorkRow,
  insertWorks,
  listPhotosOf,
  listWorkRows,
  stockNumbersTaken,
  updateWorkColumns,
  type WorkFilter,
  workHasRecord,
} from './works.repository';

export function stockNumberConflict(stockNumber: string): HttpError {
  const message = `The stock number ${stockNumber} is already used by another work in this studio.`;
  return new HttpError('conflict', message, [{ path: ['stockNumber'], message }]);
}

export async function listWorks(
  db: Db,
  scope: Scope,
  query: WorkFilter & { sort: WorkSort; page: number; pageSize: number },
): Promise<WorkList> {
  const [rows, total] = await Promise.all([
    listWorkRows(db, scope, query, query.sort, query),
    countWorks(db, scope, query),
  ]);
  const photos = await listPhotosOf(
    db,
    scope,
    rows.map((r) => r.id),
  );
  return { items: rows.map((r) => toWork(r, photos.get(r.id) ?? [])), total };
}

/**
 * Every work the filter selects, in order, written as CSV a page at a time: the response starts at
 * once, memory stays flat, and other requests are answered between pages.
 */
export async function exportWorksCsv(
  db: Db,
  scope: Scope,
  query: WorkFilter & { sort: WorkSort },
  write: (chunk: string) => Promise<void>,
): Promise<void> {
  await write(worksCsvHeader());
  const pageSize = 500;
  for (let page = 1; ; page += 1) {
    const rows = await listWorkRows(db, scope, query, query.sort, { page, pageSize });
    await write(worksCsvLines(rows.map((r) => toWork(r, []))));
    if (rows.length < pageSize) return;
    await yieldToEventLoop();
  }
}

export async function getWork(db: Db, scope: Scope, id: number): Promise<Work> {
  const row = await findWorkRow(db, scope, id);
  if (!row) throw notFound('That work');
  const photos = await listPhotosOf(db, scope, [id]);
  return toWork(row, photos.get(id) ?? []);
}

/** A new work; without a stock number it gets the next one from the studio's pattern. */
export async function createWork(db: Db, scope: Scope, input: WorkCreateParsed): Promise<Work> {
  const id = await db.transaction().execute(async (trx) => {
    const stockNumber =
      input.stockNumber ??
      (await stockNumberAllocator(trx, scope, await getStudio(trx, scope))).next();
    const inserted = await insertWorks(trx, [toNewWorkRow(input, scope.studioId, stockNumber)]);
    const id = inserted.get(stockNumber);
    if (id === undefined) throw stockNumberConflict(stockNumber);
    return id;
  });
  return getWork(db, scope, id);
}

/**
 * A work's amounts share one currency: a change of currency comes with every amount in the new
 * one (or the cost cleared), so a stored cost is never relabelled into another currency.
 */
function checkCurrencies(
  before: { currency: string; cost_price: number | null },
  input: WorkUpdateParsed,
): void {
  const currency = input.retailPrice?.currency ?? before.currency;
  const fieldError = (path: string[], message: string) =>
    new HttpError('invalid_request', 'Some fields need attention.', [{ path, message }]);
  if (input.costPrice && input.costPrice.currency !== currency) {
    throw fieldError(
      ['costPrice', 'currency'],
      'Enter the cost in the same currency as the retail price.',
    );
  }
  if (currency !== before.currency && before.cost_price !== null && input.costPrice === undefined) {
    throw fieldError(
      ['costPrice'],
      `The cost is in ${before.currency}. Enter it in ${currency} as well, or clear it, when the retail price changes currency.`,
    );
  }
}

/** Changes the fields sent; a change of retail price is written to the audit log. */
export async function updateWork(
  db: Db,
  scope: Scope,
  id: number,
  input: WorkUpdateParsed,
): Promise<Work> {
  await db.transaction().execute(async (trx) => {
    const before = await findWorkRow(trx, scope, id);
    if (!before) throw notFound('That work');
    checkCurrencies(before, input);
    if (
      input.stockNumber !== undefined &&
      (await stockNumbersTaken(trx, scope, [input.stockNumber], id)).size > 0
    ) {
      throw stockNumberConflict(input.stockNumber);
    }
    try {
      await updateWorkColumns(trx, scope, id, toWorkColumns(input));
    } catch (err) {
      if (isUniqueViolation(err)) throw stockNumberConflict(input.stockNumber ?? '');
      throw err;
    }
    const price = input.retailPrice;
    if (price && (price.amount !== before.retail_price || price.currency !== before.currency)) {
      await writeAudit(trx, scope, {
        action: 'work.price-changed',
        entity: 'work',
        entityId: id,
        before: { retailPrice: { amount: before.retail_price, currency: before.currency } },
        after: { retailPrice: price },
      });
    }
  });
  return getWork(db, scope, id);
}

export async function setArchived(
  db: Db,
  scope: Scope,
  id: number,
  archived: boolean,
): Promise<Work> {
  const work = await findWorkRow(db, scope, id);
  if (!work) throw notFound('That work');
  if ((work.archived_at !== null) !== archived) {
    await updateWorkColumns(db, scope, id, {
      archived_at: archived ? new Date().toISOString() : null,
    });
  }
  return getWork(db, scope, id);
}

/**
 * Deletes a work that has no history, and its pictures once nothing else shows them; one that has
 * been consigned is kept and can be archived.
 */
export async function deleteWork(
  db: Db,
  store: PhotoStore,
  scope: Scope,
  id: number,
): Promise<void> {
  const unused = await db.transaction().execute(async (trx) => {
    const work = await findWorkRow(trx, scope, id);
    if (!work) throw notFound('That work');
    const record = await workHasRecord(trx, scope, id);
    if (record.consigned || record.reported) {
      throw new HttpError(
        'conflict',
        `${work.stock_number} has been ${record.consigned ? 'on a consignment' : 'condition-checked'}, ` +
          'so it stays in the catalogue for the record. Archive it instead to hide it from lists.',
      );
    }
    const fileIds = await fileIdsOfWork(trx, scope, id);
    await deleteWorkRow(trx, scope, id);
    return deleteUnusedFiles(trx, scope, fileIds);
  });
  await removeStoredContent(db, store, unused);
}

import { type WorkCreateParsed } from '@/shared/schemas/work';
import {
  type ImportField,
  type ImportRow,
  type WorkImportPreview,
  type WorkImportRequest,
  type WorkImportResult,
} from '@/shared/schemas/work-import';

import { type Scope } from '../../access/viewer';
import { type Db } from '../../db/database';
import { getStudio } from '../../studio/studio.repository';
import { stockNumberAllocator } from '../stock-numbers';
import { toNewWorkRow } from '../works.mapper';
import { insertWorks, stockNumbersTaken } from '../works.repository';
import { parseImportRow } from './import-row';
import { parseCsv, resolveMapping } from './parse-csv';

type CheckedRow = ImportRow & { work: WorkCreateParsed | null };

/**
 * Every row of the file, checked as the create form checks a work, plus duplicate stock numbers
 * within the file and against the catalogue (reported on the row, never merged).
 */
async function checkRows(db: Db, scope: Scope, request: WorkImportRequest) {
  const studio = await getStudio(db, scope);
  const { columns, records } = parseCsv(request.csv);
  const mapping = resolveMapping(columns, request.mapping);
  const mapped = Object.entries(mapping) as [ImportField, string][];

  const rows: CheckedRow[] = records.map((record) => {
    const values = Object.fromEntries(
      mapped.map(([field, header]) => [field, record.cells[columns.indexOf(header)] ?? '']),
    );
    const { work, errors } = parseImportRow(values, studio.currency);
    if (record.parseError) errors.unshift({ field: 'row', message: record.parseError });
    return {
      rowNumber: record.rowNumber,
      stockNumber: values.stockNumber?.trim() || null,
      title: values.title?.trim() || null,
      errors,
      work: record.parseError ? null : work,
    };
  });

  const rowsByStock = new Map<string, number[]>();
  for (const row of rows) {
    if (row.stockNumber === null) continue;
    rowsByStock.set(row.stockNumber, [...(rowsByStock.get(row.stockNumber) ?? []), row.rowNumber]);
  }
  const inCatalogue = await stockNumbersTaken(db, scope, [...rowsByStock.keys()]);
  for (const row of rows) {
    if (row.stockNumber === null) continue;
    const others = rowsByStock.get(row.stockNumber)!.filter((n) => n !== row.rowNumber);
    if (others.length > 0) {
      row.errors.push({
        field: 'stockNumber',
        message: `The stock number ${row.stockNumber} is also on row ${others.join(', ')} of the file.`,
      });
    }
    if (inCatalogue.has(row.stockNumber)) {
      row.errors.push({
        field: 'stockNumber',
        message: `The stock number ${row.stockNumber} is already used by a work in the catalogue.`,
      });
    }
    if (row.errors.length > 0) row.work = null;
  }
  return { studio, columns, mapping, rows };
}

const publicRow = ({ work: _work, ...row }: CheckedRow): ImportRow => row;

/** Checks the file and writes nothing. */
export async function previewImport(
  db: Db,
  scope: Scope,
  request: WorkImportRequest,
): Promise<WorkImportPreview> {
  const { columns, mapping, rows } = await checkRows(db, scope, request);
  const validCount = rows.filter((r) => r.work !== null).length;
  return {
    mode: 'preview',
    columns,
    mapping,
    rows: rows.map(publicRow),
    validCount,
    errorCount: rows.length - validCount,
  };
}

/**
 * Checks the file again and inserts every valid row in one transaction: all of them or, if
 * anything fails, none. Rows without a stock number get the next ones from the pattern.
 */
export async function commitImport(
  db: Db,
  scope: Scope,
  request: WorkImportRequest,
): Promise<WorkImportResult> {
  return db.transaction().execute(async (trx) => {
    const { studio, rows } = await checkRows(trx, scope, request);
    const valid = rows.filter((r) => r.work !== null);
    const given = valid.map((r) => r.work!.stockNumber).filter((s): s is string => !!s);
    const allocator = await stockNumberAllocator(trx, scope, studio, given);
    await insertWorks(
      trx,
      valid.map((r) =>
        toNewWorkRow(r.work!, scope.studioId, r.work!.stockNumber ?? allocator.next()),
      ),
    );
    return {
      mode: 'commit',
      imported: valid.length,
      skipped: rows.filter((r) => r.work === null).map(publicRow),
    };
  });
}

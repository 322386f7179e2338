import { type WorkCreateParsed } from '@/shared/schemas/work';
import {
  type ImportColumn,
  type ImportProblem,
  type ImportRow,
  listedProblemRows,
  listedReadyRows,
  type WorkImportPreview,
  type WorkImportRequest,
  type WorkImportResult,
} from '@/shared/schemas/work-import';

import { type Scope } from '../../access/viewer';
import { type Db } from '../../db/database';
import { eachSlice, mapInSlices } from '../../runtime/slices';
import { getStudio } from '../../studio/studio.service';
import { stockNumberAllocator } from '../stock-numbers';
import { toNewWorkRow } from '../works.mapper';
import { insertWorks, stockNumbersTaken } from '../works.repository';
import { parseImportRow } from './import-row';
import { parseCsv, resolveMapping } from './parse-csv';

type CheckedRow = ImportRow & { work: WorkCreateParsed | null };

/**
 * Every row of the file, checked as the create form checks a work, plus duplicate stock numbers
 * within the file and against the catalogue (reported on the row, never merged). The rows are
 * checked in slices, so a large file never keeps the server from answering others meanwhile.
 */
async function checkRows(db: Db, scope: Scope, request: WorkImportRequest) {
  const studio = await getStudio(db, scope);
  const { columns, records } = parseCsv(request.csv);
  const mapping = resolveMapping(columns, request.mapping);
  const mapped = (Object.entries(mapping) as [ImportColumn, string][]).map(
    ([field, header]) => [field, columns.indexOf(header)] as const,
  );

  const rows = await mapInSlices(records, (record): CheckedRow => {
    const values = Object.fromEntries(
      mapped.map(([field, index]) => [field, record.cells[index] ?? '']),
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
    if (inCatalogue.has(row.stockNumber)) row.errors.push(takenError(row.stockNumber));
    if (row.errors.length > 0) row.work = null;
  }
  return { studio, columns, mapping, rows };
}

const takenError = (stockNumber: string) => ({
  field: 'stockNumber',
  message: `The stock number ${stockNumber} is already used by a work in the catalogue.`,
});

/** A row as a list shows it: a long title is cut, since the row number finds it in the file. */
const publicRow = ({ work: _work, title, ...row }: CheckedRow): ImportRow => ({
  ...row,
  title: title !== null && title.length > 80 ? `${title.slice(0, 79)}…` : title,
});

/** The rows a list shows: the first ready ones and the first ones with a problem, in file order. */
function listed(rows: readonly CheckedRow[]): ImportRow[] {
  let ready = 0;
  let bad = 0;
  return rows
    .filter((row) => (row.work === null ? bad++ < listedProblemRows : ready++ < listedReadyRows))
    .map(publicRow);
}

/** Every distinct problem, with all the rows that have it. */
function problemsOf(rows: readonly CheckedRow[]): ImportProblem[] {
  const byProblem = new Map<string, ImportProblem>();
  for (const row of rows) {
    for (const { field, message } of row.errors) {
      const key = `${field}\u0000${message}`;
      const problem = byProblem.get(key) ?? { field, message, rowNumbers: [] };
      problem.rowNumbers.push(row.rowNumber);
      byProblem.set(key, problem);
    }
  }
  return [...byProblem.values()];
}

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
    rowCount: rows.length,
    validCount,
    errorCount: rows.length - validCount,
    rows: listed(rows),
    problems: problemsOf(rows),
  };
}

/**
 * Checks the file again and inserts every valid row in one transaction: all of them or, if
 * anything fails, none. Rows without a stock number get the next ones from the pattern; a row
 * whose stock number was taken since the check is skipped and reported like any other bad row.
 */
export async function commitImport(
  db: Db,
  scope: Scope,
  request: WorkImportRequest,
): Promise<WorkImportResult> {
  const { studio, rows } = await checkRows(db, scope, request);
  const valid = rows.filter((r) => r.work !== null);
  const given = valid.map((r) => r.work!.stockNumber).filter((s): s is string => !!s);
  return db.transaction().execute(async (trx) => {
    const allocator = await stockNumberAllocator(trx, scope, studio, given);
    const numbered = valid.map((row) => ({
      row,
      insert: toNewWorkRow(row.work!, scope.studioId, row.work!.stockNumber ?? allocator.next()),
    }));
    const inserted = new Map<string, number>();
    await eachSlice(numbered, async (slice) => {
      const ids = await insertWorks(
        trx,
        slice.map((n) => n.insert),
      );
      for (const [stockNumber, id] of ids) inserted.set(stockNumber, id);
    });
    for (const { row, insert } of numbered) {
      if (inserted.has(insert.stock_number)) continue;
      row.errors.push(takenError(insert.stock_number));
      row.work = null;
    }
    const skipped = rows.filter((r) => r.work === null);
    return {
      mode: 'commit',
      imported: inserted.size,
      skippedCount: skipped.length,
      skipped: listed(skipped),
      problems: problemsOf(skipped),
    };
  });
}

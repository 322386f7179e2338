import { type WorkCreateParsed } from '@/shared/schemas/work';
import {
  type ImportColumn,
  importColumnLabel,
  type ImportDuplicateGroup,
  type ImportProblem,
  type ImportRow,
  listedProblemRows,
  listedReadyRows,
  overridableDuplicates,
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
import { insertWorks } from '../works.repository';
import { markDuplicates, stockNumberInCatalogue } from './import-duplicates';
import { parseImportRow } from './import-row';
import { parseCsv, resolveMapping } from './parse-csv';
import { skippedRowsCsv } from './skipped-csv';

type CheckedRow = ImportRow & { work: WorkCreateParsed | null; raw: string[] };

/**
 * Every row of the file, checked as the create form checks a work, and marked when it repeats a
 * work in the catalogue or an earlier row (reported on the row, never merged). The rows are
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
    const { work, read, errors } = parseImportRow(values, studio.currency);
    if (record.parseError) errors.unshift({ field: 'row', message: record.parseError });
    return {
      rowNumber: record.rowNumber,
      stockNumber: values.stockNumber?.trim() || null,
      title: values.title?.trim() || null,
      read,
      errors,
      duplicate: null,
      work: record.parseError ? null : work,
      raw: record.raw,
    };
  });
  await markDuplicates(db, scope, rows);
  return { studio, columns, mapping, rows };
}

/** Whether a row goes in: no problems, and no duplicate unless one the maker chose to import. */
const goesIn = (row: CheckedRow, importDuplicates: boolean) =>
  row.work !== null &&
  (row.duplicate === null || (importDuplicates && overridableDuplicates.has(row.duplicate.kind)));

/** A row as a list shows it: a long title is cut, since the row number finds it in the file. */
const publicRow = ({ work: _work, raw: _raw, title, ...row }: CheckedRow): ImportRow => ({
  ...row,
  title: title !== null && title.length > 80 ? `${title.slice(0, 79)}…` : title,
});

/** The rows a list shows: the first ready ones and the first ones skipped, in file order. */
function listed(rows: readonly CheckedRow[], importDuplicates = false): ImportRow[] {
  let ready = 0;
  let skipped = 0;
  return rows
    .filter((row) =>
      goesIn(row, importDuplicates) ? ready++ < listedReadyRows : skipped++ < listedProblemRows,
    )
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

/** Each kind of duplicate, with all the rows that are one. */
function duplicatesOf(rows: readonly CheckedRow[]): ImportDuplicateGroup[] {
  const byKind = new Map<string, ImportDuplicateGroup>();
  for (const row of rows) {
    if (row.duplicate === null) continue;
    const group = byKind.get(row.duplicate.kind) ?? { kind: row.duplicate.kind, rowNumbers: [] };
    group.rowNumbers.push(row.rowNumber);
    byKind.set(row.duplicate.kind, group);
  }
  return [...byKind.values()];
}

/** Checks the file and writes nothing. */
export async function previewImport(
  db: Db,
  scope: Scope,
  request: WorkImportRequest,
): Promise<WorkImportPreview> {
  const { columns, mapping, rows } = await checkRows(db, scope, request);
  const checked = rows.filter((r) => r.work !== null);
  const duplicates = checked.filter((r) => r.duplicate !== null);
  return {
    mode: 'preview',
    columns,
    mapping,
    rowCount: rows.length,
    validCount: checked.length - duplicates.length,
    errorCount: rows.length - checked.length,
    duplicateCount: duplicates.length,
    importableDuplicateCount: duplicates.filter((r) => overridableDuplicates.has(r.duplicate!.kind))
      .length,
    rows: listed(rows),
    problems: problemsOf(rows),
    duplicates: duplicatesOf(rows),
  };
}

/**
 * Checks the file again and inserts every row that goes in, in one transaction: all of them or,
 * if anything fails, none. Rows without a stock number get the next ones from the pattern; a row
 * whose stock number was taken since the check is skipped as a duplicate. Every skipped row comes
 * back as CSV, with why, to correct and import again.
 */
export async function commitImport(
  db: Db,
  scope: Scope,
  request: WorkImportRequest,
): Promise<WorkImportResult> {
  const { studio, columns, rows } = await checkRows(db, scope, request);
  const importDuplicates = request.importDuplicates ?? false;
  const going = rows.filter((r) => goesIn(r, importDuplicates));
  const given = going.map((r) => r.work!.stockNumber).filter((s): s is string => !!s);
  return db.transaction().execute(async (trx) => {
    const allocator = await stockNumberAllocator(trx, scope, studio, given);
    const numbered = going.map((row) => ({
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
    const skipped = rows.filter((r) => !goesIn(r, importDuplicates));
    for (const { row, insert } of numbered) {
      if (inserted.has(insert.stock_number)) continue;
      row.duplicate = stockNumberInCatalogue(insert.stock_number);
      skipped.push(row);
    }
    skipped.sort((a, b) => a.rowNumber - b.rowNumber);
    return {
      mode: 'commit',
      imported: inserted.size,
      skippedCount: skipped.length,
      skipped: listed(skipped),
      problems: problemsOf(skipped),
      duplicates: duplicatesOf(skipped),
      skippedCsv:
        skipped.length === 0
          ? null
          : skippedRowsCsv(
              columns,
              skipped.map((row) => ({
                raw: row.raw,
                problems: [
                  ...row.errors.map((e) => `${importColumnLabel(e.field)}: ${e.message}`),
                  ...(row.duplicate ? [row.duplicate.message] : []),
                ],
              })),
            ),
    };
  });
}

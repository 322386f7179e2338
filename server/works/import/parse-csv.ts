import Papa from 'papaparse';

import {
  type ImportColumn,
  importColumnAliases,
  importColumnLabels,
  importColumns,
  maxImportRows,
} from '@/shared/schemas/work-import';

import { HttpError } from '../../http/http-error';

/** `raw` is the row as the file has it, for handing back; `cells` as the import reads it. */
export type CsvRecord = {
  rowNumber: number;
  raw: string[];
  cells: string[];
  parseError: string | null;
};

/**
 * Header row and records; row numbers count the header as row 1, as a spreadsheet shows it. A
 * file over `maxImportRows` is refused whole, with the limit said.
 */
export function parseCsv(csv: string): { columns: string[]; records: CsvRecord[] } {
  const parsed = Papa.parse<string[]>(csv, { header: false, skipEmptyLines: false });
  const [header = [], ...rows] = parsed.data;
  const errorsByRow = new Map<number, string>();
  for (const error of parsed.errors) {
    if (error.row !== undefined) errorsByRow.set(error.row, error.message);
  }
  const records = rows
    .map((cells, i) => ({
      rowNumber: i + 2,
      raw: cells,
      cells: cells.map(unescapeFormula),
      parseError: errorsByRow.get(i + 1) ?? null,
    }))
    // Blank lines (a trailing newline, a spacer row) are not works.
    .filter((r) => r.cells.some((c) => c.trim() !== ''));
  if (records.length > maxImportRows) {
    const message =
      `The file has ${records.length.toLocaleString('en-GB')} rows; an import takes at most ` +
      `${maxImportRows.toLocaleString('en-GB')}. Split it into smaller files.`;
    throw new HttpError('invalid_request', message, [{ path: ['csv'], message }]);
  }
  return { columns: header.map((h) => h.trim()), records };
}

/** The export's guard against spreadsheet formulas ("'=…"), taken off again. */
const unescapeFormula = (cell: string) => (/^'[=+\-@\t\r]/.test(cell) ? cell.slice(1) : cell);

export const normaliseHeader = (name: string) => name.toLowerCase().replace(/[^a-z0-9]/g, '');

/**
 * Which column feeds each field: the mapping sent (each header must be in the file), or else
 * headers that match a field's name, label or a usual alias, ignoring case and punctuation.
 */
export function resolveMapping(
  columns: readonly string[],
  mapping: Partial<Record<ImportColumn, string>> | undefined,
): Partial<Record<ImportColumn, string>> {
  if (mapping) {
    const issues = Object.entries(mapping)
      .filter(([, header]) => !columns.includes(header))
      .map(([field, header]) => ({
        path: ['mapping', field],
        message: `There is no column called “${header}” in the file.`,
      }));
    if (issues.length > 0) {
      throw new HttpError('invalid_request', 'Some fields need attention.', issues);
    }
    return mapping;
  }
  const resolved: Partial<Record<ImportColumn, string>> = {};
  const used = new Set<string>();
  for (const field of importColumns) {
    const names = [field, importColumnLabels[field], ...(importColumnAliases[field] ?? [])].map(
      normaliseHeader,
    );
    const header = columns.find((c) => !used.has(c) && names.includes(normaliseHeader(c)));
    if (header !== undefined) {
      resolved[field] = header;
      used.add(header);
    }
  }
  return resolved;
}

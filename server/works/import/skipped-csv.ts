import Papa from 'papaparse';

import { csvOptions } from '../export/works-csv';
import { normaliseHeader } from './parse-csv';

export type SkippedRecord = { raw: readonly string[]; problems: readonly string[] };

/**
 * The skipped rows as the file had them, with a Problem column saying why, to correct and import
 * again (the import reads no Problem column). A file that already has one, from an earlier
 * round, has it rewritten rather than a second one added.
 */
export function skippedRowsCsv(
  columns: readonly string[],
  skipped: readonly SkippedRecord[],
): string {
  const existing = columns.findIndex((c) => normaliseHeader(c) === 'problem');
  const at = existing === -1 ? columns.length : existing;
  const withProblem = (cells: readonly string[], problem: string) => {
    const row = Array.from({ length: Math.max(columns.length, cells.length, at + 1) }, (_, i) =>
      i < cells.length ? cells[i]! : '',
    );
    row[at] = problem;
    return row;
  };
  const header = withProblem(columns, 'Problem');
  const rows = skipped.map((r) => withProblem(r.raw, r.problems.join(' ')));
  return `${Papa.unparse([header, ...rows], csvOptions)}\r\n`;
}

import Papa from 'papaparse';

import { toDecimalString } from '@/shared/money';
import { type Work } from '@/shared/schemas/work';
import { importFieldLabels, importFields } from '@/shared/schemas/work-import';

type Cell = string | number | null;

const price = (money: Work['retailPrice'] | null) => (money ? toDecimalString(money) : null);

/** One column per importable field (so an export imports back), then where the work is. */
const columns: [string, (work: Work) => Cell][] = [
  ...importFields.map((field): [string, (work: Work) => Cell] => [
    importFieldLabels[field],
    field === 'retailPrice' || field === 'costPrice'
      ? (work) => price(work[field])
      : (work) => work[field],
  ]),
  ['Currency', (work) => work.retailPrice.currency],
  ['Status', (work) => work.status],
  ['Venue', (work) => work.venue?.name ?? null],
  ['Archived at', (work) => work.archivedAt],
];

// papaparse's own `true` tests /^[=+\-@\t\r].*$/, which a cell with a line break escapes.
export const csvOptions = { escapeFormulae: /^[=+\-@\t\r]/, newline: '\r\n' } as const;

/** The header line of the catalogue's CSV, with its line break. */
export function worksCsvHeader(): string {
  return `${Papa.unparse([columns.map(([header]) => header)], csvOptions)}\r\n`;
}

/**
 * Works as CSV lines (RFC 4180 quoting by papaparse), each ending in a line break, prices in major
 * units. Cells that a spreadsheet would run as a formula (=, +, -, @) are prefixed with an
 * apostrophe, which the import takes off again.
 */
export function worksCsvLines(works: readonly Work[]): string {
  if (works.length === 0) return '';
  const data = works.map((work) => columns.map(([, cell]) => cell(work) ?? ''));
  return `${Papa.unparse(data, csvOptions)}\r\n`;
}

import Papa from 'papaparse';

import { toDecimalString } from '@/shared/money';
import { minorUnitOf } from '@/shared/schemas/money';
import { type ImportColumn, importColumnLabels, importColumns } from '@/shared/schemas/work-import';

import { csvOptions } from '../export/works-csv';

/** An invented piece that imports cleanly, with a cell in every column. */
const example = (currency: string): Record<ImportColumn, string> => {
  const price = (major: number) =>
    toDecimalString({ amount: major * 10 ** minorUnitOf(currency), currency });
  return {
    stockNumber: 'EX-001',
    title: 'Tea bowl, ash glaze',
    year: String(new Date().getUTCFullYear()),
    series: 'Estuary',
    category: 'Bowls',
    clayBody: 'Buff stoneware',
    glaze: 'Wood ash',
    firingTempC: '1280',
    atmosphere: 'Reduction',
    kiln: 'Gas',
    heightMm: '85',
    widthMm: '120',
    depthMm: '120',
    weightG: '350',
    retailPrice: price(45),
    costPrice: price(12),
    foodUse: 'food-safe',
    careNotes: 'Hand wash.',
    notes: '',
    currency,
  };
};

/** Every column the import reads, by the label it writes, and one example row. */
export function importTemplateCsv(currency: string): string {
  const row = example(currency);
  return `${Papa.unparse(
    [importColumns.map((c) => importColumnLabels[c]), importColumns.map((c) => row[c])],
    csvOptions,
  )}\r\n`;
}

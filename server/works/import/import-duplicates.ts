import { type WorkCreateParsed } from '@/shared/schemas/work';
import { type ImportRow } from '@/shared/schemas/work-import';

import { type Scope } from '../../access/viewer';
import { type Db } from '../../db/database';
import { stockNumbersTaken, worksTitled } from '../works.repository';

type Row = {
  rowNumber: number;
  stockNumber: string | null;
  work: WorkCreateParsed | null;
  duplicate: ImportRow['duplicate'];
};

export const stockNumberInCatalogue = (stockNumber: string): ImportRow['duplicate'] => ({
  kind: 'stock-number-in-catalogue',
  message: `The stock number ${stockNumber} is already used by a work in the catalogue; stock numbers are unique, so this row cannot be imported.`,
});

const sameWork = (
  title: string,
  year: number | null | undefined,
  amount: number,
  currency: string,
) => JSON.stringify([title, year ?? null, amount, currency]);

/**
 * Marks the rows that repeat a work: by stock number when the row has one (the catalogue's, or
 * an earlier row's: the first row with it counts), otherwise by the same title, year and price,
 * so that importing a file twice adds nothing the second time.
 */
export async function markDuplicates(db: Db, scope: Scope, rows: readonly Row[]): Promise<void> {
  const numbered = rows.filter((r) => r.stockNumber !== null);
  const taken = await stockNumbersTaken(db, scope, [
    ...new Set(numbered.map((r) => r.stockNumber!)),
  ]);
  const firstWith = new Map<string, number>();
  for (const row of numbered) {
    const stockNumber = row.stockNumber!;
    const first = firstWith.get(stockNumber);
    if (taken.has(stockNumber)) {
      row.duplicate = stockNumberInCatalogue(stockNumber);
    } else if (first !== undefined) {
      row.duplicate = {
        kind: 'stock-number-in-file',
        message: `The stock number ${stockNumber} is also on row ${first}, which is imported; stock numbers are unique, so this row cannot be.`,
      };
    } else {
      firstWith.set(stockNumber, row.rowNumber);
    }
  }

  const unnumbered = rows.filter((r) => r.stockNumber === null && r.work !== null);
  const inCatalogue = new Map<string, string>();
  const titles = [...new Set(unnumbered.map((r) => r.work!.title))];
  for (const work of await worksTitled(db, scope, titles)) {
    const key = sameWork(work.title, work.year, work.retail_price, work.currency);
    if (!inCatalogue.has(key)) inCatalogue.set(key, work.stock_number);
  }
  const firstSame = new Map<string, number>();
  for (const row of unnumbered) {
    const { title, year, retailPrice } = row.work!;
    const key = sameWork(title, year, retailPrice.amount, retailPrice.currency);
    const stockNumber = inCatalogue.get(key);
    const first = firstSame.get(key);
    if (stockNumber !== undefined) {
      row.duplicate = {
        kind: 'same-in-catalogue',
        message: `Same title, year and price as ${stockNumber} in the catalogue.`,
      };
    } else if (first !== undefined) {
      row.duplicate = {
        kind: 'same-in-file',
        message: `Same title, year and price as row ${first}.`,
      };
    } else {
      firstSame.set(key, row.rowNumber);
    }
  }
}

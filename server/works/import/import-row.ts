import { parseLengthMm, parseWeightGrams } from '@/shared/measurements';
import { readWrittenAmount } from '@/shared/money';
import { type WorkCreateParsed, workCreateSchema } from '@/shared/schemas/work';
import { type ImportColumn, type ImportField, type ImportRead } from '@/shared/schemas/work-import';

export type RowError = { field: string; message: string };

type Read = { ok: true; value: unknown } | { ok: false; message: string };

/** How a cell of each measured column is read; other columns are text or whole numbers. */
const readers: Partial<Record<ImportField, (text: string, currency: string) => Read>> = {
  retailPrice: readWrittenAmount,
  costPrice: readWrittenAmount,
  heightMm: parseLengthMm,
  widthMm: parseLengthMm,
  depthMm: parseLengthMm,
  weightG: parseWeightGrams,
};

const wholeNumberFields = new Set<ImportField>(['year', 'firingTempC']);

const foodUses: Record<string, string> = {
  foodsafe: 'food-safe',
  yes: 'food-safe',
  decorative: 'decorative',
  decorativeonly: 'decorative',
  notforfooduse: 'decorative',
  no: 'decorative',
  notstated: 'not-stated',
};

const readFields = [
  'retailPrice',
  'costPrice',
  'heightMm',
  'widthMm',
  'depthMm',
  'weightG',
] as const satisfies readonly (keyof ImportRead)[];

/**
 * One CSV row as the create form would send it, checked with the same `workCreateSchema`, and
 * what its prices and measurements were read as, for the preview to show. Blank cells are left
 * out; prices are major units in the studio's currency, and a row whose currency column or price
 * sign names another currency is refused rather than relabelled.
 */
export function parseImportRow(
  values: Partial<Record<ImportColumn, string>>,
  currency: string,
): { work: WorkCreateParsed | null; read: ImportRead; errors: RowError[] } {
  const errors: RowError[] = [];
  const candidate: Record<string, unknown> = {};
  const { currency: rowCurrency, ...fields } = values;
  const stated = rowCurrency?.trim().toUpperCase() ?? '';
  if (stated !== '' && stated !== currency) {
    errors.push({
      field: 'currency',
      message: `This row is in ${stated}; the studio’s works are in ${currency}. Convert its prices, or leave it out.`,
    });
  }
  for (const [field, raw] of Object.entries(fields) as [ImportField, string][]) {
    const text = raw.trim();
    if (text === '') continue;
    const reader = readers[field];
    if (reader) {
      const read = reader(text, currency);
      if (read.ok) candidate[field] = read.value;
      else errors.push({ field, message: read.message });
    } else if (wholeNumberFields.has(field)) {
      const n = Number(text.replace(/,/g, ''));
      candidate[field] = Number.isFinite(n) ? n : text;
    } else if (field === 'foodUse') {
      candidate[field] = foodUses[text.toLowerCase().replace(/[^a-z]/g, '')] ?? text;
    } else {
      candidate[field] = text;
    }
  }
  const read = Object.fromEntries(
    readFields.map((field) => [field, candidate[field] ?? null]),
  ) as ImportRead;
  // The two required fields, said plainly when their cells are blank.
  candidate.title ??= '';
  if (candidate.retailPrice === undefined && !errors.some((e) => e.field === 'retailPrice')) {
    errors.push({ field: 'retailPrice', message: 'Enter the retail price, such as 12.50.' });
  }
  const result = workCreateSchema.safeParse(candidate);
  if (!result.success) {
    for (const issue of result.error.issues) {
      const field = String(issue.path[0] ?? 'row');
      // A cell already reported above is not reported twice.
      if (!errors.some((e) => e.field === field)) errors.push({ field, message: issue.message });
    }
  }
  return { work: errors.length === 0 && result.success ? result.data : null, read, errors };
}

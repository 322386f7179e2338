import { parseDecimalAmount } from '@/shared/money';
import { type WorkCreateParsed, workCreateSchema } from '@/shared/schemas/work';
import { type ImportColumn, type ImportField } from '@/shared/schemas/work-import';

export type RowError = { field: string; message: string };

const numberFields = new Set<ImportField>([
  'year',
  'firingTempC',
  'heightMm',
  'widthMm',
  'depthMm',
  'weightG',
]);

const foodUses: Record<string, string> = {
  foodsafe: 'food-safe',
  yes: 'food-safe',
  decorative: 'decorative',
  decorativeonly: 'decorative',
  notforfooduse: 'decorative',
  no: 'decorative',
  notstated: 'not-stated',
};

/**
 * One CSV row as the create form would send it, checked with the same `workCreateSchema`.
 * Blank cells are left out; prices are major units in the studio's currency, and a row whose
 * currency column names another currency is refused rather than relabelled.
 */
export function parseImportRow(
  values: Partial<Record<ImportColumn, string>>,
  currency: string,
): { work: WorkCreateParsed | null; errors: RowError[] } {
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
    if (field === 'retailPrice' || field === 'costPrice') {
      const amount = parseDecimalAmount(text, currency);
      if (amount === null) {
        errors.push({
          field,
          message: `Enter the price in ${currency} as a number such as 12.50, not “${text}”.`,
        });
      } else {
        candidate[field] = { amount, currency };
      }
    } else if (numberFields.has(field)) {
      const n = Number(text.replace(/,/g, ''));
      candidate[field] = Number.isFinite(n) ? n : text;
    } else if (field === 'foodUse') {
      candidate[field] = foodUses[text.toLowerCase().replace(/[^a-z]/g, '')] ?? text;
    } else {
      candidate[field] = text;
    }
  }
  // The two required fields, said plainly when their cells are blank.
  candidate.title ??= '';
  if (candidate.retailPrice === undefined && !errors.some((e) => e.field === 'retailPrice')) {
    errors.push({ field: 'retailPrice', message: 'Enter the retail price, such as 12.50.' });
  }
  const result = workCreateSchema.safeParse(candidate);
  if (!result.success) {
    for (const issue of result.error.issues) {
      const field = String(issue.path[0] ?? 'row');
      // A price already reported above is not reported twice.
      if (!errors.some((e) => e.field === field)) errors.push({ field, message: issue.message });
    }
  }
  return { work: errors.length === 0 && result.success ? result.data : null, errors };
}

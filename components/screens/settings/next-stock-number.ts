import { isoDateInTimeZone } from '@/shared/money/calendar';
import { stockNumberPatternSchema, type StudioSettings } from '@/shared/schemas/studio';
import { counterOf, formatStockNumber, nextStockNumber } from '@/shared/works/stock-number';

/**
 * The stock number a new work would get under a pattern as it is typed, by the code the server
 * numbers works with; null while the pattern is not one the server would take. The client knows
 * only the last number the saved pattern handed out, not every work's: the server's answer after
 * saving is the one that counts, and a pattern that reads that number (a longer counter) carries on
 * from it.
 */
export function nextStockNumberFor(
  settings: Pick<StudioSettings, 'stockNumberPattern' | 'nextStockNumber' | 'timeZone'>,
  patternText: string,
  now: Date,
): string | null {
  const parsed = stockNumberPatternSchema.safeParse(patternText);
  if (!parsed.success) return null;
  const pattern = parsed.data;
  if (pattern === settings.stockNumberPattern) return settings.nextStockNumber;
  const year = Number(isoDateInTimeZone(now, settings.timeZone).slice(0, 4));
  const next = counterOf(settings.stockNumberPattern, year, settings.nextStockNumber);
  const last =
    next !== null && next > 1n
      ? [formatStockNumber(settings.stockNumberPattern, year, next - 1n)]
      : [];
  return nextStockNumber(pattern, year, last);
}

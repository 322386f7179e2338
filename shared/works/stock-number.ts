/**
 * Stock numbers from the studio's pattern (see `stockNumberPatternSchema`): `{YYYY}` or `{YY}`
 * for the year, `{N…}` for a counter padded to as many digits as there are Ns. Pure, so the
 * client can show the next number and the server can make it.
 */

const token = /\{(YYYY|YY|N+)\}/g;

type Part = { literal: string } | { year: 4 | 2 } | { counterDigits: number };

function partsOf(pattern: string): Part[] {
  const parts: Part[] = [];
  let last = 0;
  for (const match of pattern.matchAll(token)) {
    if (match.index > last) parts.push({ literal: pattern.slice(last, match.index) });
    const name = match[1]!;
    if (name === 'YYYY') parts.push({ year: 4 });
    else if (name === 'YY') parts.push({ year: 2 });
    else parts.push({ counterDigits: name.length });
    last = match.index + match[0].length;
  }
  if (last < pattern.length) parts.push({ literal: pattern.slice(last) });
  return parts;
}

function yearText(year: number, digits: 4 | 2): string {
  return digits === 4 ? String(year).padStart(4, '0') : String(year % 100).padStart(2, '0');
}

/** The stock number for one counter value: `{YYYY}-{NNN}`, 2026, 7 → `2026-007`. */
export function formatStockNumber(pattern: string, year: number, counter: number): string {
  return partsOf(pattern)
    .map((part) => {
      if ('literal' in part) return part.literal;
      if ('year' in part) return yearText(year, part.year);
      return String(counter).padStart(part.counterDigits, '0');
    })
    .join('');
}

const escapeRegExp = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** The counter in a stock number made by the pattern in that year, or null if it is not one. */
export function counterOf(pattern: string, year: number, stockNumber: string): number | null {
  const source = partsOf(pattern)
    .map((part) => {
      if ('literal' in part) return escapeRegExp(part.literal);
      if ('year' in part) return yearText(year, part.year);
      return '(\\d+)';
    })
    .join('');
  const match = new RegExp(`^${source}$`).exec(stockNumber);
  return match ? Number(match[1]) : null;
}

/**
 * An SQLite GLOB that every stock number of the pattern in that year matches (and a few more,
 * which `counterOf` then leaves out), so the server reads only the candidates.
 */
export function stockNumberGlob(pattern: string, year: number): string {
  return partsOf(pattern)
    .map((part) => {
      if ('literal' in part) return part.literal.replace(/[*?[]/g, '[$&]');
      if ('year' in part) return yearText(year, part.year);
      return '*';
    })
    .join('');
}

/** The highest counter already used with the pattern in that year; 0 when none is. */
export function highestCounter(pattern: string, year: number, existing: Iterable<string>): number {
  let highest = 0;
  for (const stockNumber of existing) {
    const counter = counterOf(pattern, year, stockNumber);
    if (counter !== null && counter > highest) highest = counter;
  }
  return highest;
}

/**
 * The next stock number: one past the highest counter already used with the pattern in that
 * year (so gaps left by deleted works are not refilled), starting at 1.
 */
export function nextStockNumber(pattern: string, year: number, existing: Iterable<string>): string {
  return formatStockNumber(pattern, year, highestCounter(pattern, year, existing) + 1);
}

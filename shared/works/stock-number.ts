/**
 * Stock numbers from the studio's pattern (see `stockNumberPatternSchema`): `{YYYY}` or `{YY}`
 * for the year, `{N…}` for a counter padded to as many digits as there are Ns. Pure, so the
 * client can show the next number and the server can make it. Counters are BigInts: a number
 * typed by hand may carry any number of digits, and a float would turn 10^21 into "1e+21".
 */

/** Long enough for any pattern's number, short enough for a shelf label. */
export const maxStockNumberLength = 32;

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
export function formatStockNumber(pattern: string, year: number, counter: bigint): string {
  return partsOf(pattern)
    .map((part) => {
      if ('literal' in part) return part.literal;
      if ('year' in part) return yearText(year, part.year);
      return counter.toString().padStart(part.counterDigits, '0');
    })
    .join('');
}

const escapeRegExp = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** The counter in a stock number made by the pattern in that year, or null if it is not one. */
export function counterOf(pattern: string, year: number, stockNumber: string): bigint | null {
  const source = partsOf(pattern)
    .map((part) => {
      if ('literal' in part) return escapeRegExp(part.literal);
      if ('year' in part) return yearText(year, part.year);
      return '(\\d+)';
    })
    .join('');
  const match = new RegExp(`^${source}$`).exec(stockNumber);
  return match ? BigInt(match[1]!) : null;
}

/**
 * A portable SQL LIKE pattern (with `\` as the escape character) that every stock number of the
 * pattern in that year matches, and a few more, which `counterOf` then leaves out: the server
 * reads only the candidates.
 */
export function stockNumberLike(pattern: string, year: number): string {
  const escapeLike = (text: string) => text.replace(/[\\%_]/g, '\\$&');
  return partsOf(pattern)
    .map((part) => {
      if ('literal' in part) return escapeLike(part.literal);
      if ('year' in part) return yearText(year, part.year);
      return '%';
    })
    .join('');
}

/**
 * Hands out stock numbers: one past the highest counter used with the pattern that year (so gaps
 * left by deleted works are not refilled), starting at 1. When that would not fit in
 * `maxStockNumberLength` (someone typed a number with a huge counter by hand), the lowest counter
 * not yet used instead, so automatic numbering never stops and never repeats a number.
 */
export function stockNumberSequence(pattern: string, year: number, existing: Iterable<string>) {
  const used = new Set<bigint>();
  let highest = 0n;
  for (const stockNumber of existing) {
    const counter = counterOf(pattern, year, stockNumber);
    if (counter === null) continue;
    used.add(counter);
    if (counter > highest) highest = counter;
  }
  const format = (counter: bigint) => formatStockNumber(pattern, year, counter);
  const choose = (): bigint => {
    if (format(highest + 1n).length <= maxStockNumberLength) return highest + 1n;
    let counter = 1n;
    while (used.has(counter)) counter += 1n;
    return counter;
  };
  return {
    peek: () => format(choose()),
    next: () => {
      const counter = choose();
      used.add(counter);
      if (counter > highest) highest = counter;
      return format(counter);
    },
  };
}

/** The next stock number the pattern gives in that year after the existing ones. */
export function nextStockNumber(pattern: string, year: number, existing: Iterable<string>): string {
  return stockNumberSequence(pattern, year, existing).peek();
}

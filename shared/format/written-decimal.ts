/**
 * A number as someone wrote it in a spreadsheet cell: digits, the whole and the fraction apart,
 * kept as text so that money never passes through floating point. `ambiguous` when one mark could
 * be either a decimal mark or a thousands separator ("1,250" is 1250 in en-GB and 1.25 in de-DE).
 */
export type WrittenDecimal =
  | { kind: 'number'; whole: string; fraction: string }
  | { kind: 'ambiguous'; grouped: string; decimal: string }
  | { kind: 'invalid' };

/** Spaces and apostrophes only ever group thousands (fr-FR "1 250,50", de-CH "1’250.50"). */
const spaceGrouped = /^\d{1,3}(?:[ \u00a0\u202f'’]\d{3})+(?:[.,]\d+)?$/;

const groupedBy = (mark: '.' | ',') => new RegExp(`^[1-9]\\d{0,2}(?:\\${mark}\\d{3})+$`);

/**
 * Reads either convention for the decimal mark, as Unicode CLDR's number symbols have them: en-GB
 * and en-US write 1,250.50, de-DE and it-IT 1.250,50, fr-FR 1 250,50. When both marks appear the
 * last is the decimal mark; one mark used twice groups thousands; one mark once is a decimal mark
 * unless exactly three digits follow a group of one to three, which either convention could mean.
 */
export function readWrittenDecimal(text: string): WrittenDecimal {
  let t = text.trim();
  if (spaceGrouped.test(t)) t = t.replace(/[ \u00a0\u202f'’]/g, '');
  if (!/^\d[\d.,]*$/.test(t)) return { kind: 'invalid' };
  const last = Math.max(t.lastIndexOf('.'), t.lastIndexOf(','));
  if (last === -1) return { kind: 'number', whole: t, fraction: '' };
  const mark = t[last] as '.' | ',';
  const other = mark === '.' ? ',' : '.';
  const before = t.slice(0, last);
  const after = t.slice(last + 1);
  if (after === '') return { kind: 'invalid' };
  if (before.includes(mark)) {
    return groupedBy(mark).test(t) && !t.includes(other)
      ? { kind: 'number', whole: t.replaceAll(mark, ''), fraction: '' }
      : { kind: 'invalid' };
  }
  if (before.includes(other)) {
    return groupedBy(other).test(before)
      ? { kind: 'number', whole: before.replaceAll(other, ''), fraction: after }
      : { kind: 'invalid' };
  }
  if (after.length === 3 && /^[1-9]\d{0,2}$/.test(before)) {
    // The decimal reading without its trailing zeros, as someone meaning it would write it.
    const decimal = `${before}.${after}`.replace(/\.?0+$/, '');
    return { kind: 'ambiguous', grouped: before + after, decimal };
  }
  return { kind: 'number', whole: before, fraction: after };
}

/**
 * The next consignment reference after those already used with the prefix: `C-2026-` and
 * `C-2026-004` give `C-2026-005`. Counters are read as digits, padded to three.
 */
export function nextReference(prefix: string, existing: readonly string[]): string {
  let highest = 0;
  for (const reference of existing) {
    const digits = reference.slice(prefix.length);
    if (reference.startsWith(prefix) && /^\d{1,9}$/.test(digits)) {
      highest = Math.max(highest, Number(digits));
    }
  }
  return `${prefix}${String(highest + 1).padStart(3, '0')}`;
}

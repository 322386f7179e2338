/** Row numbers for a sentence, the first dozen and how many more: "rows 3, 7 and 9". */
export function rowNumbersText(rowNumbers: readonly number[], shown = 12): string {
  const first = rowNumbers.slice(0, shown).map((n) => n.toLocaleString('en-GB'));
  const more = rowNumbers.length - first.length;
  const noun = rowNumbers.length === 1 ? 'Row' : 'Rows';
  if (more > 0) return `${noun} ${first.join(', ')} and ${more.toLocaleString('en-GB')} more`;
  if (first.length === 1) return `${noun} ${first[0]}`;
  return `${noun} ${first.slice(0, -1).join(', ')} and ${first.at(-1)}`;
}

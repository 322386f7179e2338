const dateFormat = new Intl.DateTimeFormat('en-GB', {
  day: 'numeric',
  month: 'short',
  year: 'numeric',
  timeZone: 'UTC',
});

/** An ISO calendar date (`2026-03-14`) as the studio reads it: "14 Mar 2026". */
export function formatDate(isoDate: string): string {
  const [year, month, day] = isoDate.split('-').map(Number);
  if (year === undefined || month === undefined || day === undefined) return isoDate;
  return dateFormat.format(new Date(Date.UTC(year, month - 1, day)));
}

/** "1 piece", "3 pieces". */
export function pieces(count: number): string {
  return `${count} ${count === 1 ? 'piece' : 'pieces'}`;
}

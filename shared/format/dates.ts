const dateFormats = new Map<string, Intl.DateTimeFormat>();

/**
 * A calendar date (YYYY-MM-DD) as the locale writes it, day, short month and year ("14 Mar 2026"
 * in en-GB). Read and written in UTC, so the day never shifts with the machine's time zone.
 */
export function formatDate(isoDate: string, locale = 'en-GB'): string {
  const date = new Date(`${isoDate}T00:00:00Z`);
  if (Number.isNaN(date.getTime())) return isoDate;
  let format = dateFormats.get(locale);
  if (format === undefined) {
    format = new Intl.DateTimeFormat(locale, {
      day: 'numeric',
      month: 'short',
      year: 'numeric',
      timeZone: 'UTC',
    });
    dateFormats.set(locale, format);
  }
  return format.format(date);
}

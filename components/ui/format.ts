export { formatDate } from '@/shared/format/dates';

/** "1 piece", "3 pieces". */
/** "1 work", "3 works": a count with its noun, plural unless it is one. */
export function counted(count: number, noun: string, plural = `${noun}s`): string {
  return `${count} ${count === 1 ? noun : plural}`;
}

export function pieces(count: number): string {
  return counted(count, 'piece');
}

/** The symbol a currency is written with in en-GB: "£" for GBP, "€" for EUR, the code otherwise. */
export function currencySymbol(currency: string): string {
  const parts = new Intl.NumberFormat('en-GB', { style: 'currency', currency }).formatToParts(0);
  return parts.find((part) => part.type === 'currency')?.value ?? currency;
}

/** A measurement with its unit, thousands grouped: "1,250 g". */
export function formatMeasure(value: number | null, unit: string): string {
  return value === null ? '—' : `${value.toLocaleString('en-GB')} ${unit}`;
}

/** Height × width × depth in millimetres, leaving out what was not measured. */
export function formatDimensions(h: number | null, w: number | null, d: number | null): string {
  const parts = [h, w, d].filter((v): v is number => v !== null);
  return parts.length === 0 ? '—' : `${parts.map((v) => v.toLocaleString('en-GB')).join(' × ')} mm`;
}

/** Grams as kilograms from 1 kg, for reading, still exact to the gram: "5.2 kg", "1.234 kg", "850 g". */
export function formatWeight(grams: number | null): string {
  if (grams === null) return '—';
  if (grams < 1000) return `${grams} g`;
  return `${(grams / 1000).toLocaleString('en-GB', { maximumFractionDigits: 3 })} kg`;
}

/** An instant (ISO-8601) as the studio's clock shows it: "2 Nov 2026, 09:15". */
export function formatDateTime(iso: string, timeZone: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  return new Intl.DateTimeFormat('en-GB', {
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
    timeZone,
  }).format(date);
}

import { type ImportColumn } from '@/shared/schemas/work-import';

/** What a cell of each column may hold, where a plain "text" would not say enough. */
export function importColumnNote(column: ImportColumn, currency: string): string | null {
  switch (column) {
    case 'stockNumber':
      return 'Left blank, one is made from the studio’s pattern. A stock number already used is never imported.';
    case 'year':
      return 'A year from 1900, such as 2025.';
    case 'firingTempC':
      return 'Degrees Celsius, a whole number: 1280.';
    case 'heightMm':
    case 'widthMm':
    case 'depthMm':
      return 'Millimetres unless the cell says cm or m: 140, 14 cm, 1.2 m.';
    case 'weightG':
      return 'Grams unless the cell says kg: 350, 1200 g, 1.2 kg.';
    case 'retailPrice':
    case 'costPrice':
      return `In ${currency}, with a decimal point or a decimal comma: 45.00, 45, 12,50. Write 1250.00 rather than 1,250, which could be 1.25.`;
    case 'foodUse':
      return 'food-safe, decorative, or not stated; blank is not stated.';
    case 'currency':
      return `If given, ${currency}: works are entered in the studio’s currency.`;
    default:
      return null;
  }
}

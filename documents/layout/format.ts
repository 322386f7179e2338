// Dates and measures for people, by the data's locale (Intl, ECMA-402).

const numberFormats = new Map<string, Intl.NumberFormat>();

function numberFormat(locale: string, options: Intl.NumberFormatOptions): Intl.NumberFormat {
  const key = `${locale}|${JSON.stringify(options)}`;
  let format = numberFormats.get(key);
  if (format === undefined) {
    format = new Intl.NumberFormat(locale, options);
    numberFormats.set(key, format);
  }
  return format;
}

/** Kilograms to one decimal place ("18.6 kg"). */
export function formatKilograms(grams: number, locale: string): string {
  return numberFormat(locale, {
    style: 'unit',
    unit: 'kilogram',
    minimumFractionDigits: 1,
    maximumFractionDigits: 1,
  }).format(grams / 1000);
}

/** Kilograms to one decimal place as a bare number, for a column headed with its unit. */
export function kilograms(grams: number, locale: string): string {
  return numberFormat(locale, { minimumFractionDigits: 1, maximumFractionDigits: 1 }).format(
    grams / 1000,
  );
}

/** Millimetres ("12 mm"). */
export function formatMillimetres(mm: number, locale: string): string {
  return numberFormat(locale, { style: 'unit', unit: 'millimeter' }).format(mm);
}

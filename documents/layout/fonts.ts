// The shipped fonts, selected by file path: pdfkit caches a font under its path, whereas through a
// registered alias its table code re-reads the font for every cell.

/** Literata (headings) and Atkinson Hyperlegible Next (text), the product's own two faces. */
export const fonts = {
  heading: require.resolve('@expo-google-fonts/literata/500Medium/Literata_500Medium.ttf'),
  headingStrong:
    require.resolve('@expo-google-fonts/literata/600SemiBold/Literata_600SemiBold.ttf'),
  text: require.resolve('@expo-google-fonts/atkinson-hyperlegible-next/400Regular/AtkinsonHyperlegibleNext_400Regular.ttf'),
  textStrong:
    require.resolve('@expo-google-fonts/atkinson-hyperlegible-next/600SemiBold/AtkinsonHyperlegibleNext_600SemiBold.ttf'),
} as const;

export type FontName = keyof typeof fonts;

/**
 * Text as the fonts can draw it. Intl writes a narrow no-break space (U+202F) in some locales'
 * numbers and dates (fr-FR: "1 234,50 €"); Atkinson Hyperlegible Next has no glyph for it, so it
 * becomes an ordinary no-break space, which keeps the figures together just the same.
 */
export function printable(text: string): string {
  return text.includes('\u202f') ? text.replaceAll('\u202f', '\u00a0') : text;
}

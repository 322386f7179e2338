/**
 * What the web app's font files keep: the fonts it ships, and the characters and OpenType features
 * its text needs. `npm run fonts` writes the subsets; a test checks the committed files against
 * this list.
 */
import path from 'node:path';

const googleFonts = path.join(__dirname, '../node_modules/@expo-google-fonts');

/**
 * Source .ttf (kept in node_modules for the server's PDFs) and the WOFF2 subset made from it.
 * `text` faces keep the ranges below; `figures` faces keep the ten digits alone, and the web's
 * font stack puts them ahead of the text face (constants/font-files.web.ts): Atkinson Hyperlegible
 * Next draws its zero slashed, with no plain alternate, and a slashed zero in a price or a date
 * reads as a foreign symbol.
 */
export const subsetFonts = [
  {
    family: 'Literata_500Medium',
    source: path.join(googleFonts, 'literata/500Medium/Literata_500Medium.ttf'),
    target: 'assets/fonts/literata-500-medium.woff2',
    keep: 'text',
  },
  {
    family: 'Literata_600SemiBold',
    source: path.join(googleFonts, 'literata/600SemiBold/Literata_600SemiBold.ttf'),
    target: 'assets/fonts/literata-600-semibold.woff2',
    keep: 'text',
  },
  {
    family: 'AtkinsonHyperlegibleNext_400Regular',
    source: path.join(
      googleFonts,
      'atkinson-hyperlegible-next/400Regular/AtkinsonHyperlegibleNext_400Regular.ttf',
    ),
    target: 'assets/fonts/atkinson-hyperlegible-next-400-regular.woff2',
    keep: 'text',
  },
  {
    family: 'AtkinsonHyperlegibleNext_600SemiBold',
    source: path.join(
      googleFonts,
      'atkinson-hyperlegible-next/600SemiBold/AtkinsonHyperlegibleNext_600SemiBold.ttf',
    ),
    target: 'assets/fonts/atkinson-hyperlegible-next-600-semibold.woff2',
    keep: 'text',
  },
  {
    family: 'IBMPlexSans_400Regular',
    source: path.join(googleFonts, 'ibm-plex-sans/400Regular/IBMPlexSans_400Regular.ttf'),
    target: 'assets/fonts/ibm-plex-sans-400-regular-figures.woff2',
    keep: 'figures',
  },
  {
    family: 'IBMPlexSans_600SemiBold',
    source: path.join(googleFonts, 'ibm-plex-sans/600SemiBold/IBMPlexSans_600SemiBold.ttf'),
    target: 'assets/fonts/ibm-plex-sans-600-semibold-figures.woff2',
    keep: 'figures',
  },
] as const;

/** What a figures face keeps. */
export const figures = '0123456789';

/** Unicode blocks (first and last code point, inclusive) and single characters kept. */
export const subsetRanges: readonly (readonly [number, number])[] = [
  [0x0020, 0x007e], // Basic Latin
  [0x00a0, 0x00ff], // Latin-1 Supplement: £ ¥ ° × ÷ · and the accented letters of western Europe
  [0x0100, 0x017f], // Latin Extended-A: ŵ ŷ (Welsh), ł, ő, č… in names of people and places
  [0x2000, 0x206f], // General Punctuation: – — ‘ ’ “ ” … • ′ ″ ‹ ›
  [0x20ac, 0x20ac], // €
  [0x2122, 0x2122], // ™
  [0x2190, 0x2195], // ← ↑ → ↓ ↔ ↕ (sort marks in tables)
  [0x2212, 0x2212], // − minus sign
];

/** Every character in the ranges, as one string for the subsetter. */
export function subsetText(): string {
  let text = '';
  for (const [first, last] of subsetRanges) {
    for (let cp = first; cp <= last; cp++) text += String.fromCodePoint(cp);
  }
  return text;
}

/**
 * OpenType features kept: those browsers apply to text by default (composition, marks, kerning,
 * standard and contextual ligatures) and `tnum`, which the app asks for with
 * `fontVariant: ['tabular-nums']`. Dropping the rest (small capitals, old-style and alternate
 * figures, stylistic sets) drops the glyphs only they reach.
 */
export const subsetFeatures = [
  'ccmp',
  'locl',
  'mark',
  'mkmk',
  'kern',
  'liga',
  'clig',
  'calt',
  'rlig',
  'rvrn',
  'tnum',
] as const;

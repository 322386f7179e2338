import atkinson400 from '@/assets/fonts/atkinson-hyperlegible-next-400-regular.woff2';
import atkinson600 from '@/assets/fonts/atkinson-hyperlegible-next-600-semibold.woff2';
import plexFigures400 from '@/assets/fonts/ibm-plex-sans-400-regular-figures.woff2';
import plexFigures600 from '@/assets/fonts/ibm-plex-sans-600-semibold-figures.woff2';
import literata500 from '@/assets/fonts/literata-500-medium.woff2';
import literata600 from '@/assets/fonts/literata-600-semibold.woff2';

import type * as packaged from './font-files';

/**
 * WOFF2 subsets of the same fonts (Latin, Latin-1, Latin Extended-A, punctuation, € and a few
 * symbols, with `tnum`): 75 KB for the four against 607 KB of .ttf. Made by `npm run fonts`. Two
 * more hold IBM Plex Sans's ten digits alone, 4 KB each, for `textFace`.
 */
export const fontFiles = {
  Literata_500Medium: literata500,
  Literata_600SemiBold: literata600,
  AtkinsonHyperlegibleNext_400Regular: atkinson400,
  AtkinsonHyperlegibleNext_600SemiBold: atkinson600,
  IBMPlexSans_400Regular: plexFigures400,
  IBMPlexSans_600SemiBold: plexFigures600,
} satisfies Record<keyof typeof packaged.fontFiles, number>;

/**
 * The body text's font stack: digits from the figures face (a plain zero, all ten one width),
 * which holds nothing else, so every other character falls through to the text face.
 */
export function textFace(text: keyof typeof fontFiles, figures: keyof typeof fontFiles): string {
  return `${figures}, ${text}`;
}

import { AtkinsonHyperlegibleNext_400Regular } from '@expo-google-fonts/atkinson-hyperlegible-next/400Regular';
import { AtkinsonHyperlegibleNext_600SemiBold } from '@expo-google-fonts/atkinson-hyperlegible-next/600SemiBold';
import { IBMPlexSans_400Regular } from '@expo-google-fonts/ibm-plex-sans/400Regular';
import { IBMPlexSans_600SemiBold } from '@expo-google-fonts/ibm-plex-sans/600SemiBold';
import { Literata_500Medium } from '@expo-google-fonts/literata/500Medium';
import { Literata_600SemiBold } from '@expo-google-fonts/literata/600SemiBold';

/** The packaged .ttf files, for native builds; the web loads WOFF2 subsets (font-files.web.ts). */
export const fontFiles = {
  Literata_500Medium,
  Literata_600SemiBold,
  AtkinsonHyperlegibleNext_400Regular,
  AtkinsonHyperlegibleNext_600SemiBold,
  IBMPlexSans_400Regular,
  IBMPlexSans_600SemiBold,
};

/**
 * The body text's font. Native text takes one family, not a stack, so it stays with the text
 * face (its zero slashed); the web puts the figures face first (font-files.web.ts).
 */
export function textFace(text: keyof typeof fontFiles, _figures: keyof typeof fontFiles): string {
  return text;
}

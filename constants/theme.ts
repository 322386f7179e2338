import { type TextStyle } from 'react-native';

import { fontFiles, textFace } from './font-files';

/**
 * Saggar's look: warm paper, ink, and one accent from a celadon glaze.
 *
 * WCAG 2 contrast ratios, computed from relative luminance (AA asks 4.5:1 for text, 3:1 for
 * control outlines):
 * - ink #2B2724 on paper #F6F1E7 13.15, on surface #FCFAF5 14.19, on sunken #EFE8DA 12.14
 * - inkMuted #625A50 on paper 6.02, on surface 6.50, on sunken 5.56
 * - accent #2F6B5A on paper 5.53, on surface 5.97, on sunken 5.11, on accentSoft #DCE8E1 4.95
 * - onAccent #FCFAF5 on accent 5.97, on accentPressed #24574A 7.93
 * - danger #9E3A26 on paper 6.04, on surface 6.52, on dangerSoft #F8E9E4 5.76
 * - ochre #8A5A12 on paper 5.25, on surface 5.67, on sunken 4.85
 * - outline #8C8275 on paper 3.35, on surface 3.62, on sunken 3.10 (non-text)
 */
export const palette = {
  paper: '#F6F1E7',
  surface: '#FCFAF5',
  sunken: '#EFE8DA',
  ink: '#2B2724',
  inkMuted: '#625A50',
  hairline: '#E2DACB',
  outline: '#8C8275',
  accent: '#2F6B5A',
  accentPressed: '#24574A',
  accentSoft: '#DCE8E1',
  onAccent: '#FCFAF5',
  danger: '#9E3A26',
  dangerSoft: '#F8E9E4',
  ochre: '#8A5A12',
} as const;

/** Tones a state can take; the state's word and glyph shape carry the meaning, the tone helps. */
export const stateTones = {
  quiet: palette.inkMuted,
  active: palette.accent,
  done: palette.ink,
  attention: palette.ochre,
  danger: palette.danger,
} as const;
export type StateTone = keyof typeof stateTones;

/** Fonts shipped with the app, keyed by the family name styles use. */
export const fontAssets = fontFiles;

/**
 * Body text is Atkinson Hyperlegible Next, with its digits from IBM Plex Sans on the web: Atkinson's
 * zero is slashed (it has no plain one), which makes £100.00 and 2026 look foreign. Plex's digits
 * are near Atkinson's in height (0.71 against 0.68 of the em) and all one width, so figures still
 * line up in tables. Literata's own zero is plain, and tabular with `tnum`.
 */
export const fonts = {
  heading: 'Literata_600SemiBold',
  headingLight: 'Literata_500Medium',
  body: textFace('AtkinsonHyperlegibleNext_400Regular', 'IBMPlexSans_400Regular'),
  bodyStrong: textFace('AtkinsonHyperlegibleNext_600SemiBold', 'IBMPlexSans_600SemiBold'),
} as const;

export const spacing = {
  xxs: 2,
  xs: 4,
  sm: 8,
  md: 12,
  lg: 16,
  xl: 24,
  xxl: 32,
  xxxl: 48,
} as const;

export const radii = {
  sm: 4,
  md: 8,
  lg: 12,
  round: 999,
} as const;

/** Minimum size of anything a finger or pointer presses. */
export const touchTarget = 44;

/** Width from which the shell shows a side navigation instead of a bottom bar. */
export const wideBreakpoint = 768;

/** The widest a column of reading content grows on a wide screen. */
export const contentMaxWidth = 960;

const tabular: TextStyle['fontVariant'] = ['tabular-nums'];

/** Type scale: generous body size for reading at arm's length behind a counter. */
export const typeScale = {
  display: { fontFamily: fonts.heading, fontSize: 32, lineHeight: 40, color: palette.ink },
  title: { fontFamily: fonts.heading, fontSize: 26, lineHeight: 34, color: palette.ink },
  heading: { fontFamily: fonts.heading, fontSize: 21, lineHeight: 28, color: palette.ink },
  subheading: { fontFamily: fonts.headingLight, fontSize: 18, lineHeight: 25, color: palette.ink },
  body: { fontFamily: fonts.body, fontSize: 17, lineHeight: 25, color: palette.ink },
  bodyStrong: { fontFamily: fonts.bodyStrong, fontSize: 17, lineHeight: 25, color: palette.ink },
  small: { fontFamily: fonts.body, fontSize: 15, lineHeight: 21, color: palette.inkMuted },
  label: { fontFamily: fonts.bodyStrong, fontSize: 15, lineHeight: 21, color: palette.ink },
  figure: {
    fontFamily: fonts.heading,
    fontSize: 34,
    lineHeight: 40,
    color: palette.ink,
    fontVariant: tabular,
  },
  number: {
    fontFamily: fonts.body,
    fontSize: 17,
    lineHeight: 25,
    color: palette.ink,
    fontVariant: tabular,
  },
} as const satisfies Record<string, TextStyle>;
export type TypeVariant = keyof typeof typeScale;

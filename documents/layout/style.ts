import { type FontName } from './fonts';

/**
 * Colours on paper: ink, and one accent (a celadon green) used sparingly for rules and marks.
 * The warm paper white of the screens is left to the paper itself.
 */
export const colours = {
  ink: '#2B2724',
  accent: '#2F6B5A',
  /** Secondary text: ink lightened, still above 7:1 on white (WCAG 2.2 AAA for body text). */
  quiet: '#575049',
  /** Hairlines between rows and around labels. */
  rule: '#C9C2BA',
} as const;

export type TextStyle = Readonly<{
  font: FontName;
  size: number;
  colour: string;
  /** Tabular figures (OpenType `tnum`), for money and measures that line up in columns. */
  figures: boolean;
  lineGap: number;
  characterSpacing: number;
}>;

type StyleSpec = Pick<TextStyle, 'font' | 'size'> & Partial<TextStyle>;

/**
 * A text style with every field present, in one order: the code that draws text then meets one
 * shape of object, whichever document it draws (V8 keeps such property reads fast).
 */
export function textStyle(spec: StyleSpec): TextStyle {
  return {
    font: spec.font,
    size: spec.size,
    colour: spec.colour ?? colours.ink,
    figures: spec.figures ?? false,
    lineGap: spec.lineGap ?? 0,
    characterSpacing: spec.characterSpacing ?? 0,
  };
}

/** A set of named styles. */
export function textStyles<K extends string>(specs: Record<K, StyleSpec>): Record<K, TextStyle> {
  const styles = {} as Record<K, TextStyle>;
  for (const name of Object.keys(specs) as K[]) styles[name] = textStyle(specs[name]);
  return styles;
}

/** The type scale of the printed documents, in points. */
export const type = textStyles({
  documentName: { font: 'heading', size: 22 },
  documentTitle: { font: 'heading', size: 13, colour: colours.quiet },
  section: { font: 'headingStrong', size: 12 },
  pieceTitle: { font: 'headingStrong', size: 11 },
  body: { font: 'text', size: 9.5, lineGap: 1.5 },
  bodyStrong: { font: 'textStrong', size: 9.5, lineGap: 1.5 },
  label: { font: 'textStrong', size: 7.5, colour: colours.quiet, characterSpacing: 0.3 },
  cell: { font: 'text', size: 8.5, lineGap: 1 },
  cellStrong: { font: 'textStrong', size: 8.5, lineGap: 1 },
  cellQuiet: { font: 'text', size: 7.5, colour: colours.quiet, lineGap: 1 },
  cellFigure: { font: 'text', size: 8.5, figures: true },
  cellFigureStrong: { font: 'textStrong', size: 8.5, figures: true },
  small: { font: 'text', size: 7.5, colour: colours.quiet, lineGap: 1 },
  chrome: { font: 'text', size: 7.5, colour: colours.quiet },
  chromeStrong: { font: 'headingStrong', size: 9 },
});

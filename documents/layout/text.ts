import { fonts, printable } from './fonts';
import { fillWith } from './paint';
import { type TextStyle } from './style';

export type Doc = PDFKit.PDFDocument;
export type Align = 'left' | 'right' | 'center';

const tnum: PDFKit.Mixins.OpenTypeFeatures[] = ['tnum'];

/** Sets the font and size of a style: enough to measure. */
export function setFont(doc: Doc, style: TextStyle): Doc {
  return doc.font(fonts[style.font]).fontSize(style.size);
}

function options(
  style: TextStyle,
  width: number | undefined,
  extra: PDFKit.Mixins.TextOptions = {},
): PDFKit.Mixins.TextOptions {
  return {
    width,
    lineGap: style.lineGap,
    characterSpacing: style.characterSpacing,
    features: style.figures ? tnum : undefined,
    ...extra,
  };
}

/** The height of one line in a style, its line gap included. */
export function lineHeight(doc: Doc, style: TextStyle): number {
  setFont(doc, style);
  return doc.currentLineHeight(true) + style.lineGap;
}

/** The width of a text on one line in a style. */
export function textWidth(doc: Doc, text: string, style: TextStyle): number {
  setFont(doc, style);
  return doc.widthOfString(printable(text), options(style, undefined));
}

/** Advance widths of single characters at 1 pt, by font and features: a property of the font. */
const advances = new Map<string, Map<string, number>>();

/**
 * An upper bound of a one-line text's width from its characters' own advances, with room for
 * kerning. Shaping a text with OpenType features is the costliest step of drawing it (pdfkit
 * caches shaped words only without features), so a cell that plainly fits is not shaped twice.
 */
function widthBound(doc: Doc, text: string, style: TextStyle): number {
  const key = style.figures ? `${style.font}|tnum` : style.font;
  let known = advances.get(key);
  if (known === undefined) {
    known = new Map();
    advances.set(key, known);
  }
  let sum = 0;
  for (const char of text) {
    let advance = known.get(char);
    if (advance === undefined) {
      doc.fontSize(1);
      advance = doc.widthOfString(char, { features: style.figures ? tnum : undefined });
      doc.fontSize(style.size);
      known.set(char, advance);
    }
    sum += advance;
  }
  return sum * style.size * 1.03 + style.characterSpacing * text.length;
}

/** Whether a text certainly fits on one line of a width. */
function fitsOnOneLine(doc: Doc, text: string, style: TextStyle, width: number): boolean {
  if (text.includes('\n')) return false;
  setFont(doc, style);
  return widthBound(doc, text, style) <= width;
}

/**
 * The height a text takes wrapped to a width. A text that plainly fits on one line is measured
 * without running pdfkit's line wrapper.
 */
export function textHeight(doc: Doc, text: string, style: TextStyle, width: number): number {
  if (text === '') return 0;
  const shown = printable(text);
  if (fitsOnOneLine(doc, shown, style, width)) return lineHeight(doc, style);
  setFont(doc, style);
  return doc.heightOfString(shown, options(style, width));
}

/**
 * Writes one line of figures right-aligned (or centred) in a width, set smaller when it would not
 * fit, so that a long amount never runs into the next column.
 */
export function writeFigures(
  doc: Doc,
  text: string,
  x: number,
  y: number,
  style: TextStyle,
  width: number,
  align: Align,
): void {
  if (text === '') return;
  const shown = printable(text);
  if (fitsOnOneLine(doc, shown, style, width)) {
    fillWith(doc, style.colour);
    doc.text(shown, x, y, options(style, width, { align, lineBreak: false }));
    return;
  }
  const natural = textWidth(doc, shown, style);
  const fitted = natural > width ? { ...style, size: (style.size * width) / natural } : style;
  // Smaller type keeps the row's baseline.
  const drop = (lineHeight(doc, style) - lineHeight(doc, fitted)) * 0.8;
  writeText(doc, shown, x, y + drop, fitted, { width, align, lineBreak: false });
}

/** Writes a text at a point, wrapped to a width when one is given. */
export function writeText(
  doc: Doc,
  text: string,
  x: number,
  y: number,
  style: TextStyle,
  extra: PDFKit.Mixins.TextOptions = {},
): void {
  if (text === '') return;
  fillWith(setFont(doc, style), style.colour);
  doc.text(printable(text), x, y, options(style, extra.width, extra));
}

import PDFDocument from 'pdfkit';

import { rule } from './paint';
import { colours, type } from './style';
import { type Doc, textWidth, writeText } from './text';

/** A4 portrait, in points (ISO 216: 210 × 297 mm). */
export const a4 = { width: 595.28, height: 841.89 } as const;

/** Millimetres in points. */
export const mm = (value: number) => (value * 72) / 25.4;

/** Generous margins; the top and bottom ones also hold the page header and footer. */
export const pageMargins = { top: mm(30), bottom: mm(24), left: mm(20), right: mm(20) } as const;

export type DocumentMeta = {
  /** The document's name and reference, as the PDF's title. */
  title: string;
  /** The studio. */
  author: string;
  subject: string;
  /** YYYY-MM-DD: the creation and modification date, at 00:00 UTC. */
  issuedOn: string;
  /** 16 bytes made from the data (see fileIdentifier). */
  fileId: Buffer;
  margins?: { top: number; bottom: number; left: number; right: number };
};

/** What every page repeats: the studio, the document, its reference, the venue. */
export type PageFrame = {
  studioName: string;
  documentName: string;
  reference: string;
  venueName: string;
};

/**
 * A pdfkit document that gives the same bytes for the same data: fixed dates, a file identifier
 * made from the data, pages buffered so the footer can say "Page n of m" at the end.
 */
export function createDocument(meta: DocumentMeta): Doc {
  const day = new Date(`${meta.issuedOn}T00:00:00Z`);
  if (Number.isNaN(day.getTime())) throw new RangeError(`Not a date: ${meta.issuedOn}`);
  const doc = new PDFDocument({
    size: 'A4',
    margins: meta.margins ?? pageMargins,
    bufferPages: true,
    info: {
      Title: meta.title,
      Author: meta.author,
      Subject: meta.subject,
      Creator: 'Saggar',
      CreationDate: day,
      ModDate: day,
    },
  });
  // pdfkit 0.20 keeps the trailer's /ID in `_id`, an MD5 of the info dictionary alone.
  const internals = doc as unknown as { _id?: unknown };
  if (!(internals._id instanceof Uint8Array)) {
    throw new Error('pdfkit no longer keeps the file identifier in _id: check documents/layout.');
  }
  internals._id = meta.fileId;
  return doc;
}

export const contentLeft = (doc: Doc) => doc.page.margins.left;
export const contentWidth = (doc: Doc) =>
  doc.page.width - doc.page.margins.left - doc.page.margins.right;
export const contentTop = (doc: Doc) => doc.page.margins.top;
export const contentBottom = (doc: Doc) => doc.page.height - doc.page.margins.bottom;

/** Starts a new page unless `height` still fits under the cursor. */
export function ensureSpace(doc: Doc, height: number): void {
  if (doc.y + height > contentBottom(doc) && doc.y > contentTop(doc)) {
    doc.addPage();
    doc.y = contentTop(doc);
  }
}

/** Runs `draw` with the margins at zero, so text in the margin does not start a new page. */
function inMargins(doc: Doc, draw: () => void): void {
  const margins = doc.page.margins;
  doc.page.margins = { top: 0, bottom: 0, left: 0, right: 0 };
  draw();
  doc.page.margins = margins;
}

/** Margins of at least this much hold a ruled header or footer; narrower ones a single line. */
const roomyMargin = mm(20);

function drawChrome(doc: Doc, frame: PageFrame, n: number, of: number): void {
  const style = { header: type.chromeStrong, text: type.chrome };
  const { left, right, top, bottom } = doc.page.margins;
  const width = doc.page.width - left - right;
  const headerY = top >= roomyMargin ? top - mm(14) : top / 2 - 5;
  const footerY =
    bottom >= roomyMargin ? doc.page.height - bottom + mm(9) : doc.page.height - bottom / 2 - 4;
  const hairline = (y: number, weight: number, colour: string) =>
    rule(doc, [left, y], [left + width, y], weight, colour);
  const atRight = (words: string, y: number) =>
    writeText(doc, words, left + width - textWidth(doc, words, style.text), y, style.text, {
      lineBreak: false,
    });
  inMargins(doc, () => {
    writeText(doc, frame.studioName, left, headerY, style.header, { lineBreak: false });
    atRight(`${frame.documentName} · ${frame.reference}`, headerY + 1.5);
    if (top >= roomyMargin) hairline(headerY + 15, 0.75, colours.accent);
    if (bottom >= roomyMargin) hairline(footerY - 6, 0.4, colours.rule);
    writeText(doc, `${frame.venueName} · ${frame.reference}`, left, footerY, style.text, {
      lineBreak: false,
    });
    atRight(`Page ${n} of ${of}`, footerY);
  });
}

/**
 * Writes the header and footer on every page, ends the document and gives its bytes.
 */
export function finishDocument(doc: Doc, frame: PageFrame): Promise<Buffer> {
  const chunks: Buffer[] = [];
  const bytes = new Promise<Buffer>((resolve, reject) => {
    doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  const { start, count } = doc.bufferedPageRange();
  for (let i = start; i < start + count; i += 1) {
    doc.switchToPage(i);
    drawChrome(doc, frame, i + 1, count);
  }
  doc.end();
  return bytes;
}

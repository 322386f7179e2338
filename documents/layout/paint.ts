import { type Doc } from './text';

type Paint = { page: unknown; fill?: string; stroke?: string; width?: number };

const painted = new WeakMap<Doc, Paint>();

/**
 * The colours and line width last set on the current page. pdfkit writes a colour operator on
 * every call, even to the colour already set; a 200-line table would write thousands. Drawing
 * that sets its own colours does so between save() and restore(), which leaves these standing.
 */
function current(doc: Doc): Paint {
  let paint = painted.get(doc);
  if (paint?.page !== doc.page) {
    paint = { page: doc.page };
    painted.set(doc, paint);
  }
  return paint;
}

/** Sets the fill (and text) colour unless it is already set on this page. */
export function fillWith(doc: Doc, colour: string): Doc {
  const paint = current(doc);
  if (paint.fill !== colour) {
    doc.fillColor(colour);
    paint.fill = colour;
  }
  return doc;
}

/** Sets the stroke colour and line width unless they are already set on this page. */
export function strokeWith(doc: Doc, colour: string, width: number): Doc {
  const paint = current(doc);
  if (paint.stroke !== colour) {
    doc.strokeColor(colour);
    paint.stroke = colour;
  }
  if (paint.width !== width) {
    doc.lineWidth(width);
    paint.width = width;
  }
  return doc;
}

/** A straight rule. */
export function rule(
  doc: Doc,
  from: [number, number],
  to: [number, number],
  width: number,
  colour: string,
): void {
  strokeWith(doc, colour, width)
    .moveTo(...from)
    .lineTo(...to)
    .stroke();
}

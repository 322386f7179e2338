import { type Box, columns, drawing, stack, text } from './boxes';
import { caption } from './sections';
import { colours, type } from './style';
import { type Doc } from './text';

const writingSpace = 26;

/** A line to write on, with its caption under it. */
function line(what: string): Box {
  const under = caption(what);
  return {
    height: (doc: Doc, width: number) => writingSpace + 3 + under.height(doc, width),
    draw(doc: Doc, x: number, y: number, width: number) {
      const at = y + writingSpace;
      doc.moveTo(x, at).lineTo(x + width, at).lineWidth(0.6).strokeColor(colours.ink).stroke();
      under.draw(doc, x, at + 3, width);
    },
  };
}

/** One side's block: who signs, and lines for the signature, the name and the date. */
export function signatureBlock(who: string): Box {
  return stack(
    [
      drawing(1, (doc, x, y, width) => {
        doc.moveTo(x, y).lineTo(x + width, y).lineWidth(0.4).strokeColor(colours.rule).stroke();
      }),
      text(who, type.bodyStrong),
      line('Signature'),
      columns([line('Name in capitals'), line('Date')], 12),
    ],
    6,
  );
}

import { type Box, columns, drawing, stack, text } from './boxes';
import { rule } from './paint';
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
      rule(doc, [x, at], [x + width, at], 0.6, colours.ink);
      under.draw(doc, x, at + 3, width);
    },
  };
}

/** One side's block: who signs, and lines for the signature, the name and the date. */
export function signatureBlock(who: string): Box {
  return stack(
    [
      drawing(1, (doc, x, y, width) => {
        rule(doc, [x, y], [x + width, y], 0.4, colours.rule);
      }),
      text(who, type.bodyStrong),
      line('Signature'),
      columns([line('Name in capitals'), line('Date')], 12),
    ],
    6,
  );
}

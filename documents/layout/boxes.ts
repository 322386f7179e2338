import { type TextStyle } from './style';
import { type Align, type Doc, lineHeight, textHeight, writeFigures, writeText } from './text';

/**
 * A piece of content that can say how tall it is at a width before it is drawn: table cells,
 * findings and signature blocks are built from these, so a page break never cuts one in two.
 */
export type Box = {
  height(doc: Doc, width: number): number;
  draw(doc: Doc, x: number, y: number, width: number): void;
};

/** Wrapped text; its measured height is kept for the draw that follows. */
export function text(content: string, style: TextStyle, align: Align = 'left'): Box {
  let measured: { width: number; height: number } | undefined;
  return {
    height(doc, width) {
      if (measured?.width !== width) {
        measured = { width, height: textHeight(doc, content, style, width) };
      }
      return measured.height;
    },
    draw(doc, x, y, width) {
      writeText(doc, content, x, y, style, { width, align });
    },
  };
}

/**
 * One line of figures (money, measures), right-aligned by default. It never wraps: a figure too
 * wide for its column is set smaller until it fits.
 */
export function figures(content: string, style: TextStyle, align: Align = 'right'): Box {
  return {
    height: (doc) => (content === '' ? 0 : lineHeight(doc, style)),
    draw: (doc, x, y, width) => writeFigures(doc, content, x, y, style, width, align),
  };
}

/** A picture fitted into a box of the given size, centred, never stretched. */
export function picture(data: Uint8Array, width: number, height = width): Box {
  const image = Buffer.from(data.buffer, data.byteOffset, data.byteLength);
  return {
    height: () => height,
    draw(doc, x, y) {
      doc.image(image, x, y, { fit: [width, height], align: 'center', valign: 'center' });
    },
  };
}

/** A fixed-size drawing (a glyph, a rule). */
export function drawing(height: number, draw: Box['draw']): Box {
  return { height: () => height, draw };
}

export const nothing: Box = { height: () => 0, draw: () => {} };

/** Boxes one under another, with a gap between those that are not empty. */
export function stack(boxes: readonly Box[], gap = 0): Box {
  const heights = (doc: Doc, width: number) => boxes.map((box) => box.height(doc, width));
  return {
    height(doc, width) {
      const all = heights(doc, width).filter((h) => h > 0);
      return all.reduce((sum, h) => sum + h, 0) + gap * Math.max(0, all.length - 1);
    },
    draw(doc, x, y, width) {
      const all = heights(doc, width);
      let top = y;
      boxes.forEach((box, i) => {
        if (all[i]! === 0) return;
        box.draw(doc, x, top, width);
        top += all[i]! + gap;
      });
    },
  };
}

/**
 * Two boxes side by side: `left` at a fixed width (or nothing, when it is null), `right` taking
 * the rest; the taller sets the height.
 */
export function beside(left: Box | null, leftWidth: number, right: Box, gap: number): Box {
  if (left === null) return right;
  const rightWidth = (width: number) => width - leftWidth - gap;
  return {
    height: (doc, width) =>
      Math.max(left.height(doc, leftWidth), right.height(doc, rightWidth(width))),
    draw(doc, x, y, width) {
      left.draw(doc, x, y, leftWidth);
      right.draw(doc, x + leftWidth + gap, y, rightWidth(width));
    },
  };
}

/** Boxes in equal columns. */
export function columns(boxes: readonly Box[], gap: number): Box {
  const each = (width: number) => (width - gap * (boxes.length - 1)) / boxes.length;
  return {
    height: (doc, width) => Math.max(0, ...boxes.map((box) => box.height(doc, each(width)))),
    draw(doc, x, y, width) {
      boxes.forEach((box, i) => box.draw(doc, x + i * (each(width) + gap), y, each(width)));
    },
  };
}

/** A box with space around it. */
export function padded(box: Box, top: number, bottom = top): Box {
  return {
    height: (doc, width) => top + box.height(doc, width) + bottom,
    draw: (doc, x, y, width) => box.draw(doc, x, y + top, width),
  };
}

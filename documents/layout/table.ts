import { type Box, text } from './boxes';
import { contentBottom, contentLeft, contentTop } from './page';
import { rule } from './paint';
import { colours, type TextStyle, type } from './style';
import { type Align, type Doc } from './text';

export type Column = {
  header: string;
  /** Width in points, padding included. */
  width: number;
  /** Money and measures are right-aligned, their headers with them. */
  align?: Align;
};

export type TableRow = {
  cells: readonly Box[];
  /** A line under the row's cells, from column `from` to the last (a caution, a note). */
  below?: { from: number; box: Box };
  /** Totals: a firmer rule above, none below. */
  total?: boolean;
  /** Never the first row on a page: it moves there with the row before it. */
  keepWithPrevious?: boolean;
};

export type TableOptions = {
  columns: readonly Column[];
  rows: readonly TableRow[];
  headerStyle?: TextStyle;
  /** Drawn above the header on the table's first page, and kept with its header and first row. */
  caption?: Box;
  /** Drawn above the header on the pages the table runs onto (the caption, by default). */
  captionContinued?: Box;
  padX?: number;
  padY?: number;
};

type Measured = { row: TableRow; cells: number[]; below: number; height: number };

/**
 * A table whose header row repeats at the top of every page it runs onto. Each row is measured
 * first and moved whole to the next page when it does not fit; pdfkit's own `doc.table` neither
 * repeats the header nor keeps a row together. Leaves `doc.y` under the table.
 */
export function drawTable(doc: Doc, options: TableOptions): void {
  const { columns, rows } = options;
  const padX = options.padX ?? 4;
  const padY = options.padY ?? 5;
  const headerStyle = options.headerStyle ?? type.label;
  const left = contentLeft(doc);
  const xs: number[] = [];
  columns.reduce((x, column) => (xs.push(x), x + column.width), left);
  const width = columns.reduce((sum, column) => sum + column.width, 0);
  const inner = (i: number) => columns[i]!.width - 2 * padX;

  const headerCells = columns.map((column) => text(column.header, headerStyle, column.align));
  const headerHeights = headerCells.map((cell, i) => cell.height(doc, inner(i)));
  const headerHeight = Math.max(...headerHeights) + 2 * padY;

  const measure = (row: TableRow): Measured => {
    const cells = row.cells.map((cell, i) => cell.height(doc, inner(i)));
    const belowWidth = row.below ? xs.at(-1)! + columns.at(-1)!.width - xs[row.below.from]! : 0;
    const below = row.below ? row.below.box.height(doc, belowWidth - 2 * padX) : 0;
    const height = Math.max(0, ...cells) + 2 * padY + (below > 0 ? below + padY : 0);
    return { row, cells, below, height };
  };

  const across = (y: number, weight: number, colour: string) =>
    rule(doc, [left, y], [left + width, y], weight, colour);

  const drawHeader = (y: number) => {
    // Headers sit on the rule under them, however many lines each takes.
    headerCells.forEach((cell, i) =>
      cell.draw(doc, xs[i]! + padX, y + headerHeight - padY - headerHeights[i]!, inner(i)),
    );
    across(y + headerHeight, 0.75, colours.ink);
    return y + headerHeight;
  };

  const start = (y: number, caption: Box | undefined) => {
    if (!caption) return drawHeader(y);
    caption.draw(doc, left, y, width);
    return drawHeader(y + caption.height(doc, width));
  };
  const firstCaption = options.caption;
  const nextCaption = options.captionContinued ?? options.caption;

  let y = doc.y;
  let first = true;
  const sizes = rows.map(measure);
  sizes.forEach((measured, index) => {
    const { row } = measured;
    // A row goes to the next page when it, and the row that must stay with it, do not fit; the
    // caption and header only start where their first row fits under them.
    const next = sizes[index + 1];
    const withNext = next?.row.keepWithPrevious ? next.height : 0;
    const lead = first ? (firstCaption?.height(doc, width) ?? 0) + headerHeight : 0;
    const needed = lead + measured.height + withNext;
    if (y + needed > contentBottom(doc) && y > contentTop(doc)) {
      doc.addPage();
      y = start(contentTop(doc), first ? firstCaption : nextCaption);
    } else if (first) {
      y = start(y, firstCaption);
    }
    first = false;
    if (row.total) across(y, 0.75, colours.ink);
    row.cells.forEach((cell, i) => cell.draw(doc, xs[i]! + padX, y + padY, inner(i)));
    if (row.below && measured.below > 0) {
      const from = xs[row.below.from]!;
      const belowWidth = left + width - from - 2 * padX;
      const cellsHeight = Math.max(0, ...measured.cells);
      row.below.box.draw(doc, from + padX, y + padY + cellsHeight + padY, belowWidth);
    }
    y += measured.height;
    if (!row.total) across(y, 0.4, colours.rule);
  });
  if (first) y = start(y, firstCaption);
  doc.x = left;
  doc.y = y;
}

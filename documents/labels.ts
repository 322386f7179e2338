import { formatMoney } from '@/shared/money/format';
import { type LabelData, type LabelsData } from '@/shared/schemas/documents';

import { drawCautionGlyph } from './layout/glyphs';
import { fileIdentifier } from './layout/identity';
import { createDocument, finishDocument, mm } from './layout/page';
import { strokeWith } from './layout/paint';
import { drawQrCode } from './layout/qr';
import { colours, type TextStyle, textStyles } from './layout/style';
import { type Doc, lineHeight, textHeight, textWidth, writeText } from './layout/text';

const documentName = 'Shelf labels';

/**
 * The sheet: 2 × 5 labels of 99 × 54 mm on A4, the grid of common ten-to-a-sheet label stock,
 * each with a hairline border to cut along on plain paper.
 */
export const labelSheet = (() => {
  const width = mm(99);
  const height = mm(54);
  const columns = 2;
  const rows = 5;
  const left = (mm(210) - columns * width) / 2;
  const top = (mm(297) - rows * height) / 2;
  const padding = 9;
  const qrSize = 66;
  return {
    columns,
    rows,
    perPage: columns * rows,
    width,
    height,
    left,
    top,
    padding,
    qrSize,
    /** Where the label at an index of its page sits. */
    origin(index: number) {
      return {
        x: left + (index % columns) * width,
        y: top + Math.floor(index / columns) * height,
      };
    },
    /** The QR code's square, from the label's origin. */
    qrBox: { dx: width - padding - qrSize + 4, dy: padding - 4, size: qrSize },
  };
})();

const scaled = (style: TextStyle, k: number): TextStyle => ({ ...style, size: style.size * k });

const styles = textStyles({
  studio: { font: 'textStrong', size: 6.5, colour: colours.quiet, characterSpacing: 0.4 },
  title: { font: 'headingStrong', size: 12, lineGap: 0.5 },
  detail: { font: 'text', size: 7.5, colour: colours.quiet, lineGap: 0.5 },
  dimensions: { font: 'text', size: 7.5, colour: colours.quiet, figures: true },
  note: { font: 'text', size: 7, lineGap: 0.5 },
  foodUse: { font: 'textStrong', size: 7, lineGap: 0.5 },
  heavy: { font: 'textStrong', size: 7.5 },
  price: { font: 'textStrong', size: 17, figures: true },
  stock: { font: 'text', size: 7.5, figures: true },
});

type Block = {
  text: string;
  style: TextStyle;
  gapBefore: number;
  /** Blocks that may be cut short, with an ellipsis, when nothing else makes room: first first. */
  shortenOrder?: number;
  /** The height it is cut to. */
  limit?: number;
};

/** The words of a label, top to bottom, at a scale. */
function blocks(label: LabelData, k: number): Block[] {
  const all: Block[] = [
    { text: label.title, style: scaled(styles.title, k), gapBefore: 3, shortenOrder: 2 },
    { text: label.materials, style: scaled(styles.detail, k), gapBefore: 2, shortenOrder: 1 },
    { text: label.dimensions, style: scaled(styles.dimensions, k), gapBefore: 1 },
    { text: label.careNote ?? '', style: scaled(styles.note, k), gapBefore: 5, shortenOrder: 0 },
    // Never shortened: the food-use note is printed exactly as given (docs/cautions.md).
    { text: label.foodUseNote, style: scaled(styles.foodUse, k), gapBefore: 2 },
  ];
  return all.filter((block) => block.text !== '');
}

const smallestScale = 0.7;

/**
 * Lays out a label's words in a column: set smaller, down to 70%, until they fit; then, if they
 * still do not, a long care note, then the materials, then the title are cut short with an
 * ellipsis. The food-use note is never cut.
 */
function fit(doc: Doc, label: LabelData, width: number, room: number): Block[] {
  const height = (b: Block) =>
    b.gapBefore + Math.min(b.limit ?? Infinity, textHeight(doc, b.text, b.style, width));
  const total = (list: Block[]) => list.reduce((sum, b) => sum + height(b), 0);
  let k = 1;
  let laid = blocks(label, k);
  while (total(laid) > room && k > smallestScale) {
    k = Math.max(smallestScale, k - 0.06);
    laid = blocks(label, k);
  }
  const shortenable = laid
    .filter((b) => b.shortenOrder !== undefined)
    .sort((a, b) => a.shortenOrder! - b.shortenOrder!);
  for (const block of shortenable) {
    const over = total(laid) - room;
    if (over <= 0) break;
    const line = lineHeight(doc, block.style);
    const full = textHeight(doc, block.text, block.style, width);
    block.limit = Math.max(line, Math.floor((full - over) / line) * line);
  }
  return laid;
}

function drawLabel(doc: Doc, label: LabelData, data: LabelsData, x: number, y: number): void {
  const { width, height, padding, qrSize, qrBox } = labelSheet;
  strokeWith(doc, colours.rule, 0.3).rect(x, y, width, height).stroke();

  drawQrCode(doc, label.qrUrl, x + qrBox.dx, y + qrBox.dy, qrBox.size);
  const stockY = y + qrBox.dy + qrSize - 2;
  const stockWidth = textWidth(doc, label.stockNumber, styles.stock);
  writeText(
    doc,
    label.stockNumber,
    x + qrBox.dx + (qrSize - stockWidth) / 2,
    stockY,
    styles.stock,
    {
      lineBreak: false,
    },
  );

  const left = x + padding;
  const textRight = x + qrBox.dx - 2;
  const columnWidth = textRight - left;
  const priceHeight = lineHeight(doc, styles.price);
  const heavyHeight = label.heavy ? lineHeight(doc, styles.heavy) + 3 : 0;
  const studioHeight = lineHeight(doc, styles.studio);
  const bottom = y + height - padding;
  const room = bottom - priceHeight - heavyHeight - 4 - (y + padding + studioHeight);

  writeText(doc, data.studioName.toLocaleUpperCase('en-GB'), left, y + padding, styles.studio, {
    width: columnWidth,
    lineBreak: false,
    ellipsis: true,
  });

  let top = y + padding + studioHeight;
  for (const block of fit(doc, label, columnWidth, room)) {
    top += block.gapBefore;
    const full = textHeight(doc, block.text, block.style, columnWidth);
    const cut = block.limit !== undefined && block.limit < full;
    writeText(doc, block.text, left, top, block.style, {
      width: columnWidth,
      ...(cut ? { height: block.limit, ellipsis: true } : {}),
    });
    top += cut ? block.limit! : full;
  }

  const priceY = bottom - priceHeight + 3;
  if (label.heavy) {
    const cautionY = priceY - heavyHeight;
    drawCautionGlyph(doc, left, cautionY + 0.5, 8);
    writeText(doc, 'Heavy: lift with two people or a trolley', left + 11, cautionY, styles.heavy, {
      width: columnWidth - 11,
      lineBreak: false,
    });
  }
  writeText(doc, formatMoney(label.price, data.locale), left, priceY, styles.price, {
    lineBreak: false,
  });
}

/**
 * Shelf labels for the venue, ten to an A4 sheet: title, materials, dimensions, price, the care
 * note and the food-use note exactly as given (docs/cautions.md), a caution on heavy pieces, the
 * stock number and a QR code that opens the piece on the venue's side.
 */
export async function renderLabels(data: LabelsData): Promise<Buffer> {
  const doc = createDocument({
    title: `${documentName} ${data.reference}`,
    author: data.studioName,
    subject: `Shelf labels for ${data.venueName}`,
    issuedOn: data.issuedOn,
    fileId: fileIdentifier('labels', data),
    margins: {
      top: labelSheet.top,
      bottom: labelSheet.top,
      left: labelSheet.left,
      right: labelSheet.left,
    },
  });
  data.labels.forEach((label, i) => {
    const slot = i % labelSheet.perPage;
    if (slot === 0 && i > 0) doc.addPage();
    const { x, y } = labelSheet.origin(slot);
    drawLabel(doc, label, data, x, y);
  });
  return finishDocument(doc, {
    studioName: data.studioName,
    documentName,
    reference: data.reference,
    venueName: data.venueName,
  });
}

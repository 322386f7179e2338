import { sumMoney } from '@/shared/money/amounts';
import { formatMoney } from '@/shared/money/format';
import { type ConsignmentSheetData, type SheetLine } from '@/shared/schemas/documents';

import {
  beside,
  type Box,
  columns,
  drawing,
  figures,
  nothing,
  picture,
  stack,
  text,
} from './layout/boxes';
import { formatKilograms, kilograms } from './layout/format';
import { drawCautionGlyph } from './layout/glyphs';
import { fileIdentifier } from './layout/identity';
import { moneyCell } from './layout/money';
import { createDocument, finishDocument } from './layout/page';
import { fillWith } from './layout/paint';
import { datesBlock, partiesBlock, place, sectionHeading, titleBlock } from './layout/sections';
import { signatureBlock } from './layout/signatures';
import { colours, type } from './layout/style';
import { type Column, drawTable, type TableRow } from './layout/table';

const documentName = 'Consignment sheet';
const thumbnailSize = 34;

const photoWidth = 42;
const titleWidth = 140;

/** The pieces' columns; a sheet without a single photograph gives the room to the titles. */
function pieceColumns(withPhotos: boolean): Column[] {
  return [
    ...(withPhotos ? [{ header: 'Photo', width: photoWidth }] : []),
    { header: 'Stock no.', width: 60 },
    { header: 'Title and materials', width: titleWidth + (withPhotos ? 0 : photoWidth) },
    { header: 'Dimensions (mm)', width: 84, align: 'right' },
    { header: 'Weight (kg)', width: 34, align: 'right' },
    { header: 'List price', width: 60, align: 'right' },
    { header: 'Insured at', width: 62, align: 'right' },
  ];
}

/** A bullet list of sentences. */
function bullets(sentences: readonly string[]): Box {
  const dot = drawing(4, (doc, x, y) => {
    fillWith(doc, colours.accent)
      .circle(x + 1.6, y + 5.2, 1.4)
      .fill();
  });
  return stack(
    sentences.map((sentence) => beside(dot, 6, text(sentence, type.body), 6)),
    3,
  );
}

function caution(words: string): Box {
  const glyph = drawing(9, (doc, x, y) => drawCautionGlyph(doc, x, y + 0.5, 8.5));
  return beside(glyph, 9, text(words, type.cellStrong), 4);
}

function pieceRow(line: SheetLine, data: ConsignmentSheetData, withPhotos: boolean): TableRow {
  const { locale } = data;
  const heavy = line.weightG !== null && line.weightG > data.heavyWeightG;
  const photo = line.thumbnail ? picture(line.thumbnail, thumbnailSize) : nothing;
  return {
    cells: [
      ...(withPhotos ? [photo] : []),
      text(line.stockNumber, type.cellFigure),
      stack(
        [
          text(line.title, type.cellStrong),
          line.materials ? text(line.materials, type.cellQuiet) : nothing,
        ],
        1,
      ),
      text(line.dimensions.replace(/\s*mm$/, '') || '—', type.cellFigure, 'right'),
      figures(line.weightG === null ? '—' : kilograms(line.weightG, locale), type.cellFigure),
      moneyCell(line.listPrice, locale),
      moneyCell(line.insuranceValue, locale),
    ],
    below: heavy
      ? {
          from: withPhotos ? 2 : 1,
          box: caution(
            `Heavy: ${formatKilograms(line.weightG!, locale)} — lift with two people or a trolley (UK HSE guideline weights)`,
          ),
        }
      : undefined,
  };
}

/** Totals are printed as given, but only when they are the sum of the lines they total. */
function checkTotals(data: ConsignmentSheetData): void {
  const { currency } = data.totals.listPrice;
  const list = sumMoney(
    data.lines.map((line) => line.listPrice),
    currency,
  );
  const insured = sumMoney(
    data.lines.map((line) => line.insuranceValue),
    data.totals.insuranceValue.currency,
  );
  if (list.amount !== data.totals.listPrice.amount) {
    throw new RangeError(
      `The sheet's list price total ${formatMoney(data.totals.listPrice)} is not the sum of its lines, ${formatMoney(list)}.`,
    );
  }
  if (insured.amount !== data.totals.insuranceValue.amount) {
    throw new RangeError(
      `The sheet's insured total ${formatMoney(data.totals.insuranceValue)} is not the sum of its lines, ${formatMoney(insured)}.`,
    );
  }
}

/**
 * The consignment sheet both sides sign: who sends what to whom, when, on what terms, every piece
 * with its price and insured value, the totals, a handling caution beside each heavy piece
 * (docs/cautions.md), and signature lines for the studio and for the venue on receipt.
 */
export async function renderConsignmentSheet(data: ConsignmentSheetData): Promise<Buffer> {
  checkTotals(data);
  const doc = createDocument({
    title: `${documentName} ${data.reference}`,
    author: data.studio.name,
    subject: `${data.title}: ${data.studio.name} to ${data.venue.name}`,
    issuedOn: data.issuedOn,
    fileId: fileIdentifier('consignment-sheet', data),
  });

  titleBlock(doc, documentName, data);
  partiesBlock(doc, data);
  datesBlock(doc, data);

  sectionHeading(doc, 'Terms');
  place(doc, bullets(data.termsInWords), 18);

  const count = data.lines.length;
  sectionHeading(doc, `Pieces (${count})`, 90);
  const heavyCount = data.lines.filter(
    (l) => l.weightG !== null && l.weightG > data.heavyWeightG,
  ).length;
  const withPhotos = data.lines.some((line) => line.thumbnail !== null);
  drawTable(doc, {
    columns: pieceColumns(withPhotos),
    rows: [
      ...data.lines.map((line) => pieceRow(line, data, withPhotos)),
      {
        total: true,
        keepWithPrevious: true,
        cells: [
          ...(withPhotos ? [nothing] : []),
          nothing,
          text(`Total, ${count} ${count === 1 ? 'piece' : 'pieces'}`, type.cellStrong),
          nothing,
          nothing,
          moneyCell(data.totals.listPrice, data.locale, true),
          moneyCell(data.totals.insuranceValue, data.locale, true),
        ],
      },
    ],
  });
  doc.y += 10;

  if (heavyCount > 0) {
    place(
      doc,
      text(
        `Handling: a piece marked with the caution sign weighs over ${formatKilograms(data.heavyWeightG, data.locale)}. ` +
          'The UK HSE’s guideline weights for lifting close to the body at waist height are 25 kg for men and 16 kg for women, ' +
          'and less at arm’s length or above the shoulder (HSE, “Manual handling at work”, INDG143). ' +
          'Move these pieces with two people or a trolley.',
        type.small,
      ),
      12,
    );
  }

  sectionHeading(doc, 'Signatures', 120);
  place(
    doc,
    columns(
      [
        signatureBlock('For the studio'),
        signatureBlock('For the venue, received in the condition described'),
      ],
      28,
    ),
  );

  return finishDocument(doc, {
    studioName: data.studio.name,
    documentName,
    reference: data.reference,
    venueName: data.venue.name,
  });
}

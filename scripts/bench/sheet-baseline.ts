// The floor the consignment sheet is measured against: a bare pdfkit document that writes the
// same strings in the same fonts (the table's header and the page header and footer on every
// page too), one text call per cell at fixed positions with fixed row heights, and places the
// same thumbnails; nothing is measured and no layout helper is used.
import PDFDocument from 'pdfkit';

import { fonts } from '../../documents/layout/fonts';
import { formatKilograms, kilograms } from '../../documents/layout/format';
import { formatDate } from '../../shared/format/dates';
import { formatMoney } from '../../shared/money/format';
import { type ConsignmentSheetData } from '../../shared/schemas/documents';

const columns = [42, 60, 140, 84, 34, 60, 62];
const headers = [
  'Photo',
  'Stock no.',
  'Title and materials',
  'Dimensions (mm)',
  'Weight (kg)',
  'List price',
  'Insured at',
];

export function bareSheet(data: ConsignmentSheetData): Promise<Buffer> {
  const doc = new PDFDocument({
    size: 'A4',
    margins: { top: 85, bottom: 68, left: 57, right: 57 },
    bufferPages: true,
    info: { CreationDate: new Date(`${data.issuedOn}T00:00:00Z`) },
  });
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const done = new Promise<Buffer>((resolve) =>
    doc.on('end', () => resolve(Buffer.concat(chunks))),
  );
  const { locale } = data;
  const tnum: PDFKit.Mixins.OpenTypeFeatures[] = ['tnum'];
  const line = (words: string, font: string, size: number, x: number, y: number, width = 480) =>
    doc.font(font).fontSize(size).text(words, x, y, { width });

  let y = 85;
  line('Consignment sheet', fonts.heading, 22, 57, y);
  line(data.title, fonts.heading, 13, 57, (y += 28));
  line(
    `Reference ${data.reference} · issued ${formatDate(data.issuedOn, locale)}`,
    fonts.text,
    7.5,
    57,
    (y += 18),
  );
  y += 24;
  for (const [i, party] of [data.studio, data.venue].entries()) {
    const x = 57 + i * 250;
    let py = y;
    line(i === 0 ? 'FROM THE STUDIO' : 'TO THE VENUE', fonts.textStrong, 7.5, x, py, 230);
    line(party.name, fonts.textStrong, 9.5, x, (py += 12), 230);
    for (const text of [...party.address, party.email ?? '', party.vatNumber ?? '']) {
      line(text, fonts.text, 9.5, x, (py += 13), 230);
    }
  }
  y += 110;
  const dates = data.dates;
  [dates.dispatch, dates.opening, dates.closing, dates.returnDue].forEach((date, i) => {
    line(
      ['DISPATCH', 'OPENING', 'CLOSING', 'RETURN DUE'][i]!,
      fonts.textStrong,
      7.5,
      57 + i * 124,
      y,
      110,
    );
    line(date ? formatDate(date, locale) : '—', fonts.text, 9.5, 57 + i * 124, y + 11, 110);
  });
  y += 40;
  line('Terms', fonts.headingStrong, 12, 57, y);
  for (const sentence of data.termsInWords) line(sentence, fonts.text, 9.5, 63, (y += 16));
  y += 30;
  line(`Pieces (${data.lines.length})`, fonts.headingStrong, 12, 57, y);
  y += 20;

  const xs = columns.map((_, i) => 57 + columns.slice(0, i).reduce((a, b) => a + b, 0));
  const cell = (words: string, font: string, i: number, cy: number, figures = false) =>
    doc
      .font(font)
      .fontSize(8.5)
      .text(words, xs[i]! + 4, cy, {
        width: columns[i]! - 8,
        align: i >= 3 ? 'right' : 'left',
        features: figures ? tnum : undefined,
      });
  const tableHeader = () => {
    headers.forEach((header, i) => cell(header, fonts.textStrong, i, y));
    y += 26;
  };
  tableHeader();
  for (const piece of data.lines) {
    if (y + 52 > 774) {
      doc.addPage();
      y = 85;
      tableHeader();
    }
    if (piece.thumbnail) doc.image(Buffer.from(piece.thumbnail), xs[0]! + 4, y, { fit: [34, 34] });
    cell(piece.stockNumber, fonts.text, 1, y, true);
    cell(piece.title, fonts.textStrong, 2, y);
    doc
      .font(fonts.text)
      .fontSize(7.5)
      .text(piece.materials, xs[2]! + 4, y + 12, { width: 140 });
    cell(piece.dimensions.replace(/\s*mm$/, ''), fonts.text, 3, y, true);
    cell(piece.weightG === null ? '—' : kilograms(piece.weightG, locale), fonts.text, 4, y, true);
    cell(formatMoney(piece.listPrice, locale), fonts.text, 5, y, true);
    cell(formatMoney(piece.insuranceValue, locale), fonts.text, 6, y, true);
    if (piece.weightG !== null && piece.weightG > data.heavyWeightG) {
      const words = `Heavy: ${formatKilograms(piece.weightG, locale)} — lift with two people or a trolley (UK HSE guideline weights)`;
      doc
        .font(fonts.textStrong)
        .fontSize(8.5)
        .text(words, xs[2]! + 17, y + 40, { width: 320 });
      y += 16;
    }
    y += 48;
  }
  cell(`Total, ${data.lines.length} pieces`, fonts.textStrong, 2, y);
  cell(formatMoney(data.totals.listPrice, locale), fonts.textStrong, 5, y, true);
  cell(formatMoney(data.totals.insuranceValue, locale), fonts.textStrong, 6, y, true);
  doc.addPage();
  line('Signatures', fonts.headingStrong, 12, 57, 85);
  for (const [i, who] of [
    'For the studio',
    'For the venue, received in the condition described',
  ].entries()) {
    line(who, fonts.textStrong, 9.5, 57 + i * 250, 110, 230);
    for (const [j, caption] of ['SIGNATURE', 'NAME IN CAPITALS', 'DATE'].entries()) {
      line(caption, fonts.textStrong, 7.5, 57 + i * 250, 150 + j * 36, 230);
    }
  }
  const { count } = doc.bufferedPageRange();
  for (let i = 0; i < count; i += 1) {
    doc.switchToPage(i);
    doc.page.margins.bottom = 0;
    line(data.studio.name, fonts.headingStrong, 9, 57, 45);
    line(`Consignment sheet · ${data.reference}`, fonts.text, 7.5, 400, 46, 140);
    line(`${data.venue.name} · ${data.reference}`, fonts.text, 7.5, 57, 800, 300);
    line(`Page ${i + 1} of ${count}`, fonts.text, 7.5, 480, 800, 60);
  }
  doc.end();
  return done;
}

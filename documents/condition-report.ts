import { formatDate } from '@/shared/format/dates';
import { type ConditionGrade } from '@/shared/schemas/condition';
import {
  type ConditionReportData,
  type DocumentCheck,
  type DocumentFinding,
} from '@/shared/schemas/documents';

import {
  beside,
  type Box,
  columns,
  drawing,
  figures,
  nothing,
  padded,
  picture,
  stack,
  text,
} from './layout/boxes';
import { formatMillimetres } from './layout/format';
import { drawGradeGlyph } from './layout/glyphs';
import { fileIdentifier } from './layout/identity';
import { createDocument, finishDocument } from './layout/page';
import { fillWith } from './layout/paint';
import { datesBlock, place, sectionHeading, titleBlock } from './layout/sections';
import { colours, type TextStyle, type } from './layout/style';
import { type Column, drawTable, type TableRow } from './layout/table';

const documentName = 'Condition report';
const photoSize = 72;
const findingPhotoSize = 40;
const gradeOrder: readonly ConditionGrade[] = ['sound', 'slight', 'marked', 'serious'];

const stageHeading: Record<DocumentCheck['stage'], string> = {
  dispatch: 'At dispatch',
  arrival: 'On arrival',
  return: 'On return',
  claim: 'For a claim',
};

/** A finding's kind in words: 'hairline-crack' → "Hairline crack". */
function kindInWords(kind: DocumentFinding['kind']): string {
  const words = kind.replaceAll('-', ' ');
  return words.charAt(0).toUpperCase() + words.slice(1);
}

/** A grade's shape followed by words. */
function graded(grade: ConditionGrade, words: string, style: TextStyle = type.cellStrong): Box {
  const glyph = drawing(9, (doc, x, y) => drawGradeGlyph(doc, grade, x, y + 1.5, 8));
  return beside(glyph, 9, text(words, style), 5);
}

function summary(check: DocumentCheck | null, locale: string): Box {
  if (check === null) return text('Not checked yet.', type.cellQuiet);
  const count = check.findings.length;
  return stack(
    [
      graded(check.overallGrade, `Overall: ${check.overallGrade}`),
      text(
        `Examined by ${check.examinerName} on ${formatDate(check.examinedOn, locale)}`,
        type.cellQuiet,
      ),
      text(
        count === 0 ? 'No findings.' : `${count} ${count === 1 ? 'finding' : 'findings'}:`,
        type.cellQuiet,
      ),
    ],
    3,
  );
}

function finding(f: DocumentFinding | undefined, locale: string): Box {
  if (f === undefined) return nothing;
  const where = [f.location, f.sizeMm === null ? null : formatMillimetres(f.sizeMm, locale)]
    .filter((part): part is string => part !== null && part !== '')
    .join(' · ');
  const words = stack(
    [
      graded(f.grade, `${kindInWords(f.kind)} — ${f.grade}`),
      where ? text(where, type.cell) : nothing,
      f.notes ? text(f.notes, type.cellQuiet) : nothing,
    ],
    2,
  );
  return beside(f.photo ? picture(f.photo, findingPhotoSize) : null, findingPhotoSize, words, 6);
}

function notes(check: DocumentCheck | null): Box {
  return check?.notes
    ? stack([text('Notes', type.cellStrong), text(check.notes, type.cellQuiet)], 1)
    : nothing;
}

/** The legend of grades and the method the overall grade follows. */
function method(): Box {
  const legend = columns(
    gradeOrder.map((grade) =>
      graded(grade, grade === 'sound' ? 'sound: no findings' : grade, type.cell),
    ),
    8,
  );
  return stack(
    [
      legend,
      text(
        'Grades run from least to most serious. A check’s overall grade is the grade of its most ' +
          'serious finding, and a check with no findings is sound (Collections Trust, Spectrum 5.0, ' +
          '“Condition checking and technical assessment”). Each piece is examined in good light ' +
          'before it leaves the studio and again on arrival; earlier checks are kept, so change shows.',
        type.small,
      ),
    ],
    6,
  );
}

function differences(piece: Piece): Box {
  if (piece.differences.length === 0) {
    return piece.arrival === null
      ? nothing
      : text('No differences since dispatch.', type.cellQuiet);
  }
  const dot = drawing(4, (doc, x, y) => {
    fillWith(doc, colours.ink)
      .rect(x, y + 3.5, 3.2, 3.2)
      .fill();
  });
  return stack(
    [
      text('Differences since dispatch', type.bodyStrong),
      ...piece.differences.map((line) => beside(dot, 4, text(line, type.cell), 6)),
    ],
    3,
  );
}

type Piece = ConditionReportData['pieces'][number];

/**
 * One row for the overall grades, one per pair of findings, one for notes, one for the
 * differences; the photographs run down the first column, one to a row.
 */
function pieceRows(piece: Piece, locale: string): TableRow[] {
  const { dispatch, arrival } = piece;
  const photos = piece.photos.slice(0, 2).map((photo) => picture(photo, photoSize));
  const findingRows = Math.max(dispatch?.findings.length ?? 0, arrival?.findings.length ?? 0);
  const rows: TableRow[] = [
    { cells: [nothing, summary(dispatch, locale), summary(arrival, locale)] },
  ];
  for (let i = 0; i < findingRows; i += 1) {
    rows.push({
      cells: [
        nothing,
        finding(dispatch?.findings[i], locale),
        finding(arrival?.findings[i], locale),
      ],
    });
  }
  if (dispatch?.notes || arrival?.notes) {
    rows.push({ cells: [nothing, notes(dispatch), notes(arrival)] });
  }
  while (rows.length < photos.length) rows.push({ cells: [nothing, nothing, nothing] });
  photos.forEach((photo, i) => {
    rows[i] = { ...rows[i]!, cells: [photo, ...rows[i]!.cells.slice(1)] };
  });
  const after = differences(piece);
  if (after !== nothing) {
    rows.push({
      cells: [nothing, nothing, nothing],
      below: { from: 1, box: after },
      keepWithPrevious: true,
    });
  }
  return rows;
}

/**
 * The condition report: each piece's photographs, its dispatch check and, beside it, its check
 * on arrival (or return), findings by kind, grade, place and size, and the differences between
 * the two under their own heading (docs/condition.md).
 */
export async function renderConditionReport(data: ConditionReportData): Promise<Buffer> {
  const doc = createDocument({
    title: `${documentName} ${data.reference}`,
    author: data.studio.name,
    subject: `${data.title}: ${data.studio.name} to ${data.venue.name}`,
    issuedOn: data.issuedOn,
    fileId: fileIdentifier('condition-report', data),
  });

  titleBlock(doc, documentName, data);
  place(
    doc,
    text(
      `From ${data.studio.name} to ${data.venue.name}` +
        (data.venue.contactName ? `, for the attention of ${data.venue.contactName}` : '') +
        '.',
      type.body,
    ),
    12,
  );
  datesBlock(doc, data);
  sectionHeading(doc, 'How to read this report');
  place(doc, method(), 18);

  sectionHeading(doc, `Pieces (${data.pieces.length})`, 140);
  for (const piece of data.pieces) {
    const later = piece.arrival?.stage ?? 'arrival';
    const tableColumns: Column[] = [
      { header: piece.photos.length > 1 ? 'Photographs' : 'Photograph', width: 86 },
      { header: stageHeading.dispatch, width: 198 },
      { header: stageHeading[later], width: 198 },
    ];
    const caption = (title: string) =>
      padded(
        beside(
          padded(figures(piece.stockNumber, type.cellFigure, 'left'), 2.5, 0),
          48,
          text(title, type.pieceTitle),
          4,
        ),
        0,
        4,
      );
    drawTable(doc, {
      columns: tableColumns,
      rows: pieceRows(piece, data.locale),
      caption: caption(piece.title),
      captionContinued: caption(`${piece.title} (continued)`),
      padY: 6,
    });
    doc.y += 22;
  }

  return finishDocument(doc, {
    studioName: data.studio.name,
    documentName,
    reference: data.reference,
    venueName: data.venue.name,
  });
}

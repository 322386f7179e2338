import { type ConditionGrade } from '@/shared/schemas/condition';

import { colours } from './style';
import { type Doc } from './text';

/**
 * The shape that goes with each grade word, so a grade reads without colour (WCAG 2.2, 1.4.1 "Use
 * of Color"): an open circle for sound, then an open triangle, a filled triangle and a filled
 * diamond as findings grow more serious. Drawn in the box `size` points square at (x, y).
 */
export function drawGradeGlyph(
  doc: Doc,
  grade: ConditionGrade,
  x: number,
  y: number,
  size: number,
): void {
  const c = size / 2;
  doc
    .save()
    .lineWidth(Math.max(0.8, size / 9))
    .strokeColor(colours.ink)
    .fillColor(colours.ink);
  const triangle = () =>
    doc
      .moveTo(x + c, y + size * 0.06)
      .lineTo(x + size * 0.98, y + size * 0.92)
      .lineTo(x + size * 0.02, y + size * 0.92)
      .closePath();
  if (grade === 'sound') doc.circle(x + c, y + c, c * 0.82).stroke();
  else if (grade === 'slight') triangle().stroke();
  else if (grade === 'marked') triangle().fillAndStroke();
  else {
    doc
      .moveTo(x + c, y)
      .lineTo(x + size, y + c)
      .lineTo(x + c, y + size)
      .lineTo(x, y + c)
      .closePath()
      .fillAndStroke();
  }
  doc.restore();
}

/** A caution mark: a triangle with an exclamation mark cut out of it, in ink. */
export function drawCautionGlyph(doc: Doc, x: number, y: number, size: number): void {
  doc.save().fillColor(colours.ink);
  doc
    .moveTo(x + size / 2, y)
    .lineTo(x + size, y + size * 0.9)
    .lineTo(x, y + size * 0.9)
    .closePath()
    .fill();
  doc.fillColor('#FFFFFF');
  const w = size * 0.12;
  doc.rect(x + size / 2 - w / 2, y + size * 0.3, w, size * 0.32).fill();
  doc.rect(x + size / 2 - w / 2, y + size * 0.68, w, w).fill();
  doc.restore();
}

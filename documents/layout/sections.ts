import { formatDate } from '@/shared/format/dates';
import { type DocumentHeading, type DocumentParty } from '@/shared/schemas/documents';

import { type Box, columns, drawing, nothing, stack, text } from './boxes';
import { contentLeft, contentWidth, ensureSpace } from './page';
import { rule } from './paint';
import { colours, type } from './style';
import { type Doc } from './text';

/** A small caption over a value, in capitals. */
export const caption = (words: string): Box => text(words.toLocaleUpperCase('en-GB'), type.label);

/** Draws a box across the page at the cursor, on a new page if it does not fit, and moves on. */
export function place(doc: Doc, box: Box, gapAfter = 0): void {
  const width = contentWidth(doc);
  const height = box.height(doc, width);
  ensureSpace(doc, height);
  const top = doc.y;
  box.draw(doc, contentLeft(doc), top, width);
  doc.x = contentLeft(doc);
  doc.y = top + height + gapAfter;
}

/** The document's name, its own title, and the reference and day it was issued. */
export function titleBlock(doc: Doc, documentName: string, heading: DocumentHeading): void {
  place(
    doc,
    stack(
      [
        text(documentName, type.documentName),
        text(heading.title, type.documentTitle),
        text(
          `Reference ${heading.reference} · issued ${formatDate(heading.issuedOn, heading.locale)}`,
          type.small,
        ),
      ],
      3,
    ),
    18,
  );
}

function party(role: string, who: DocumentParty, contactName: string | null = null): Box {
  const lines = [
    caption(role),
    text(who.name, type.bodyStrong),
    contactName ? text(`For the attention of ${contactName}`, type.body) : nothing,
    who.address.length > 0 ? text(who.address.join('\n'), type.body) : nothing,
    who.email ? text(who.email, type.body) : nothing,
    who.vatNumber ? text(`VAT no. ${who.vatNumber}`, type.body) : nothing,
  ];
  return stack(lines, 2);
}

/** The studio and the venue side by side, with addresses and VAT numbers when given. */
export function partiesBlock(doc: Doc, heading: DocumentHeading): void {
  place(
    doc,
    columns(
      [
        party('From the studio', heading.studio),
        party('To the venue', heading.venue, heading.venue.contactName),
      ],
      24,
    ),
    16,
  );
}

/** Dispatch, opening, closing and return dates in a row; a dash for one not yet set. */
export function datesBlock(doc: Doc, heading: DocumentHeading): void {
  const { dates, locale } = heading;
  const one = (label: string, date: string | null) =>
    stack([caption(label), text(date ? formatDate(date, locale) : '—', type.body)], 2);
  place(
    doc,
    columns(
      [
        one('Dispatch', dates.dispatch),
        one('Opening', dates.opening),
        one('Closing', dates.closing),
        one('Return due', dates.returnDue),
      ],
      16,
    ),
    18,
  );
}

/** A section's heading with a short accent rule before it; kept with `keepWith` points of what follows. */
export function sectionHeading(doc: Doc, words: string, keepWith = 60): void {
  const heading = stack(
    [
      drawing(2, (d, x, y) => {
        rule(d, [x, y], [x + 28, y], 2, colours.accent);
      }),
      text(words, type.section),
    ],
    6,
  );
  ensureSpace(doc, heading.height(doc, contentWidth(doc)) + keepWith);
  place(doc, heading, 8);
}

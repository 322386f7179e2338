import { isoDateInTimeZone } from '@/shared/money';
import { type DocumentHeading } from '@/shared/schemas/documents';

import { type HeadingRow, type PieceRow } from './documents.repository';

/** The day a document describes: the dispatch date once sent, so it reads the same every time. */
export function issuedOn(row: HeadingRow): string {
  return row.dispatch_date ?? isoDateInTimeZone(new Date(), row.time_zone);
}

/** The parties, reference and dates every consignment document opens with. */
export function headingOf(row: HeadingRow): DocumentHeading {
  const townLine = [row.town, row.postcode].filter(Boolean).join(' ');
  return {
    studio: { name: row.studio_name, address: [], email: null, vatNumber: row.studio_vat_number },
    venue: {
      name: row.venue_name,
      address: [row.address_line1, row.address_line2, townLine].filter(
        (line): line is string => !!line,
      ),
      email: row.venue_email,
      vatNumber: row.venue_vat_number,
      contactName: row.contact_name,
    },
    reference: row.reference,
    title: row.title,
    dates: {
      dispatch: row.dispatch_date,
      opening: row.opening_date,
      closing: row.closing_date,
      returnDue: row.return_due_date,
    },
    issuedOn: issuedOn(row),
    locale: row.locale,
  };
}

/** "Stoneware, celadon glaze, 1280 °C reduction": what a piece is made of, in one line. */
export function materialsOf(piece: PieceRow): string {
  const firing = piece.firing_temp_c
    ? `${piece.firing_temp_c} °C${piece.atmosphere ? ` ${piece.atmosphere.toLowerCase()}` : ''}`
    : null;
  const glaze =
    piece.glaze && !/\bglaze\b/i.test(piece.glaze) ? `${piece.glaze} glaze` : piece.glaze;
  return [piece.clay_body, glaze, firing].filter(Boolean).join(', ');
}

/** Height × width × depth in millimetres, leaving out what was not measured. */
export function dimensionsOf(piece: PieceRow): string {
  const sizes = [piece.height_mm, piece.width_mm, piece.depth_mm].filter(
    (v): v is number => v !== null,
  );
  return sizes.length === 0 ? '' : `${sizes.join(' × ')} mm`;
}

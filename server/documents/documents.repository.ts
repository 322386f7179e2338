import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';

/** The parties and dates a document's heading shows. */
export async function findDocumentHeading(db: Db, scope: Scope, consignmentId: number) {
  return scoped
    .consignments(db, scope)
    .innerJoin('venues', 'venues.id', 'consignments.venue_id')
    .innerJoin('studios', 'studios.id', 'consignments.studio_id')
    .select([
      'consignments.id',
      'consignments.reference',
      'consignments.title',
      'consignments.state',
      'consignments.terms',
      'consignments.dispatch_date',
      'consignments.opening_date',
      'consignments.closing_date',
      'consignments.return_due_date',
      'studios.name as studio_name',
      'studios.vat_number as studio_vat_number',
      'studios.locale',
      'studios.time_zone',
      'venues.name as venue_name',
      'venues.address_line1',
      'venues.address_line2',
      'venues.town',
      'venues.postcode',
      'venues.email as venue_email',
      'venues.vat_number as venue_vat_number',
      'venues.contact_name',
    ])
    .where('consignments.id', '=', consignmentId)
    .executeTakeFirst();
}
export type HeadingRow = NonNullable<Awaited<ReturnType<typeof findDocumentHeading>>>;

/** Each piece of the consignment with the work's making and its photos' files, in line order. */
export async function listDocumentPieces(db: Db, scope: Scope, consignmentId: number) {
  const pieces = await scoped
    .consignmentLines(db, scope)
    .innerJoin('works', 'works.id', 'consignment_lines.work_id')
    .select([
      'consignment_lines.id',
      'consignment_lines.state',
      'consignment_lines.currency',
      'consignment_lines.list_price',
      'consignment_lines.insurance_value',
      'works.id as work_id',
      'works.stock_number',
      'works.title',
      'works.clay_body',
      'works.glaze',
      'works.firing_temp_c',
      'works.atmosphere',
      'works.height_mm',
      'works.width_mm',
      'works.depth_mm',
      'works.weight_g',
      'works.food_use',
      'works.care_notes',
    ])
    .where('consignment_lines.consignment_id', '=', consignmentId)
    .where('consignment_lines.state', '!=', 'withdrawn')
    .orderBy('consignment_lines.id')
    .execute();
  const photos =
    pieces.length === 0
      ? []
      : await scoped
          .workPhotos(db, scope)
          .select(['work_photos.work_id', 'work_photos.position', 'files.sha256'])
          .where(
            'work_photos.work_id',
            'in',
            pieces.map((p) => p.work_id),
          )
          .orderBy('work_photos.position')
          .execute();
  return pieces.map((piece) => ({
    ...piece,
    photoHashes: photos.filter((p) => p.work_id === piece.work_id).map((p) => p.sha256),
  }));
}
export type PieceRow = Awaited<ReturnType<typeof listDocumentPieces>>[number];

/** The stored picture behind each finding photographed on these lines, by finding id. */
export async function findingPhotoHashes(db: Db, scope: Scope, lineIds: readonly number[]) {
  if (lineIds.length === 0) return new Map<number, string>();
  const rows = await scoped
    .conditionReports(db, scope)
    .innerJoin('condition_findings', 'condition_findings.report_id', 'condition_reports.id')
    .innerJoin('files', 'files.id', 'condition_findings.photo_file_id')
    .select(['condition_findings.id', 'files.sha256'])
    .where('condition_reports.consignment_line_id', 'in', lineIds)
    .execute();
  return new Map(rows.map((r) => [r.id, r.sha256]));
}

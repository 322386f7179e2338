import { sql } from 'kysely';

import { type ConsignmentState } from '@/shared/schemas/consignment';

import { type Db } from '../db/database';
import { type Scope } from './viewer';

/** A venue sees a consignment once its terms are agreed, not while the maker is drafting it. */
export const visibleToVenue: readonly ConsignmentState[] = [
  'agreed',
  'dispatched',
  'on-show',
  'closed',
  'settled',
];

function scopedConsignments(db: Db, scope: Scope) {
  const q = db.selectFrom('consignments').where('consignments.studio_id', '=', scope.studioId);
  if (scope.venueId === null) return q;
  return q
    .where('consignments.venue_id', '=', scope.venueId)
    .where('consignments.state', 'in', visibleToVenue);
}

function scopedWorks(db: Db, scope: Scope) {
  const q = db.selectFrom('works').where('works.studio_id', '=', scope.studioId);
  if (scope.venueId === null) return q;
  const venueId = scope.venueId;
  return q.where(({ exists, selectFrom }) =>
    exists(
      selectFrom('consignment_lines')
        .innerJoin('consignments', 'consignments.id', 'consignment_lines.consignment_id')
        .select('consignment_lines.id')
        .whereRef('consignment_lines.work_id', '=', 'works.id')
        .where('consignments.venue_id', '=', venueId)
        .where('consignments.state', 'in', visibleToVenue),
    ),
  );
}

/**
 * Starting points for every query over studio data, already narrowed to the Scope: the studio,
 * and for the gallery role its venue (and the works it holds). Repositories begin here instead
 * of at `db.selectFrom`, so leaving the scope out has to be done on purpose.
 */
export const scoped = {
  /** The active studio itself: one row. */
  studios(db: Db, scope: Scope) {
    return db.selectFrom('studios').where('studios.id', '=', scope.studioId);
  },

  venues(db: Db, scope: Scope) {
    const q = db.selectFrom('venues').where('venues.studio_id', '=', scope.studioId);
    return scope.venueId === null ? q : q.where('venues.id', '=', scope.venueId);
  },

  memberships(db: Db, scope: Scope) {
    const q = db.selectFrom('memberships').where('memberships.studio_id', '=', scope.studioId);
    return scope.venueId === null ? q : q.where('memberships.venue_id', '=', scope.venueId);
  },

  consignments: scopedConsignments,

  /** Lines on the consignments the scope may see. */
  consignmentLines(db: Db, scope: Scope) {
    return scopedConsignments(db, scope).innerJoin(
      'consignment_lines',
      'consignment_lines.consignment_id',
      'consignments.id',
    );
  },

  works: scopedWorks,

  /** Photos of the works the scope may see, each with its file. */
  workPhotos(db: Db, scope: Scope) {
    return scopedWorks(db, scope)
      .innerJoin('work_photos', 'work_photos.work_id', 'works.id')
      .innerJoin('files', (join) =>
        join
          .onRef('files.id', '=', 'work_photos.file_id')
          .onRef('files.studio_id', '=', 'works.studio_id'),
      );
  },

  /**
   * The studio's e-mail. A venue's staff see none of it: what the studio wrote to them reaches
   * them as mail, and the rest is the studio's own.
   */
  outbox(db: Db, scope: Scope) {
    const q = db.selectFrom('outbox').where('outbox.studio_id', '=', scope.studioId);
    return scope.venueId === null ? q : q.where(sql<boolean>`1 = 0`);
  },

  /** Statements; a venue's staff see their venue's once issued, never a draft. */
  statements(db: Db, scope: Scope) {
    const q = db.selectFrom('statements').where('statements.studio_id', '=', scope.studioId);
    if (scope.venueId === null) return q;
    return q
      .where('statements.venue_id', '=', scope.venueId)
      .where('statements.state', '!=', 'draft');
  },

  files(db: Db, scope: Scope) {
    return db.selectFrom('files').where('files.studio_id', '=', scope.studioId);
  },

  conditionReports(db: Db, scope: Scope) {
    const q = db
      .selectFrom('condition_reports')
      .where('condition_reports.studio_id', '=', scope.studioId);
    if (scope.venueId === null) return q;
    const venueId = scope.venueId;
    return q.where(({ exists, selectFrom }) =>
      exists(
        selectFrom('consignment_lines')
          .innerJoin('consignments', 'consignments.id', 'consignment_lines.consignment_id')
          .select('consignment_lines.id')
          .whereRef('consignment_lines.id', '=', 'condition_reports.consignment_line_id')
          .where('consignments.venue_id', '=', venueId)
          .where('consignments.state', 'in', visibleToVenue),
      ),
    );
  },
};

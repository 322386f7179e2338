import { type Db } from '../db/database';
import { type Scope } from './viewer';

/**
 * Starting points for every query over studio data, already narrowed to the Scope: the studio,
 * and for the gallery role its venue (and the works it holds). Repositories begin here instead
 * of at `db.selectFrom`, so leaving the scope out has to be done on purpose.
 */
export const scoped = {
  venues(db: Db, scope: Scope) {
    const q = db.selectFrom('venues').where('venues.studio_id', '=', scope.studioId);
    return scope.venueId === null ? q : q.where('venues.id', '=', scope.venueId);
  },

  consignments(db: Db, scope: Scope) {
    const q = db.selectFrom('consignments').where('consignments.studio_id', '=', scope.studioId);
    return scope.venueId === null ? q : q.where('consignments.venue_id', '=', scope.venueId);
  },

  works(db: Db, scope: Scope) {
    const q = db.selectFrom('works').where('works.studio_id', '=', scope.studioId);
    if (scope.venueId === null) return q;
    const venueId = scope.venueId;
    return q.where(({ exists, selectFrom }) =>
      exists(
        selectFrom('consignment_lines')
          .innerJoin('consignments', 'consignments.id', 'consignment_lines.consignment_id')
          .select('consignment_lines.id')
          .whereRef('consignment_lines.work_id', '=', 'works.id')
          .where('consignments.venue_id', '=', venueId),
      ),
    );
  },
};

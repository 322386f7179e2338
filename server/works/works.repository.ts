import { type Expression, sql, type SqlBool } from 'kysely';

import { type WorkSort, type WorkStatus, workStatuses } from '@/shared/schemas/work';

import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { ignoringCase } from '../db/dialect';
import { type NewWorkRow } from '../db/schema/works';
import { containsWord, matchesLike } from '../db/text-search';
import { latestLineId, statusFromLatestLine } from './work-status';
import { toPhoto, type toWorkColumns, type WorkListRow } from './works.mapper';

export type WorkFilter = {
  search?: string;
  status?: WorkStatus;
  series?: string;
  category?: string;
  venueId?: number;
  archived: 'exclude' | 'include' | 'only';
};

/**
 * The studio's works, each joined to its latest consignment line and, while that line is out,
 * to the venue holding it: status and place are derived here, never stored.
 */
function worksWithPlace(db: Db, scope: Scope) {
  return scoped
    .works(db, scope)
    .leftJoin('consignment_lines as latest', (join) =>
      join.onRef('latest.work_id', '=', 'works.id').on('latest.id', '=', latestLineId),
    )
    .leftJoin('consignments as placed', (join) =>
      join.onRef('placed.id', '=', 'latest.consignment_id').on('latest.state', '=', 'consigned'),
    )
    .leftJoin('venues as place_venue', 'place_venue.id', 'placed.venue_id');
}

type WorksWithPlace = ReturnType<typeof worksWithPlace>;

const status = statusFromLatestLine(sql.ref('latest.state'), sql.ref('placed.state'));

/**
 * 1 while nothing on record needs the work (no consignment line, no condition report), so it may
 * be deleted; 0 once it has a history, which is kept.
 */
const deletable = sql<number>`case when latest.id is null and not exists (
  select 1 from condition_reports where condition_reports.work_id = works.id) then 1 else 0 end`;

/** Statuses sort in the order a work moves through them, not alphabetically. */
const statusRank = sql<number>`case ${status} ${sql.join(
  workStatuses.map((s, i) => sql`when ${sql.lit(s)} then ${sql.lit(i)}`),
  sql` `,
)} end`;

/** `%` and `_` in what a maker types are letters, not wildcards. */

const searchColumns = [
  'works.stock_number',
  'works.title',
  'works.series',
  'works.category',
  'works.clay_body',
  'works.glaze',
] as const;

function filtered(db: Db, query: WorksWithPlace, filter: WorkFilter): WorksWithPlace {
  let q = query;
  if (filter.archived === 'exclude') q = q.where('works.archived_at', 'is', null);
  if (filter.archived === 'only') q = q.where('works.archived_at', 'is not', null);
  if (filter.status) q = q.where(status, '=', filter.status);
  if (filter.series) q = q.where('works.series', '=', filter.series);
  if (filter.category) q = q.where('works.category', '=', filter.category);
  if (filter.venueId) q = q.where('placed.venue_id', '=', filter.venueId);
  // Every word must appear in one of the text columns.
  for (const word of (filter.search ?? '').split(/\s+/).filter(Boolean)) {
    q = q.where((eb) =>
      eb.or(searchColumns.map((column) => containsWord(db, column, word)) as Expression<SqlBool>[]),
    );
  }
  return q;
}

function sorted(db: Db, query: WorksWithPlace, sort: WorkSort): WorksWithPlace {
  const direction = sort.startsWith('-') ? 'desc' : 'asc';
  const key = sort.replace(/^-/, '') as 'stockNumber' | 'title' | 'year' | 'price' | 'status';
  let q = query;
  if (key === 'title') q = q.orderBy(ignoringCase(db, sql.ref('works.title')), direction);
  if (key === 'year') q = q.orderBy('works.year', (o) => o[direction]().nullsLast());
  if (key === 'price') q = q.orderBy('works.retail_price', direction);
  if (key === 'status') q = q.orderBy(statusRank, direction);
  // The stock number breaks ties, then the id, so pages never overlap.
  return q
    .orderBy('works.stock_number', key === 'stockNumber' ? direction : 'asc')
    .orderBy('works.id');
}

function selectWork(query: WorksWithPlace) {
  return query.select([
    'works.id',
    'works.stock_number',
    'works.title',
    'works.year',
    'works.series',
    'works.category',
    'works.clay_body',
    'works.glaze',
    'works.firing_temp_c',
    'works.atmosphere',
    'works.kiln',
    'works.height_mm',
    'works.width_mm',
    'works.depth_mm',
    'works.weight_g',
    'works.retail_price',
    'works.currency',
    'works.cost_price',
    'works.food_use',
    'works.care_notes',
    'works.notes',
    'works.archived_at',
    'works.created_at',
    'works.updated_at',
    status.as('status'),
    deletable.as('deletable'),
    'placed.id as placed_consignment_id',
    'placed.reference as placed_reference',
    'placed.state as placed_state',
    'placed.venue_id as venue_id',
    'place_venue.name as venue_name',
  ]);
}

export async function listWorkRows(
  db: Db,
  scope: Scope,
  filter: WorkFilter,
  sort: WorkSort,
  page?: { page: number; pageSize: number },
): Promise<WorkListRow[]> {
  let q = selectWork(sorted(db, filtered(db, worksWithPlace(db, scope), filter), sort));
  if (page) q = q.limit(page.pageSize).offset((page.page - 1) * page.pageSize);
  return q.execute();
}

export async function countWorks(db: Db, scope: Scope, filter: WorkFilter): Promise<number> {
  const row = await filtered(db, worksWithPlace(db, scope), filter)
    .select((eb) => eb.fn.countAll<number>().as('n'))
    .executeTakeFirstOrThrow();
  return Number(row.n);
}

export async function findWorkRow(
  db: Db,
  scope: Scope,
  id: number,
): Promise<WorkListRow | undefined> {
  return selectWork(worksWithPlace(db, scope)).where('works.id', '=', id).executeTakeFirst();
}

/** Photos of the given works, cover first, grouped by work. */
export async function listPhotosOf(db: Db, scope: Scope, workIds: readonly number[]) {
  const byWork = new Map<number, ReturnType<typeof toPhoto>[]>();
  if (workIds.length === 0) return byWork;
  const rows = await scoped
    .workPhotos(db, scope)
    .where('work_photos.work_id', 'in', workIds)
    .select([
      'work_photos.id',
      'work_photos.work_id',
      'work_photos.position',
      'files.width_px',
      'files.height_px',
    ])
    .orderBy('work_photos.work_id')
    .orderBy('work_photos.position')
    .execute();
  for (const row of rows) {
    const list = byWork.get(row.work_id) ?? [];
    list.push(toPhoto(row));
    byWork.set(row.work_id, list);
  }
  return byWork;
}

export async function listFacets(db: Db, scope: Scope) {
  const distinct = async (column: 'works.series' | 'works.category') => {
    const rows = await scoped
      .works(db, scope)
      .select(`${column} as value`)
      .where(column, 'is not', null)
      .where('works.archived_at', 'is', null)
      // Grouped rather than DISTINCT: PostgreSQL sorts a DISTINCT only by what it selects.
      .groupBy(column)
      .orderBy(ignoringCase(db, sql.ref(column)))
      .execute();
    return rows.map((r) => r.value).filter((v): v is string => v !== null);
  };
  const venues = await scoped
    .venues(db, scope)
    .select(['venues.id', 'venues.name'])
    .where('venues.archived_at', 'is', null)
    .orderBy(ignoringCase(db, sql.ref('venues.name')))
    .execute();
  return {
    series: await distinct('works.series'),
    categories: await distinct('works.category'),
    venues,
  };
}

/** Stock numbers of the studio that match a LIKE pattern (see `stockNumberLike`). */
export async function listStockNumbersLike(db: Db, scope: Scope, like: string) {
  const rows = await scoped
    .works(db, scope)
    .select('works.stock_number')
    .where(matchesLike(db, 'works.stock_number', like))
    .execute();
  return rows.map((r) => r.stock_number);
}

/** Which of these stock numbers the studio already uses (another work's, when `exceptId`). */
export async function stockNumbersTaken(
  db: Db,
  scope: Scope,
  stockNumbers: readonly string[],
  exceptId?: number,
): Promise<Set<string>> {
  const taken = new Set<string>();
  // SQLite caps bound parameters per statement, so ask in slices.
  for (let i = 0; i < stockNumbers.length; i += 500) {
    let q = scoped
      .works(db, scope)
      .select('works.stock_number')
      .where('works.stock_number', 'in', stockNumbers.slice(i, i + 500));
    if (exceptId !== undefined) q = q.where('works.id', '!=', exceptId);
    for (const row of await q.execute()) taken.add(row.stock_number);
  }
  return taken;
}

/** The studio's works, archived too, with any of these titles: an import's duplicate check. */
export async function worksTitled(db: Db, scope: Scope, titles: readonly string[]) {
  const query = (slice: readonly string[]) =>
    scoped
      .works(db, scope)
      .select([
        'works.stock_number',
        'works.title',
        'works.year',
        'works.retail_price',
        'works.currency',
      ])
      .where('works.title', 'in', slice)
      .orderBy('works.id')
      .execute();
  const found: Awaited<ReturnType<typeof query>> = [];
  // SQLite caps bound parameters per statement, so ask in slices.
  for (let i = 0; i < titles.length; i += 500)
    found.push(...(await query(titles.slice(i, i + 500))));
  return found;
}

/**
 * Inserts the rows, leaving out any whose stock number the studio already uses (a clash is an
 * answer, not a failure, even when two requests race). Answers the ids inserted, by stock number.
 */
export async function insertWorks(
  db: Db,
  rows: readonly NewWorkRow[],
): Promise<Map<string, number>> {
  const inserted = new Map<string, number>();
  for (let i = 0; i < rows.length; i += 200) {
    const chunk = await db
      .insertInto('works')
      .values(rows.slice(i, i + 200))
      .onConflict((oc) => oc.columns(['studio_id', 'stock_number']).doNothing())
      .returning(['id', 'stock_number'])
      .execute();
    for (const row of chunk) inserted.set(row.stock_number, row.id);
  }
  return inserted;
}

export async function updateWorkColumns(
  db: Db,
  scope: Scope,
  id: number,
  columns: ReturnType<typeof toWorkColumns> & { archived_at?: string | null },
): Promise<void> {
  await db
    .updateTable('works')
    .set({ ...columns, updated_at: new Date().toISOString() })
    .where('works.studio_id', '=', scope.studioId)
    .where('works.id', '=', id)
    .execute();
}

/** Whether the work has ever been on a consignment line or had its condition reported. */
export async function workHasRecord(db: Db, scope: Scope, id: number) {
  const line = await scoped
    .consignmentLines(db, scope)
    .select('consignment_lines.id')
    .where('consignment_lines.work_id', '=', id)
    .executeTakeFirst();
  const report = await scoped
    .conditionReports(db, scope)
    .select('condition_reports.id')
    .where('condition_reports.work_id', '=', id)
    .executeTakeFirst();
  return { consigned: line !== undefined, reported: report !== undefined };
}

export async function deleteWorkRow(db: Db, scope: Scope, id: number): Promise<void> {
  await db
    .deleteFrom('work_photos')
    .where(
      'work_photos.work_id',
      'in',
      scoped.works(db, scope).select('works.id').where('works.id', '=', id),
    )
    .execute();
  await db
    .deleteFrom('works')
    .where('works.studio_id', '=', scope.studioId)
    .where('works.id', '=', id)
    .execute();
}

import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { type CheckedImage } from './photo-store';

/** The studio's `files` row for this content, made on first upload: one per studio and hash. */
export async function fileIdFor(
  db: Db,
  scope: Scope,
  image: CheckedImage,
  originalName: string,
): Promise<number> {
  await db
    .insertInto('files')
    .values({
      studio_id: scope.studioId,
      sha256: image.sha256,
      mime_type: image.mimeType,
      byte_size: image.byteSize,
      original_name: originalName,
      width_px: image.widthPx,
      height_px: image.heightPx,
      created_by: scope.userId,
    })
    .onConflict((oc) => oc.columns(['studio_id', 'sha256']).doNothing())
    .execute();
  const row = await scoped
    .files(db, scope)
    .select('files.id')
    .where('files.sha256', '=', image.sha256)
    .executeTakeFirstOrThrow();
  return row.id;
}

async function photoRowsOf(db: Db, scope: Scope, workId: number) {
  return scoped
    .workPhotos(db, scope)
    .select(['work_photos.id', 'work_photos.file_id', 'work_photos.position'])
    .where('works.id', '=', workId)
    .orderBy('work_photos.position')
    .execute();
}

/**
 * Sets the positions to the order given (0 is the cover). Positions are unique per work, so the
 * rows first step aside to negative ones.
 */
async function writePositions(db: Db, photoIds: readonly number[]): Promise<void> {
  for (const [index, id] of photoIds.entries()) {
    await db
      .updateTable('work_photos')
      .set({ position: -1 - index })
      .where('id', '=', id)
      .execute();
  }
  for (const [index, id] of photoIds.entries()) {
    await db.updateTable('work_photos').set({ position: index }).where('id', '=', id).execute();
  }
}

/** Adds photos after the existing ones; a picture the work already has is not added twice. */
export async function appendPhotos(
  db: Db,
  scope: Scope,
  workId: number,
  fileIds: readonly number[],
): Promise<void> {
  const existing = await photoRowsOf(db, scope, workId);
  const onWork = new Set(existing.map((p) => p.file_id));
  let position = existing.reduce((max, p) => Math.max(max, p.position + 1), 0);
  for (const fileId of fileIds) {
    if (onWork.has(fileId)) continue;
    onWork.add(fileId);
    await db
      .insertInto('work_photos')
      .values({ work_id: workId, file_id: fileId, position: position++ })
      .execute();
  }
}

/** The ids of the work's photos in their order. */
export async function photoIdsOf(db: Db, scope: Scope, workId: number): Promise<number[]> {
  return (await photoRowsOf(db, scope, workId)).map((p) => p.id);
}

export async function reorderPhotos(
  db: Db,
  scope: Scope,
  workId: number,
  photoIds: readonly number[],
): Promise<void> {
  const current = new Set(await photoIdsOf(db, scope, workId));
  if (photoIds.some((id) => !current.has(id))) throw new Error('photo of another work');
  await writePositions(db, photoIds);
}

/**
 * Removes one photo and closes the gap, so the first one left is the cover. Answers the file it
 * showed, or undefined when the work has no such photo.
 */
export async function removePhoto(
  db: Db,
  scope: Scope,
  workId: number,
  photoId: number,
): Promise<number | undefined> {
  const rows = await photoRowsOf(db, scope, workId);
  const removed = rows.find((row) => row.id === photoId);
  if (!removed) return undefined;
  await db.deleteFrom('work_photos').where('id', '=', photoId).execute();
  await writePositions(
    db,
    rows.filter((row) => row.id !== photoId).map((row) => row.id),
  );
  return removed.file_id;
}

/** The files behind a work's photos. */
export async function fileIdsOfWork(db: Db, scope: Scope, workId: number): Promise<number[]> {
  return (await photoRowsOf(db, scope, workId)).map((p) => p.file_id);
}

/**
 * Deletes those of the studio's files that nothing refers to any more (no work's photo, no
 * condition finding) and answers their content hashes.
 */
export async function deleteUnusedFiles(
  db: Db,
  scope: Scope,
  fileIds: readonly number[],
): Promise<string[]> {
  if (fileIds.length === 0) return [];
  const unused = await scoped
    .files(db, scope)
    .select(['files.id', 'files.sha256'])
    .where('files.id', 'in', fileIds)
    .where(({ not, exists, selectFrom }) =>
      not(
        exists(
          selectFrom('work_photos')
            .select('work_photos.id')
            .whereRef('work_photos.file_id', '=', 'files.id'),
        ),
      ),
    )
    .where(({ not, exists, selectFrom }) =>
      not(
        exists(
          selectFrom('condition_findings')
            .select('condition_findings.id')
            .whereRef('condition_findings.photo_file_id', '=', 'files.id'),
        ),
      ),
    )
    .execute();
  if (unused.length === 0) return [];
  await db
    .deleteFrom('files')
    .where('files.studio_id', '=', scope.studioId)
    .where(
      'files.id',
      'in',
      unused.map((f) => f.id),
    )
    .execute();
  return unused.map((f) => f.sha256);
}

/**
 * Whether any studio still has a file with this content. Unscoped on purpose: the stored bytes
 * are shared by every studio that uploaded the same picture.
 */
export async function contentStillReferenced(db: Db, sha256: string): Promise<boolean> {
  const row = await db
    .selectFrom('files')
    .select('files.id')
    .where('files.sha256', '=', sha256)
    .executeTakeFirst();
  return row !== undefined;
}

/** The work, if the scope may see it. */
export async function findWorkId(db: Db, scope: Scope, workId: number) {
  return scoped
    .works(db, scope)
    .select('works.id')
    .where('works.id', '=', workId)
    .executeTakeFirst();
}

/** The stored file behind a photo, if the scope may see the work it belongs to. */
export async function findPhotoFile(db: Db, scope: Scope, photoId: number) {
  return scoped
    .workPhotos(db, scope)
    .select(['files.sha256', 'files.mime_type'])
    .where('work_photos.id', '=', photoId)
    .executeTakeFirst();
}

import { type WorkPhotos } from '@/shared/schemas/work';

import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { HttpError, notFound } from '../http/http-error';
import { listPhotosOf } from '../works/works.repository';
import { type CheckedImage, checkImage, type PhotoStore } from './photo-store';
import {
  appendPhotos,
  contentStillReferenced,
  deleteUnusedFiles,
  fileIdFor,
  findWorkId,
  photoIdsOf,
  removePhoto,
  reorderPhotos,
} from './photos.repository';

async function assertWork(db: Db, scope: Scope, workId: number): Promise<void> {
  if (!(await findWorkId(db, scope, workId))) throw notFound('That work');
}

export async function listWorkPhotos(db: Db, scope: Scope, workId: number): Promise<WorkPhotos> {
  return (await listPhotosOf(db, scope, [workId])).get(workId) ?? [];
}

/**
 * Checks every file before storing any (one bad file refuses the upload), stores each picture
 * once by content hash, and adds them after the work's existing photos.
 */
export async function uploadPhotos(
  db: Db,
  store: PhotoStore,
  scope: Scope,
  workId: number,
  files: readonly { path: string; originalname: string }[],
): Promise<WorkPhotos> {
  await assertWork(db, scope, workId);
  if (files.length === 0) {
    throw new HttpError('invalid_request', 'Choose at least one photo to upload.');
  }
  const images: CheckedImage[] = [];
  for (const file of files) images.push(await checkImage(file.path, file.originalname));
  await store.keep(images, () =>
    db.transaction().execute(async (trx) => {
      await assertWork(trx, scope, workId);
      const fileIds = [];
      for (const [i, image] of images.entries()) {
        fileIds.push(await fileIdFor(trx, scope, image, files[i]!.originalname));
      }
      await appendPhotos(trx, scope, workId, fileIds);
    }),
  );
  return listWorkPhotos(db, scope, workId);
}

/**
 * After a change that may have left pictures unused: their rows are gone already (in the
 * change's transaction); their stored files go once no studio has the same picture.
 */
export async function removeStoredContent(
  db: Db,
  store: PhotoStore,
  hashes: readonly string[],
): Promise<void> {
  for (const sha256 of hashes) {
    await store.removeUnless(sha256, () => contentStillReferenced(db, sha256));
  }
}

/** The work's photos in a new order, cover first; the list must hold each of them once. */
export async function setPhotoOrder(
  db: Db,
  scope: Scope,
  workId: number,
  photoIds: readonly number[],
): Promise<WorkPhotos> {
  await db.transaction().execute(async (trx) => {
    await assertWork(trx, scope, workId);
    const current = await photoIdsOf(trx, scope, workId);
    const sameSet =
      photoIds.length === current.length &&
      new Set(photoIds).size === photoIds.length &&
      photoIds.every((id) => current.includes(id));
    if (!sameSet) {
      const message = 'List each of this work’s photos once, cover first.';
      throw new HttpError('invalid_request', message, [{ path: ['photoIds'], message }]);
    }
    await reorderPhotos(trx, scope, workId, photoIds);
  });
  return listWorkPhotos(db, scope, workId);
}

/** Removes one photo; its stored files go too once nothing refers to them. */
export async function deletePhoto(
  db: Db,
  store: PhotoStore,
  scope: Scope,
  workId: number,
  photoId: number,
): Promise<WorkPhotos> {
  const unused = await db.transaction().execute(async (trx) => {
    await assertWork(trx, scope, workId);
    const fileId = await removePhoto(trx, scope, workId, photoId);
    if (fileId === undefined) throw notFound('That photo');
    return deleteUnusedFiles(trx, scope, [fileId]);
  });
  await removeStoredContent(db, store, unused);
  return listWorkPhotos(db, scope, workId);
}

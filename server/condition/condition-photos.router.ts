import express, { type RequestHandler, type Response } from 'express';
import { z } from 'zod';

import { requireRole, scopeOf } from '../access/authenticate';
import { requireAnyRole, requireScopeOf } from '../access/resource-scope';
import { studioOf } from '../access/resource-studio.repository';
import { type AppContext } from '../context';
import { HttpError, notFound } from '../http/http-error';
import { validate } from '../http/validate';
import { checkImage, photoStore } from '../photos/photo-store';
import { fileIdFor } from '../photos/photos.repository';
import { sendRendition } from '../photos/send-rendition';
import { receiveImages, uploadedFiles } from '../photos/upload';
import { conditionPhotoUrl } from './condition.mapper';
import { findConditionPhoto } from './condition.repository';

const byFile = validate({
  params: z.strictObject({
    fileId: z.coerce.number({ error: 'The photo id must be a number.' }).int().positive(),
  }),
});
/** A photo of a piece of another studio than the active one names the piece. */
const forLine = validate({
  query: z.strictObject({
    lineId: z.coerce.number({ error: 'The line id must be a number.' }).int().positive().optional(),
  }),
});
const roles = ['owner', 'assistant', 'gallery'] as const;

/**
 * `/api/condition-photos`: a photo of a finding, sent before the report that names it, and shown
 * to whoever may see that report. Studio and venue alike take them.
 */
export function conditionPhotosRouter({ db, filesDir }: AppContext) {
  const store = photoStore(filesDir);
  const send = async (res: Response, variant: 'display' | 'thumbnail') => {
    const photo = await findConditionPhoto(db, scopeOf(res), byFile.input(res).params.fileId);
    if (!photo) throw notFound('That photo');
    await sendRendition(res, store, photo.sha256, variant);
  };
  const fileScope = requireScopeOf(
    db,
    'That photo',
    (d, res) => studioOf.file(d, byFile.input(res).params.fileId),
    ...roles,
  );
  // With a line named, the photo belongs to the line's studio; otherwise to the active one.
  const uploadScope: RequestHandler = (req, res, next) => {
    const { lineId } = forLine.input(res).query;
    if (lineId === undefined) return requireRole(...roles)(req, res, next);
    return requireScopeOf(
      db,
      'That piece',
      (d) => studioOf.line(d, lineId),
      ...roles,
    )(req, res, next);
  };
  return express
    .Router()
    .use(requireAnyRole(...roles))
    .post('/', forLine, uploadScope, receiveImages('photo', 1), async (req, res) => {
      const [file] = uploadedFiles(req);
      if (!file) throw new HttpError('invalid_request', 'Choose a photo to upload.');
      const scope = scopeOf(res);
      const image = await checkImage(file.path, file.originalname);
      const fileId = await store.keep([image], () =>
        fileIdFor(db, scope, image, file.originalname),
      );
      res.status(201).json({ fileId, url: conditionPhotoUrl(fileId) });
    })
    .get('/:fileId', byFile, fileScope, async (_req, res) => send(res, 'display'))
    .get('/:fileId/thumbnail', byFile, fileScope, async (_req, res) => send(res, 'thumbnail'));
}

import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import { type Request, type RequestHandler } from 'express';
import multer from 'multer';

import { HttpError } from '../http/http-error';

export const maxPhotoBytes = 15 * 1024 * 1024;
export const maxPhotosPerUpload = 10;

/**
 * Uploads wait on disk, not in memory, so three people sending ten large photos each hold only
 * the pictures being checked in memory (see `imageWork` in photo-store.ts).
 */
const incoming = path.join(os.tmpdir(), 'saggar-incoming');

function uploadOf(field: string, max: number) {
  return multer({
    storage: multer.diskStorage({
      destination: (_req, _file, done) =>
        fs.mkdir(incoming, { recursive: true }, (err) => done(err ?? null, incoming)),
    }),
    limits: { fileSize: maxPhotoBytes, files: max, fields: 5, parts: max + 10 },
    fileFilter: (_req, file, done) =>
      unreadableName(file.originalname) ? done(badName()) : done(null, true),
  }).array(field, max);
}

/** A file name with NUL or another control character is refused, not stored. */
const unreadableName = (name: string) => /[\u0000-\u001f\u007f]/.test(name);
const badName = () =>
  new HttpError('invalid_request', 'A file name has characters that cannot be read. Rename it.');

/** A failure of the disk rather than of the request: the server's fault, answered 500. */
const isSystemError = (err: unknown) => typeof (err as { syscall?: unknown }).syscall === 'string';

/**
 * multer's and busboy's refusals in the API's error shape. busboy throws plain errors for a body
 * it cannot parse (no boundary, a truncated body, a malformed part header, multipart/mixed):
 * those are the client's, answered 400.
 */
function toUploadError(err: unknown, field: string, max: number): unknown {
  if (err instanceof HttpError || isSystemError(err)) return err;
  if (!(err instanceof multer.MulterError)) {
    return new HttpError('invalid_request', 'The upload could not be read. Try again.');
  }
  switch (err.code) {
    case 'LIMIT_FILE_SIZE':
      return new HttpError('payload_too_large', 'Each photo must be 15 MB or smaller.');
    case 'LIMIT_FILE_COUNT':
    case 'LIMIT_UNEXPECTED_FILE':
      return err.field && err.field !== field
        ? new HttpError('invalid_request', `Send the photos in the “${field}” field.`)
        : new HttpError(
            'invalid_request',
            max === 1 ? 'Upload one photo at a time.' : `Upload at most ${max} photos at a time.`,
          );
    default:
      return new HttpError('invalid_request', 'The upload could not be read. Try again.');
  }
}

/** multer writes part files before it fails; a refused request leaves none behind. */
function removeReceived(req: Request): void {
  for (const file of uploadedFiles(req)) {
    if (file.path) fs.rm(file.path, { force: true }, () => undefined);
  }
}

/**
 * Reads a multipart upload of up to `max` photos in `field` to temporary files. multer checks
 * only sizes, counts and names; whether each file really is an image is sharp's job
 * (photo-store.ts). The files are removed when the response ends, however it ends.
 */
export function receiveImages(field: string, max: number): RequestHandler {
  const upload = uploadOf(field, max);
  return (req, res, next) => {
    res.on('close', () => removeReceived(req));
    upload(req, res, (err?: unknown) => next(err ? toUploadError(err, field, max) : undefined));
  };
}

/** A work's photos: up to ten at a time in `photos`. */
export const receivePhotos = receiveImages('photos', maxPhotosPerUpload);

export function uploadedFiles(req: Request): Express.Multer.File[] {
  return Array.isArray(req.files) ? req.files : [];
}

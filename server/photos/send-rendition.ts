import { type Response } from 'express';

import { notFound } from '../http/http-error';
import { type PhotoStore, renditionMimeType } from './photo-store';

/**
 * Sends a stored picture as shown (the display or thumbnail rendition, never the original). Its
 * content never changes under its hash, so the browser may keep it; `private` keeps shared caches
 * out.
 */
export async function sendRendition(
  res: Response,
  store: PhotoStore,
  sha256: string,
  variant: 'display' | 'thumbnail',
): Promise<void> {
  res.type(renditionMimeType);
  res.set('Cache-Control', 'private, max-age=31536000, immutable');
  res.set('ETag', `"${sha256}-${variant}"`);
  const path = variant === 'thumbnail' ? store.thumbnailPath(sha256) : store.displayPath(sha256);
  await new Promise<void>((resolve, reject) => {
    res.sendFile(path, { etag: false, lastModified: false, cacheControl: false }, (err) => {
      if (!err) return resolve();
      // The error answer must not be kept like the picture would have been.
      res.removeHeader('Cache-Control');
      res.removeHeader('ETag');
      const missing = (err as NodeJS.ErrnoException).code === 'ENOENT';
      reject(missing ? notFound('That photo') : err);
    });
  });
}

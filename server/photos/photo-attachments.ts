import { readFile } from 'node:fs/promises';

import sharp from 'sharp';
import { z } from 'zod';

import { type Scope } from '../access/viewer';
import { type AttachmentKinds } from '../mail/attachments';
import { photoStore } from './photo-store';
import { findPhotoFile } from './photos.repository';

/** A work's photo in an e-mail: `{ kind: 'work-photo', photoId: 7 }`. */
const photoRecipeSchema = z.object({
  kind: z.literal('work-photo'),
  photoId: z.number().int().positive(),
});

/**
 * A work's photo as a small JPEG, to show inside a message: every mail program shows JPEG, not
 * all show the WebP renditions the app serves. Only the message's own studio's photos.
 */
export function photoAttachmentKinds(options: { filesDir: string }): AttachmentKinds {
  const store = photoStore(options.filesDir);
  return {
    'work-photo': async (recipe, db, owner) => {
      const { photoId } = photoRecipeSchema.parse(recipe);
      if (owner.studioId === null) throw new Error('A work’s photo belongs to a studio.');
      const scope: Scope = { studioId: owner.studioId, venueId: null, userId: '', role: 'owner' };
      const photo = await findPhotoFile(db, scope, photoId);
      if (!photo) throw new Error(`Photo ${photoId} is not the studio’s.`);
      const thumbnail = await readFile(store.thumbnailPath(photo.sha256));
      return sharp(thumbnail).resize(240, 240, { fit: 'cover' }).jpeg({ quality: 82 }).toBuffer();
    },
  };
}

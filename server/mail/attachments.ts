import { type AttachmentRecipe } from '@/shared/schemas/outbox';

import { type Db } from '../db/database';

/** The message an attachment belongs to: a renderer reads only that studio's data. */
export type AttachmentOwner = { studioId: number | null };

/** Makes an attachment's bytes from its recipe, when the message is sent or read. */
export type AttachmentRenderer = (
  recipe: AttachmentRecipe,
  db: Db,
  owner: AttachmentOwner,
) => Promise<Buffer>;

/** One renderer per recipe kind: `{ 'consignment-sheet': renderSheetAttachment, … }`. */
export type AttachmentKinds = Readonly<Record<string, AttachmentRenderer>>;

export class UnknownAttachmentKindError extends Error {
  constructor(readonly kind: string) {
    super(`No renderer is registered for attachments of kind "${kind}".`);
    this.name = 'UnknownAttachmentKindError';
  }
}

/** The renderer the app is given: it passes each recipe to its kind's, and refuses unknown kinds. */
export function attachmentRenderer(kinds: AttachmentKinds): AttachmentRenderer {
  return async (recipe, db, owner) => {
    const render = Object.hasOwn(kinds, recipe.kind) ? kinds[recipe.kind] : undefined;
    if (!render) throw new UnknownAttachmentKindError(recipe.kind);
    return render(recipe, db, owner);
  };
}

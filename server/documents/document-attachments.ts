import { z } from 'zod';

import { type Scope } from '../access/viewer';
import { type AttachmentKinds, type AttachmentRenderer } from '../mail/attachments';
import { photoStore } from '../photos/photo-store';
import { documentKinds, renderConsignmentDocument } from './documents.service';

/** A consignment document named in an e-mail: `{ kind: 'labels', consignmentId: 12 }`. */
const documentRecipeSchema = z.object({
  kind: z.enum(documentKinds),
  consignmentId: z.number().int().positive(),
  /** For the condition report: only the dispatch checks, as it was when the work was sent. */
  stages: z.enum(['dispatch', 'latest']).default('latest'),
});
export type DocumentRecipe = z.input<typeof documentRecipeSchema>;

/**
 * The consignment documents as e-mail attachments, rendered for the message's studio with the
 * owner's view of it (the message was queued by someone allowed to send it).
 */
export function documentAttachmentKinds(options: {
  filesDir: string;
  appUrl: string;
}): AttachmentKinds {
  const store = photoStore(options.filesDir);
  const render: AttachmentRenderer = async (recipe, db, owner) => {
    const { kind, consignmentId, stages } = documentRecipeSchema.parse(recipe);
    if (owner.studioId === null) throw new Error('A consignment document belongs to a studio.');
    const scope: Scope = { studioId: owner.studioId, venueId: null, userId: '', role: 'owner' };
    const document = await renderConsignmentDocument(db, store, scope, consignmentId, kind, {
      appUrl: options.appUrl,
      stages,
    });
    return document.bytes;
  };
  return Object.fromEntries(documentKinds.map((kind) => [kind, render]));
}

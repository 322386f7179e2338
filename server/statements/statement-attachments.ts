import { z } from 'zod';

import { type Scope } from '../access/viewer';
import { type AttachmentKinds } from '../mail/attachments';
import { renderStatementDocument } from './statement-document';

const statementRecipeSchema = z.object({
  kind: z.literal('statement'),
  statementId: z.number().int().positive(),
});

/** The statement PDF as an e-mail attachment, made for the message's studio. */
export function statementAttachmentKinds(options: { appUrl: string }): AttachmentKinds {
  return {
    statement: async (recipe, db, owner) => {
      const { statementId } = statementRecipeSchema.parse(recipe);
      if (owner.studioId === null) throw new Error('A statement belongs to a studio.');
      const scope: Scope = { studioId: owner.studioId, venueId: null, userId: '', role: 'owner' };
      return (await renderStatementDocument(db, scope, statementId, options)).bytes;
    },
  };
}

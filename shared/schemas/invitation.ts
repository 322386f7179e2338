import { z } from 'zod';

import { newPasswordSchema } from './password';
import { lineText } from './text';

const tokenSchema = z
  .string({ error: 'The invitation link is incomplete: open it again from the e-mail.' })
  .regex(/^[A-Za-z0-9_-]{20,200}$/, {
    error: 'The invitation link is incomplete: open it again from the e-mail.',
  });

/** `GET /api/invitations/lookup?token=` */
export const invitationLookupQuerySchema = z.strictObject({ token: tokenSchema });

/** What an invitation link shows before it is accepted. */
export const invitationSummarySchema = z.object({
  state: z.enum(['open', 'used', 'expired']),
  email: z.string(),
  studioName: z.string(),
  venueName: z.string().nullable(),
  expiresAt: z.string(),
  /** Whether the e-mail already has an account: then its password is asked, not a new one. */
  existingAccount: z.boolean(),
});
export type InvitationSummary = z.infer<typeof invitationSummarySchema>;

/**
 * `POST /api/invitations/accept`: join as the venue's staff. A new person chooses a name and a
 * password; someone who already has an account gives its password.
 */
export const invitationAcceptSchema = z.strictObject({
  token: tokenSchema,
  /** The new person's name; left out when the e-mail already has an account. */
  name: lineText('name', 120).optional(),
  password: newPasswordSchema,
});
export type InvitationAccept = z.infer<typeof invitationAcceptSchema>;

import { z } from 'zod';

import { newPasswordSchema } from './password';

const tokenSchema = z
  .string({ error: 'The link is incomplete: open it again from the e-mail.' })
  .regex(/^[A-Za-z0-9_-]{16,200}$/, {
    error: 'The link is incomplete: open it again from the e-mail.',
  });

/** `POST /api/auth/request-password-reset`: send a link to choose a new password. */
export const passwordResetRequestSchema = z.strictObject({
  email: z.email({ error: 'Enter an e-mail address such as name@example.com.' }),
});
export type PasswordResetRequest = z.infer<typeof passwordResetRequestSchema>;

/**
 * The answer to a request, the same whether or not the address has an account: it says how long
 * a link works, never whether one was sent.
 */
export const passwordResetRequestedSchema = z.object({
  linkLifetimeMinutes: z.number().int().positive(),
});
export type PasswordResetRequested = z.infer<typeof passwordResetRequestedSchema>;

/** `GET /api/auth/reset-password/lookup?token=` */
export const passwordResetLookupQuerySchema = z.strictObject({ token: tokenSchema });

/** What a link shows before a password is typed; the address only while the link still works. */
export const passwordResetLinkSchema = z.discriminatedUnion('state', [
  z.object({ state: z.literal('open'), email: z.string() }),
  z.object({ state: z.enum(['used', 'expired']) }),
]);
export type PasswordResetLink = z.infer<typeof passwordResetLinkSchema>;

/** `POST /api/auth/reset-password`: the new password, with the link's token. */
export const passwordResetSchema = z.strictObject({
  token: tokenSchema,
  password: newPasswordSchema,
});
export type PasswordReset = z.infer<typeof passwordResetSchema>;

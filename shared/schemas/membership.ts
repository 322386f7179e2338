import { z } from 'zod';

export const roles = ['owner', 'assistant', 'gallery'] as const;
export const roleSchema = z.enum(roles);
export type Role = z.infer<typeof roleSchema>;

/** Roles that work on the studio side; the gallery role sees only its venue. */
export const studioRoles = ['owner', 'assistant'] as const satisfies readonly Role[];

export const membershipSchema = z.object({
  id: z.number().int(),
  studioId: z.number().int(),
  studioName: z.string(),
  role: roleSchema,
  venueId: z.number().int().nullable(),
  venueName: z.string().nullable(),
});
export type Membership = z.infer<typeof membershipSchema>;

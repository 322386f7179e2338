import { z } from 'zod';

import { membershipSchema } from './membership';

export const signInSchema = z.strictObject({
  email: z.email({ error: 'Enter an e-mail address such as name@example.com.' }),
  password: z.string({ error: 'Enter your password.' }).min(1, { error: 'Enter your password.' }),
});
export type SignIn = z.infer<typeof signInSchema>;

export const userSchema = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
});
export type User = z.infer<typeof userSchema>;

/** `GET /api/me`: who is signed in, every membership, and the one in use. */
export const meSchema = z.object({
  user: userSchema,
  memberships: z.array(membershipSchema),
  activeMembershipId: z.number().int().nullable(),
});
export type Me = z.infer<typeof meSchema>;

/** `PUT /api/me/active-membership` */
export const activeMembershipRequestSchema = z.strictObject({
  membershipId: z.number().int().positive(),
});
export type ActiveMembershipRequest = z.infer<typeof activeMembershipRequestSchema>;

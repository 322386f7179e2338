import { z } from 'zod';

/** `GET /api/calendar-feed`: whether the studio has a private calendar address, and since when. */
export const calendarFeedSchema = z.object({
  active: z.boolean(),
  createdAt: z.string().nullable(),
  /** Only when just made: the address is shown once and never stored in the clear. */
  url: z.string().nullable(),
});
export type CalendarFeed = z.infer<typeof calendarFeedSchema>;

export const calendarTokenParamsSchema = z.strictObject({
  token: z
    .string()
    .regex(/^[A-Za-z0-9_-]{20,100}$/, { error: 'That calendar address is not valid.' }),
});

import { z } from 'zod';

import { lineText } from './text';

export const outboxStates = ['queued', 'sent', 'failed'] as const;
export const outboxStateSchema = z.enum(outboxStates, {
  error: 'Choose waiting, sent or not sent.',
});
export type OutboxState = z.infer<typeof outboxStateSchema>;

/** What a message is about. A new kind of message adds its name here (the column is plain text). */
export const mailKinds = [
  'consignment-dispatch',
  'invitation',
  'sale',
  'statement',
  'password-reset',
  'other',
] as const;
export const mailKindSchema = z.enum(mailKinds);
export type MailKind = z.infer<typeof mailKindSchema>;

/**
 * How to make an attachment's bytes, not the bytes: `{ kind: 'consignment-sheet',
 * consignmentId: 12 }`. The server renders it when the message is sent and when it is read, with
 * the renderer registered for its kind.
 */
export const attachmentRecipeSchema = z.looseObject({
  kind: z.string().regex(/^[a-z][a-z0-9-]{0,63}$/, {
    error: 'An attachment kind is lower-case words and dashes.',
  }),
});
export type AttachmentRecipe = z.infer<typeof attachmentRecipeSchema>;

const mimeType = /^[a-z]+\/[a-z0-9.+-]+$/i;

export const mailAttachmentSchema = z.strictObject({
  /** The name the file has for whoever receives it: no folders, no control characters. */
  filename: lineText('file name', 200)
    .min(1, { error: 'An attachment needs a file name.' })
    .refine((name) => !/[/\\]/.test(name), { error: 'A file name has no slashes.' }),
  contentType: z.string().regex(mimeType, { error: 'Give the attachment a MIME type.' }),
  recipe: attachmentRecipeSchema,
  /** Shown inside the HTML part as `<img src="cid:…">` rather than listed as a file. */
  contentId: z
    .string()
    .regex(/^[a-z0-9.-]{1,64}@saggar$/, { error: 'A content id is `name@saggar`.' })
    .optional(),
});
export type MailAttachment = z.infer<typeof mailAttachmentSchema>;

/** What the code that makes a change hands to `enqueueMail`, checked before it is written. */
export const outgoingMailSchema = z
  .strictObject({
    studioId: z.number().int().positive().nullable(),
    to: z.email({ error: 'A message needs one e-mail address to go to.' }),
    subject: lineText('subject', 300).min(1, { error: 'A message needs a subject.' }),
    text: z.string().min(1, { error: 'A message needs a plain-text part.' }),
    html: z.string().nullable().default(null),
    kind: mailKindSchema,
    attachments: z.array(mailAttachmentSchema).max(20).default([]),
  })
  // A studio's owner reads its mail under Sent mail: a link to set someone's password must
  // never be filed there.
  .refine((mail) => mail.kind !== 'password-reset' || mail.studioId === null, {
    error: 'A password reset message belongs to no studio.',
    path: ['studioId'],
  });
export type OutgoingMail = z.input<typeof outgoingMailSchema>;

/** `GET /api/outbox` query; numbers arrive as text in a URL. */
export const outboxListQuerySchema = z.strictObject({
  state: outboxStateSchema.optional(),
  page: z.coerce.number<number | string>().int().min(1, { error: 'Pages start at 1.' }).default(1),
  pageSize: z.coerce
    .number<number | string>()
    .int()
    .min(1)
    .max(100, { error: 'Ask for at most 100 messages a page.' })
    .default(25),
});
export type OutboxListQuery = z.input<typeof outboxListQuerySchema>;

export const outboxIdParamsSchema = z.strictObject({
  id: z.coerce
    .number({ error: 'The message id must be a number.' })
    .int({ error: 'The message id must be a whole number.' })
    .positive({ error: 'The message id must be a number above 0.' }),
});

export const outboxAttachmentParamsSchema = outboxIdParamsSchema.extend({
  index: z.coerce
    .number({ error: 'The attachment number must be a number.' })
    .int({ error: 'The attachment number must be a whole number.' })
    .min(0, { error: 'Attachments are numbered from 0.' }),
});

/** An attachment as the page lists it; `index` is its place in the message, for the download. */
export const outboxAttachmentSchema = z.object({
  index: z.number().int(),
  filename: z.string(),
  contentType: z.string(),
});
export type OutboxAttachment = z.infer<typeof outboxAttachmentSchema>;

/** One message as the list shows it. */
export const outboxSummarySchema = z.object({
  id: z.number().int(),
  kind: mailKindSchema,
  to: z.string(),
  subject: z.string(),
  state: outboxStateSchema,
  attempts: z.number().int(),
  lastError: z.string().nullable(),
  createdAt: z.string(),
  /** When a waiting message is next tried; null once sent or given up. */
  nextAttemptAt: z.string().nullable(),
  sentAt: z.string().nullable(),
  attachments: z.array(outboxAttachmentSchema),
});
export type OutboxSummary = z.infer<typeof outboxSummarySchema>;

export const outboxListSchema = z.object({
  items: z.array(outboxSummarySchema),
  total: z.number().int(),
});
export type OutboxList = z.infer<typeof outboxListSchema>;

/** `GET /api/outbox/:id`: the message with its bodies. */
export const outboxMessageSchema = outboxSummarySchema.extend({
  from: z.string(),
  text: z.string(),
  html: z.string().nullable(),
  messageId: z.string().nullable(),
});
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;

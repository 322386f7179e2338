import { z } from 'zod';

/**
 * Characters a text field never stores: C0 and C1 control characters (NUL among them) and the
 * Unicode bidirectional embeddings, overrides and isolates (U+202A–U+202E, U+2066–U+2069), which
 * can make a name or a note read differently from what it holds (Unicode Technical Report #36,
 * "Bidirectional Text Spoofing"). Multi-line fields keep line breaks and tabs.
 */
const unsafeInLine = /[\u0000-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/;
const unsafeInLines =
  /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/;

/** Whether one line of text is free of control and text-direction characters. */
export const isSafeLine = (text: string) => !unsafeInLine.test(text);

const unsafeMessage = (label: string) =>
  `The ${label} has a hidden control or text-direction character; retype it without.`;

/** One line of text, trimmed, at most `max` characters. */
export function lineText(label: string, max: number) {
  return z
    .string({ error: `Enter the ${label} as text.` })
    .trim()
    .max(max, { error: `Keep the ${label} to ${max} characters or fewer.` })
    .refine(isSafeLine, { error: unsafeMessage(label) });
}

/** Text that may run over several lines (notes), trimmed, at most `max` characters. */
export function linesText(label: string, max: number) {
  return z
    .string({ error: `Enter the ${label} as text.` })
    .trim()
    .max(max, { error: `Keep the ${label} to ${max} characters or fewer.` })
    .refine((v) => !unsafeInLines.test(v), { error: unsafeMessage(label) });
}

/** Optional text: blank becomes null, so "cleared" and "never entered" are the same. */
export function optionalText(label: string, max: number, lines: 'line' | 'lines' = 'line') {
  return (lines === 'line' ? lineText(label, max) : linesText(label, max))
    .transform((v) => (v === '' ? null : v))
    .nullable()
    .optional();
}

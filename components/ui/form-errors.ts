import { type FieldError, type FieldErrors } from 'react-hook-form';

import { ApiError, errorMessage } from '@/hooks/api-errors';

type Messages = Record<string, string>;

/**
 * Errors of the shared schema, nested by its paths (`retailPrice.amount`), lifted to the form's
 * own top-level fields, where a single text box shows them.
 */
export function liftErrors(errors: FieldErrors, mapPath: (path: string) => string | undefined) {
  const lifted: Record<string, FieldError> = {};
  const visit = (node: unknown, path: string[]) => {
    if (node === null || typeof node !== 'object') return;
    const entry = node as { message?: unknown; type?: unknown };
    if (typeof entry.message === 'string' && entry.message !== '') {
      const field = mapPath(path.join('.'));
      if (field !== undefined && lifted[field] === undefined) {
        lifted[field] = { type: String(entry.type ?? 'validate'), message: entry.message };
      }
      return;
    }
    for (const [key, child] of Object.entries(node)) {
      if (key !== 'ref') visit(child, [...path, key]);
    }
  };
  visit(errors, []);
  return lifted;
}

/** Conversion messages (text that is not yet a number or amount) as react-hook-form errors. */
export function messagesToErrors(messages: Messages): Record<string, FieldError> {
  return Object.fromEntries(
    Object.entries(messages).map(([field, message]) => [field, { type: 'parse', message }]),
  );
}

/**
 * Puts the server's field errors on the fields they belong to; anything else becomes one message
 * for the whole form. Answers the form-level message, or null when every issue found its field.
 */
export function serverErrors<Field extends string>(
  error: unknown,
  mapPath: (path: string) => Field | undefined,
  setError: (field: Field, error: { message: string }) => void,
): string | null {
  const fieldErrors = error instanceof ApiError ? error.fieldErrors : {};
  let placed = 0;
  for (const [path, message] of Object.entries(fieldErrors)) {
    const field = mapPath(path);
    if (field === undefined) continue;
    setError(field, { message });
    placed += 1;
  }
  return placed > 0 ? null : errorMessage(error);
}

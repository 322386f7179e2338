import { apiErrorBodySchema, type ApiErrorCode } from '@/shared/schemas/api-error';

/** Codes the server sends, plus two the client raises itself. */
export type ClientErrorCode = ApiErrorCode | 'network' | 'unexpected_response';

/** Field messages keyed by the issue's joined path, e.g. `email` or `lines.0.price`. */
export type FieldErrors = Record<string, string>;

export class ApiError extends Error {
  readonly status: number;
  readonly code: ClientErrorCode;
  readonly fieldErrors: FieldErrors;

  constructor(
    status: number,
    code: ClientErrorCode,
    message: string,
    fieldErrors: FieldErrors = {},
  ) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.fieldErrors = fieldErrors;
  }
}

/** Used when the server's error body is missing or not in the agreed shape. */
const codeByStatus: Record<number, ApiErrorCode> = {
  400: 'invalid_request',
  401: 'unauthenticated',
  403: 'forbidden',
  404: 'not_found',
  409: 'conflict',
  413: 'payload_too_large',
  415: 'unsupported_media_type',
  429: 'too_many_requests',
};

/** The typed error for a failed response's status and parsed body. */
export function errorFromResponse(status: number, body: unknown): ApiError {
  const parsed = apiErrorBodySchema.safeParse(body);
  if (parsed.success) {
    const { code, message, issues = [] } = parsed.data.error;
    const fieldErrors: FieldErrors = {};
    for (const issue of issues) {
      const key = issue.path.join('.');
      fieldErrors[key] ??= issue.message;
    }
    return new ApiError(status, code, message, fieldErrors);
  }
  const code = codeByStatus[status] ?? 'internal';
  const message =
    typeof body === 'object' &&
    body !== null &&
    'message' in body &&
    typeof body.message === 'string'
      ? body.message
      : '';
  return new ApiError(status, code, message);
}

const fallbackMessages: Record<ClientErrorCode, string> = {
  network: 'Saggar could not be reached. Check the connection and try again.',
  unexpected_response:
    'Saggar sent an answer this page could not read. Reload the page and try again.',
  invalid_request: 'Some of what was entered needs another look.',
  invalid_credentials: 'That e-mail address and password do not match.',
  unauthenticated: 'You are signed out. Sign in again to carry on.',
  forbidden: 'Your role in this studio does not allow that.',
  not_found: 'That could not be found. It may have been removed.',
  conflict: 'Someone else changed this in the meantime. Reload and try again.',
  payload_too_large: 'That file is too large to send.',
  unsupported_media_type: 'Saggar could not read what was sent. Reload the page and try again.',
  too_many_requests: 'Too many attempts in a short time. Wait a minute and try again.',
  internal: 'Something went wrong on our side. Try again in a moment.',
};

/** Turns any error into one sentence a person can act on. */
export function errorMessage(error: unknown): string {
  if (error instanceof ApiError) {
    if (error.code === 'internal' || error.status >= 500) return fallbackMessages.internal;
    return error.message.trim() !== '' ? error.message : fallbackMessages[error.code];
  }
  return 'Something unexpected went wrong. Try again, and reload the page if it keeps happening.';
}

/** Client errors (4xx) will not change on a retry; network and server faults might. */
export function isRetryable(error: unknown): boolean {
  return !(error instanceof ApiError && error.status >= 400 && error.status < 500);
}

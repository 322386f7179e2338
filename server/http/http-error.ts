import { type ApiErrorCode, type ApiIssue } from '@/shared/schemas/api-error';

const statusByCode: Record<ApiErrorCode, number> = {
  invalid_request: 400,
  invalid_credentials: 401,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  payload_too_large: 413,
  unsupported_media_type: 415,
  too_many_requests: 429,
  internal: 500,
};

/** The one error a handler throws on purpose; the error handler turns it into the API's shape. */
export class HttpError extends Error {
  readonly status: number;

  constructor(
    readonly code: ApiErrorCode,
    message: string,
    readonly issues?: ApiIssue[],
  ) {
    super(message);
    this.name = 'HttpError';
    this.status = statusByCode[code];
  }
}

export const notFound = (what: string) => new HttpError('not_found', `${what} was not found.`);

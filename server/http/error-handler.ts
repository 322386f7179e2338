import { type ErrorRequestHandler, type RequestHandler } from 'express';
import { type Logger } from 'pino';
import { ZodError } from 'zod';

import { MoneyRuleError } from '@/shared/money';
import { type ApiErrorBody } from '@/shared/schemas/api-error';

import { HttpError } from './http-error';

/** body-parser marks its errors with a `type`; these are the client's fault, not ours. */
function fromBodyParser(err: unknown): HttpError | null {
  const type = (err as { type?: unknown } | null)?.type;
  if (type === 'entity.parse.failed') {
    return new HttpError('invalid_request', 'The request body is not valid JSON.');
  }
  if (type === 'entity.too.large') {
    return new HttpError('payload_too_large', 'The request body is too large.');
  }
  if (typeof type === 'string' && type.startsWith('encoding.')) {
    return new HttpError('invalid_request', 'The request body could not be read.');
  }
  return null;
}

export function toHttpError(err: unknown): HttpError {
  if (err instanceof HttpError) return err;
  // A money rule that refuses its input (a discount leaving the maker less than nothing, say).
  if (err instanceof MoneyRuleError) return new HttpError('invalid_request', err.message);
  if (err instanceof ZodError) {
    return new HttpError(
      'invalid_request',
      'Some fields need attention.',
      err.issues.map((i) => ({
        path: i.path.filter((p): p is string | number => typeof p !== 'symbol'),
        message: i.message,
      })),
    );
  }
  return (
    fromBodyParser(err) ?? new HttpError('internal', 'Something went wrong on our side. Try again.')
  );
}

export function sendError(res: Parameters<RequestHandler>[1], error: HttpError): void {
  const body: ApiErrorBody = {
    error: {
      code: error.code,
      message: error.message,
      ...(error.issues ? { issues: error.issues } : {}),
    },
  };
  res.status(error.status).json(body);
}

/** The last middleware: every error leaves as `{ error: { code, message, issues? } }`. */
export function errorHandler(logger: Logger): ErrorRequestHandler {
  // Express recognises an error handler by its four parameters, so `_next` stays.
  return (err, req, res, _next) => {
    const error = toHttpError(err);
    if (error.status >= 500) logger.error({ err, url: req.originalUrl }, 'request failed');
    if (res.headersSent) {
      res.end();
      return;
    }
    sendError(res, error);
  };
}

export const apiNotFound: RequestHandler = (req) => {
  throw new HttpError('not_found', `There is no API at ${req.method} ${req.originalUrl}.`);
};

import { type ErrorRequestHandler, type RequestHandler } from 'express';
import { type Logger } from 'pino';
import { ZodError } from 'zod';

import { MoneyRuleError } from '@/shared/money';
import { type ApiErrorBody } from '@/shared/schemas/api-error';

import { HttpError } from './http-error';

/**
 * body-parser (and multer's busboy) raise http-errors with a 4xx `status` and `expose: true`:
 * the client's fault, answered with the status they carry and a plain sentence.
 */
function fromClientError(err: unknown): HttpError | null {
  const { status, expose, type } = (err ?? {}) as {
    status?: unknown;
    expose?: unknown;
    type?: unknown;
  };
  if (typeof status !== 'number' || status < 400 || status > 499 || expose !== true) return null;
  if (type === 'entity.parse.failed') {
    return new HttpError('invalid_request', 'The request body is not valid JSON.');
  }
  if (status === 413) return new HttpError('payload_too_large', 'The request body is too large.');
  if (type === 'charset.unsupported') {
    return new HttpError('unsupported_media_type', 'Send the request body as UTF-8 JSON.');
  }
  if (status === 415) {
    return new HttpError(
      'unsupported_media_type',
      'The request body’s Content-Encoding is not one the server reads: send it as is, or as gzip, deflate or br.',
    );
  }
  return new HttpError('invalid_request', 'The request body could not be read.');
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
    fromClientError(err) ??
    new HttpError('internal', 'Something went wrong on our side. Try again.')
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

import { getRequest, setResponse } from 'better-call/node';
import { type Request, type Response } from 'express';

import { type ApiErrorCode } from '@/shared/schemas/api-error';

import { type AppContext } from '../context';
import { sendError } from '../http/error-handler';
import { HttpError } from '../http/http-error';

const codeByStatus: Record<number, ApiErrorCode> = {
  400: 'invalid_request',
  401: 'unauthenticated',
  403: 'forbidden',
  404: 'not_found',
  429: 'too_many_requests',
};

const messageByCode: Partial<Record<ApiErrorCode, string>> = {
  invalid_credentials: 'That e-mail address and password do not match an account.',
  forbidden: 'Requests from another site are not accepted.',
  unauthenticated: 'Sign in to continue.',
};

/**
 * better-auth's refusal as one of the API's errors. Its own codes and wording never reach the
 * client: a wrong password and an unknown address read the same, and a missing Origin reads as
 * any other request from another site.
 */
function toApiError(status: number, body: unknown): HttpError {
  const betterAuthCode = (body as { code?: unknown } | null)?.code;
  const code: ApiErrorCode =
    betterAuthCode === 'INVALID_EMAIL_OR_PASSWORD'
      ? 'invalid_credentials'
      : (codeByStatus[status] ?? 'internal');
  const message =
    messageByCode[code] ??
    (code === 'internal'
      ? 'Something went wrong on our side. Try again.'
      : 'The request could not be completed.');
  return new HttpError(code, message);
}

/**
 * Hands the request to better-auth (its body already parsed and checked by our own middleware)
 * and sends its answer: success as it is, any refusal in the API's one error shape.
 */
export async function passToAuth(
  { auth }: AppContext,
  req: Request,
  res: Response,
  /** Done before a success is answered, so the client's next request finds it done. */
  beforeSuccess?: () => Promise<void>,
) {
  const request = getRequest({ base: `${req.protocol}://${req.get('host')}`, request: req });
  const response = await auth.handler(request);
  if (response.ok) {
    await beforeSuccess?.();
    await setResponse(res, response);
    return response;
  }
  const body: unknown = await response.json().catch(() => null);
  sendError(res, toApiError(response.status, body));
  return response;
}

/**
 * Signs a person in through better-auth with credentials the server already holds (a password
 * just chosen on an invitation), and sends its answer: the user, and the session cookie.
 */
export async function passToAuthSignIn(
  { auth }: AppContext,
  req: Request,
  res: Response,
  credentials: { email: string; password: string },
) {
  const base = `${req.protocol}://${req.get('host')}`;
  const response = await auth.handler(
    new globalThis.Request(`${base}/api/auth/sign-in/email`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', 'user-agent': req.get('user-agent') ?? '' },
      body: JSON.stringify(credentials),
    }),
  );
  if (!response.ok) {
    sendError(res, toApiError(response.status, await response.json().catch(() => null)));
    return;
  }
  await setResponse(res, response);
}

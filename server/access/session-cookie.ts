import { createHmac, timingSafeEqual } from 'node:crypto';

import { parse } from 'cookie';

/** The session cookie's name: better-auth's, with the product's prefix (`__Secure-` over HTTPS). */
export function sessionCookieName(secure: boolean): string {
  return `${secure ? '__Secure-' : ''}saggar.session_token`;
}

/**
 * The session token from the Cookie header, if its HMAC-SHA256 signature (the format better-auth
 * writes: `token.base64(signature)`, URI-encoded) checks out with the secret; null otherwise.
 */
export function signedSessionToken(
  cookieHeader: string | undefined,
  name: string,
  secret: string,
): string | null {
  if (!cookieHeader) return null;
  const value = parse(cookieHeader)[name];
  if (!value) return null;
  const dot = value.lastIndexOf('.');
  if (dot < 1) return null;
  const token = value.slice(0, dot);
  const given = Buffer.from(value.slice(dot + 1), 'base64');
  const expected = createHmac('sha256', secret).update(token).digest();
  return given.length === expected.length && timingSafeEqual(given, expected) ? token : null;
}

import { type RequestHandler } from 'express';

import { HttpError } from './http-error';

const safeMethods = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Refuses state-changing requests that a browser sent from another site. Browsers always send
 * Origin on cross-origin POST/PUT/PATCH/DELETE; requests without it come from non-browser clients,
 * which carry no ambient cookies to abuse. Compared by host so a TLS-terminating proxy still works.
 */
export function sameOrigin(trustedOrigins: readonly string[]): RequestHandler {
  const trustedHosts = new Set(trustedOrigins.map((o) => new URL(o).host));
  return (req, _res, next) => {
    if (safeMethods.has(req.method)) return next();
    const origin = req.get('origin');
    if (origin) {
      let host: string | null = null;
      try {
        host = new URL(origin).host;
      } catch {
        host = null;
      }
      if (host !== null && (host === req.get('host') || trustedHosts.has(host))) return next();
      throw new HttpError('forbidden', 'Requests from another site are not accepted.');
    }
    if (req.get('sec-fetch-site') === 'cross-site') {
      throw new HttpError('forbidden', 'Requests from another site are not accepted.');
    }
    next();
  };
}

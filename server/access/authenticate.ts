import { fromNodeHeaders } from 'better-auth/node';
import { type RequestHandler, type Response } from 'express';

import { type Membership, type Role } from '@/shared/schemas/membership';

import { sessionNeedsRefresh } from '../auth/session-lifetime';
import { type AppContext } from '../context';
import { HttpError } from '../http/http-error';
import { signedSessionToken } from './session-cookie';
import { findLiveSession } from './sessions.repository';
import { type Scope, scopeFor, type Viewer } from './viewer';

declare module 'express-serve-static-core' {
  interface Locals {
    viewer?: Viewer | null;
    scope?: Scope;
  }
}

/**
 * Resolves the session cookie into a Viewer (or null) for every API request, cheaply: the cookie's
 * signature is checked in memory, then one query finds the live session, its person and their
 * memberships. Nothing is cached, so a session signed out or expired is refused at once, by
 * every server process. Once a day (better-auth's update age) better-auth itself extends the
 * session and its cookie. The active membership is the one stored on the session, or the only
 * one there is.
 */
export function authenticate({ auth, db, sessionCookie }: AppContext): RequestHandler {
  return async (req, res, next) => {
    const token = signedSessionToken(req.headers.cookie, sessionCookie.name, sessionCookie.secret);
    const now = new Date();
    const session = token === null ? undefined : await findLiveSession(db, token, now);
    if (!session) {
      res.locals.viewer = null;
      return next();
    }
    if (sessionNeedsRefresh(session.expiresAt, now)) {
      const { headers } = await auth.api.getSession({
        headers: fromNodeHeaders(req.headers),
        returnHeaders: true,
      });
      const cookies = headers.getSetCookie();
      if (cookies.length > 0) res.append('Set-Cookie', cookies);
    }
    const { memberships } = session;
    const active =
      memberships.find((m) => m.id === session.activeMembershipId) ??
      (memberships.length === 1 ? memberships[0]! : null);
    res.locals.viewer = { user: session.user, sessionId: session.sessionId, memberships, active };
    next();
  };
}

export function viewerOf(res: Response): Viewer {
  const viewer = res.locals.viewer;
  if (!viewer) throw new HttpError('unauthenticated', 'Sign in to continue.');
  return viewer;
}

export const requireSignedIn: RequestHandler = (_req, res, next) => {
  viewerOf(res);
  next();
};

/**
 * Lets the request through only for an active membership with one of `roles`, and fixes the
 * Scope that every query of the route uses.
 */
export function requireRole(...roles: Role[]): RequestHandler {
  return (_req, res, next) => {
    const viewer = viewerOf(res);
    const active: Membership | null = viewer.active;
    if (!active) {
      throw new HttpError('forbidden', 'Choose which studio to work in first.');
    }
    if (!roles.includes(active.role)) {
      throw new HttpError('forbidden', 'Your role in this studio does not allow this.');
    }
    res.locals.scope = scopeFor({ ...viewer, active });
    next();
  };
}

export function scopeOf(res: Response): Scope {
  const scope = res.locals.scope;
  if (!scope) throw new Error('scopeOf called on a route without requireRole');
  return scope;
}
